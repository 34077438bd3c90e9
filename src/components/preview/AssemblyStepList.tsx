import type { AssemblyStep } from '../../lib/preview/assembly-steps';
import { tabNumbersLabel } from '../../lib/preview/assembly-steps';
import { FOLD_WORDS, foldWordsLine } from '../../lib/render/fold-words';

interface Props {
  steps: readonly AssemblyStep[];
  stepIndex: number;
  onPrevious(): void;
  onNext(): void;
  onGo(index: number): void;
}

/** The assembly steps in order with previous / next, the current step's tabs, and its description read aloud. */
export default function AssemblyStepList({ steps, stepIndex, onPrevious, onNext, onGo }: Props) {
  const step = steps[stepIndex];
  if (!step) return <p className="text-ink-soft">This kit has no pieces to assemble.</p>;
  return (
    <section aria-labelledby="assembly-steps-heading" className="flex flex-col gap-3">
      <h2 id="assembly-steps-heading" className="text-xl font-bold">
        Assembly steps
      </h2>
      <div className="flex items-center gap-2">
        <button type="button" className="btn-secondary px-3 py-1" onClick={onPrevious} disabled={stepIndex === 0}>
          Previous step
        </button>
        <span className="tabular-nums font-semibold">
          Step {step.number} of {steps.length}
        </span>
        <button
          type="button"
          className="btn-primary px-3 py-1"
          onClick={onNext}
          disabled={stepIndex === steps.length - 1}
        >
          Next step
        </button>
      </div>
      <div className="rounded-lg bg-fold-light p-3">
        <p className="font-semibold">
          {step.rodPartId ? 'No tabs: cut the rod, then glue it on' : `Glue ${tabNumbersLabel(step.tabNumbers)}`}
        </p>
        <p aria-live="polite" data-testid="step-description" className="mt-1">
          {step.description}
        </p>
      </div>
      <p className="text-sm" data-testid="fold-words">
        {FOLD_WORDS.holding} {foldWordsLine('mountain')}. {foldWordsLine('valley')}.
      </p>
      <ol className="flex flex-col gap-1 text-sm">
        {steps.map((s, i) => (
          <li key={s.number}>
            <button
              type="button"
              aria-current={i === stepIndex ? 'step' : undefined}
              onClick={() => onGo(i)}
              className={`w-full rounded px-2 py-1 text-left ${i === stepIndex ? 'bg-fold text-white' : 'hover:bg-paper-deep'}`}
            >
              {s.number}. {s.pieceLabels.join(', ')} — {tabNumbersLabel(s.tabNumbers)}
            </button>
          </li>
        ))}
      </ol>
    </section>
  );
}
