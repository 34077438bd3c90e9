import type { KitPreview } from './kit-queries';
import { KIT_STAGE_LABELS, kitStagesOf, type KitStageDone } from '../../lib/kit/kit-stages';
import BuildProgress from './BuildProgress';

interface Props {
  building: boolean;
  error: string | null;
  /** Stages of the running build reported so far. */
  done: readonly KitStageDone[];
  timings: KitPreview['timingsMs'] | null;
  /** The last build was cancelled: the sheets shown are for earlier settings. */
  cancelled: boolean;
  onCancel: () => void;
  onRebuild: () => void;
}

const PREVIEW_STAGES = kitStagesOf('svg');

/** The sheet preview's build: its stages while it runs, its error, or the time each stage took. */
export default function BuildStatus({ building, error, done, timings, cancelled, onCancel, onRebuild }: Props) {
  return (
    <div className="min-h-12 text-sm" aria-live="polite" data-testid="build-status" data-building={building}>
      {building ? (
        <BuildProgress what="the sheets" planned={PREVIEW_STAGES} done={done} onCancel={onCancel} />
      ) : error ? (
        <p role="alert" className="rounded-lg border border-danger/40 bg-danger-light p-3 text-danger">
          {error}
        </p>
      ) : cancelled ? (
        <p className="flex flex-wrap items-center gap-3">
          <span>Cancelled. The sheets below are for your earlier settings.</span>
          <button type="button" className="btn-secondary py-1 text-sm" onClick={onRebuild}>
            Build these settings
          </button>
        </p>
      ) : timings ? (
        <p className="text-ink-soft">
          Built in {Math.round(timings.total)} ms (
          {PREVIEW_STAGES.filter((k) => timings[k] !== undefined)
            .map((k) => `${KIT_STAGE_LABELS[k].toLowerCase()} ${Math.round(timings[k]!)} ms`)
            .join(', ')}
          ).
        </p>
      ) : null}
    </div>
  );
}
