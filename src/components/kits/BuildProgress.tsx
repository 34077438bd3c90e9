import { useEffect, useState } from 'react';
import { KIT_STAGE_LABELS, type KitStageDone } from '../../lib/kit/kit-stages';
import type { KitStage } from '../../lib/kit/build-kit';

interface Props {
  /** What is being built, e.g. "the sheets" or "the PDF". */
  what: string;
  planned: readonly KitStage[];
  /** Stages the server has reported as done, in order. */
  done: readonly KitStageDone[];
  onCancel: () => void;
}

/**
 * A build in progress as the server reports it: a bar that fills one stage at a time, the stages with the
 * time each took, the elapsed time and a Cancel button (it aborts the request, and the server stops).
 */
export default function BuildProgress({ what, planned, done, onCancel }: Props) {
  const [elapsedMs, setElapsedMs] = useState(0);
  useEffect(() => {
    const start = performance.now();
    const timer = setInterval(() => setElapsedMs(performance.now() - start), 100);
    return () => clearInterval(timer);
  }, []);
  const finished = new Map(done.map((d) => [d.stage, d.ms]));
  const current = planned.find((s) => !finished.has(s));
  const count = planned.filter((s) => finished.has(s)).length;

  return (
    <div className="flex flex-col gap-2" data-testid="build-progress">
      <div className="flex flex-wrap items-center gap-3">
        <div
          className="h-2 w-40 overflow-hidden rounded-full bg-paper-deep"
          role="progressbar"
          aria-label={`Building ${what}`}
          aria-valuemin={0}
          aria-valuemax={planned.length}
          aria-valuenow={count}
          aria-valuetext={current ? `${KIT_STAGE_LABELS[current]}, stage ${count + 1} of ${planned.length}` : 'Done'}
        >
          <div
            className="h-full rounded-full bg-fold transition-[width] duration-150"
            style={{ width: `${((count + (current ? 0.5 : 0)) / planned.length) * 100}%` }}
          />
        </div>
        <span>
          Building {what}… {(elapsedMs / 1000).toFixed(1)} s
        </span>
        <button type="button" className="btn-secondary py-1 text-sm" onClick={onCancel}>
          Cancel
        </button>
      </div>
      <ol className="flex flex-wrap gap-x-4 gap-y-1 text-ink-soft">
        {planned.map((stage) => (
          <li
            key={stage}
            data-stage={stage}
            data-state={finished.has(stage) ? 'done' : stage === current ? 'now' : 'next'}
          >
            {finished.has(stage) ? (
              <>
                <span aria-hidden="true">✓ </span>
                {KIT_STAGE_LABELS[stage]} <span className="tabular-nums">{Math.round(finished.get(stage)!)} ms</span>
              </>
            ) : stage === current ? (
              <span className="font-semibold text-ink">{KIT_STAGE_LABELS[stage]}…</span>
            ) : (
              KIT_STAGE_LABELS[stage]
            )}
          </li>
        ))}
      </ol>
    </div>
  );
}
