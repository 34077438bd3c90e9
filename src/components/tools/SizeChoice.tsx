/** Ticking which ISO 14644-1 particle sizes the counter reports (at least one; kept smallest first). */

interface Props {
  sizes: readonly number[];
  chosen: number[];
  onChange: (sizes: number[]) => void;
  error?: string | undefined;
}

/** A fieldset of checkboxes, one per size in µm. */
export default function SizeChoice({ sizes, chosen, onChange, error }: Props) {
  const toggle = (s: number) => {
    const next = chosen.includes(s) ? chosen.filter((x) => x !== s) : [...chosen, s];
    if (next.length > 0) onChange(next.sort((a, b) => a - b));
  };
  return (
    <fieldset className="mt-4" aria-describedby={error ? 'size-choice-error' : undefined}>
      <legend className="field-label">Particle sizes counted (µm)</legend>
      <div className="mt-1 flex flex-wrap gap-4">
        {sizes.map((s) => (
          <label key={s} className="flex items-center gap-1">
            <input type="checkbox" checked={chosen.includes(s)} onChange={() => toggle(s)} />
            {s} µm
          </label>
        ))}
      </div>
      {error && (
        <p id="size-choice-error" className="field-error">
          {error}
        </p>
      )}
    </fieldset>
  );
}
