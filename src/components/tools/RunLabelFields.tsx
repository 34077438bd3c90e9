/** The names of the thermal tool's runs (its table's temperature columns), with add and remove. */
import { useId } from 'react';
import type { CellErrors } from '../../lib/tools/table-cells';

interface Props {
  labels: string[];
  onChange: (labels: string[]) => void;
  errors: CellErrors;
  maxRuns: number;
}

/** One text field per run; errors for run j arrive under "label.j". */
export default function RunLabelFields({ labels, onChange, errors, maxRuns }: Props) {
  const id = useId();
  return (
    <fieldset className="mt-4">
      <legend className="field-label">Runs (one temperature column each)</legend>
      <div className="mt-1 flex flex-wrap items-start gap-3">
        {labels.map((label, j) => {
          const error = errors[`label.${j}`];
          return (
            <div key={j}>
              <label htmlFor={`${id}-${j}`} className="sr-only">
                Name of run {j + 1}
              </label>
              <div className="flex gap-1">
                <input
                  id={`${id}-${j}`}
                  className="field-input mt-0 w-44"
                  value={label}
                  aria-invalid={error ? true : undefined}
                  aria-describedby={error ? `${id}-${j}-error` : undefined}
                  onChange={(e) => onChange(labels.map((l, i) => (i === j ? e.target.value : l)))}
                />
                {labels.length > 1 && (
                  <button
                    type="button"
                    className="btn-secondary px-2 py-1 text-xs"
                    aria-label={`Remove run ${label || j + 1}`}
                    onClick={() => onChange(labels.filter((_, i) => i !== j))}
                  >
                    ✕
                  </button>
                )}
              </div>
              {error && (
                <p id={`${id}-${j}-error`} className="field-error">
                  {error}
                </p>
              )}
            </div>
          );
        })}
        <button
          type="button"
          className="btn-secondary px-3 py-2 text-sm"
          disabled={labels.length >= maxRuns}
          onClick={() => onChange([...labels, `run ${labels.length + 1}`])}
        >
          Add a run
        </button>
      </div>
    </fieldset>
  );
}
