/** The state line under a tool's Run button: working, failed (with messages no input could show), or empty. */
import type { ApiError } from '../../lib/http/client';

interface Props {
  isPending: boolean;
  error: ApiError | null;
  /** Field messages that have no input to sit next to. */
  unplaced?: string[];
  hasResult: boolean;
  emptyText: string;
}

/** A polite live region announcing progress, the error, or what to do first. */
export default function AnalysisStatus({ isPending, error, unplaced = [], hasResult, emptyText }: Props) {
  return (
    <div aria-live="polite" className="mt-3">
      {isPending && <p className="text-ink-soft">Working it out…</p>}
      {!isPending && error && (
        <div role="alert" className="rounded-lg border border-danger/40 bg-danger-light p-3 text-ink">
          <p className="font-semibold">
            {error.status === 413 ? 'That is more data than this tool takes.' : 'We could not compute that.'}
          </p>
          <p>{error.message}</p>
          {unplaced.length > 0 && (
            <ul className="mt-1 list-disc pl-5 text-sm">
              {unplaced.slice(0, 8).map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          )}
        </div>
      )}
      {!isPending && !error && !hasResult && <p className="text-ink-soft">{emptyText}</p>}
    </div>
  );
}
