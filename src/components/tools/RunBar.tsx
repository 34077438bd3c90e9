/** A tool's Run button with its state line (working, failed, or what to do first) under it. */
import type { ApiError } from '../../lib/http/client';
import AnalysisStatus from './AnalysisStatus';

interface Props {
  label: string;
  /** Runs the tool; omitted, the button submits its form. */
  onRun?: () => void;
  mutation: { isPending: boolean; error: ApiError | null; data?: unknown };
  unplaced: string[];
  emptyText: string;
}

/** The Run button, disabled while a run is under way, and the tool's status. */
export default function RunBar({ label, onRun, mutation, unplaced, emptyText }: Props) {
  return (
    <>
      <button
        type={onRun ? 'button' : 'submit'}
        className="btn-primary mt-4"
        onClick={onRun}
        disabled={mutation.isPending}
      >
        {label}
      </button>
      <AnalysisStatus
        isPending={mutation.isPending}
        error={mutation.error}
        unplaced={unplaced}
        hasResult={mutation.data !== undefined}
        emptyText={emptyText}
      />
    </>
  );
}
