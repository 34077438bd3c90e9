import { useId } from 'react';

interface Props {
  value: number;
  usualScales: number[];
  suggested: number | null;
  max: number;
  error?: string;
  onChange: (scaleDenominator: number, immediate: boolean) => void;
  /** Enter in the 1:N field: build now instead of after the typing pause. */
  onCommit: () => void;
}

/** The kit's scale: one button per usual ratio (the suggested one marked) and a field for any 1:N. */
export default function ScaleField({ value, usualScales, suggested, max, error, onChange, onCommit }: Props) {
  const id = useId();
  return (
    <fieldset>
      <legend className="field-label">Scale</legend>
      <div className="mt-1 flex flex-wrap gap-1" role="group" aria-label="Usual scales">
        {usualScales.map((n) => (
          <button
            key={n}
            type="button"
            aria-pressed={value === n}
            className={`rounded-md border px-2.5 py-1 text-sm font-semibold ${
              value === n ? 'border-fold bg-fold text-white' : 'border-ink/20 bg-white hover:bg-paper-deep'
            }`}
            onClick={() => onChange(n, true)}
          >
            1:{n}
            {suggested === n && <span className="sr-only"> (suggested)</span>}
            {suggested === n && <span aria-hidden="true"> ★</span>}
          </button>
        ))}
      </div>
      <div className="mt-2 flex items-center gap-2">
        <label htmlFor={`${id}-n`} className="text-sm">
          Any scale 1 :
        </label>
        <input
          id={`${id}-n`}
          type="number"
          inputMode="numeric"
          min={1}
          max={max}
          step="any"
          className="field-input mt-0 w-28"
          value={Number.isFinite(value) ? value : ''}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-err` : undefined}
          onChange={(e) => onChange(e.target.valueAsNumber, false)}
          onKeyDown={(e) => {
            if (e.key !== 'Enter') return;
            e.preventDefault();
            onCommit();
          }}
        />
      </div>
      {error && (
        <p id={`${id}-err`} className="field-error">
          {error}
        </p>
      )}
    </fieldset>
  );
}
