import type { ScaleSolution } from './kit-queries';

interface Props {
  solution: ScaleSolution | undefined;
  loading: boolean;
  error: string | null;
  currentScale: number;
  onUse: (scaleDenominator: number) => void;
}

/** The solver's suggested scale and why, with the nearest workable alternatives as buttons. */
export default function ScaleAdvice({ solution, loading, error, currentScale, onUse }: Props) {
  if (error) {
    return (
      <p role="alert" className="text-sm text-danger">
        {error}
      </p>
    );
  }
  if (!solution) {
    return <p className="text-sm text-ink-soft">{loading ? 'Working out the best scale…' : ''}</p>;
  }
  const n = solution.suggestedScaleDenominator;
  return (
    <div className="rounded-lg bg-fold-light/60 p-3 text-sm" data-testid="scale-advice" aria-busy={loading}>
      <p className="font-semibold">
        Suggested: 1:{n}
        {currentScale !== n && (
          <button type="button" className="ml-3 btn-secondary px-2 py-0.5 text-sm" onClick={() => onUse(n)}>
            Use 1:{n}
          </button>
        )}
      </p>
      <p className="mt-1">{solution.kit.explanation}</p>
      <p className="mt-1 text-ink-soft">{solution.kit.paper.explanation}</p>
      {solution.kit.alternatives.length > 0 && (
        <ul className="mt-2 list-disc pl-5">
          {solution.kit.alternatives.map((a) => (
            <li key={a.label}>
              <span className="font-semibold">{a.label}.</span> {a.explanation}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
