import { useEffect, useState } from 'react';
import type { KitPreview } from '../../lib/kit/kit-queries';

interface Props {
  building: boolean;
  error: string | null;
  timings: KitPreview['timingsMs'] | null;
  onCancel: () => void;
}

const STAGES: [keyof KitPreview['timingsMs'], string][] = [
  ['patterns', 'patterns'],
  ['layout', 'layout'],
  ['svg', 'sheets'],
];

/**
 * The build's state, honestly: while the request runs, an indeterminate bar with the elapsed time and a
 * Cancel button (it aborts the request); afterwards, the time the server spent in each stage.
 */
export default function BuildStatus({ building, error, timings, onCancel }: Props) {
  const [elapsedMs, setElapsedMs] = useState(0);
  useEffect(() => {
    if (!building) return;
    const start = performance.now();
    setElapsedMs(0);
    const timer = setInterval(() => setElapsedMs(performance.now() - start), 100);
    return () => clearInterval(timer);
  }, [building]);

  return (
    <div className="min-h-12 text-sm" aria-live="polite" data-testid="build-status" data-building={building}>
      {building ? (
        <div className="flex items-center gap-3">
          <div
            className="h-2 w-40 overflow-hidden rounded-full bg-paper-deep"
            role="progressbar"
            aria-label="Building the sheets"
          >
            <div className="h-full w-1/3 animate-pulse rounded-full bg-fold" />
          </div>
          <span>Building patterns, layout and sheets on the server… {(elapsedMs / 1000).toFixed(1)} s</span>
          <button type="button" className="btn-secondary py-1 text-sm" onClick={onCancel}>
            Cancel
          </button>
        </div>
      ) : error ? (
        <p role="alert" className="rounded-lg border border-danger/40 bg-danger-light p-3 text-danger">
          {error}
        </p>
      ) : timings ? (
        <p className="text-ink-soft">
          Built in {Math.round(timings.total)} ms (
          {STAGES.filter(([k]) => timings[k] !== undefined)
            .map(([k, label]) => `${label} ${Math.round(timings[k]!)} ms`)
            .join(', ')}
          ).
        </p>
      ) : null}
    </div>
  );
}
