import { useId } from 'react';

interface Props {
  foldPercent: number;
  onChange(percent: number): void;
  disabled?: boolean;
}

/** The fold slider: a native range input (arrow keys, Page Up/Down, Home/End) from flat sheet to folded part. */
export default function FoldSlider({ foldPercent, onChange, disabled }: Props) {
  const id = useId();
  const words = foldPercent === 0 ? 'flat sheet' : foldPercent === 100 ? 'folded' : `${foldPercent} % folded`;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <label htmlFor={id} className="field-label">
        Fold
      </label>
      <span aria-hidden="true" className="text-sm text-ink-soft">
        Flat
      </span>
      <input
        id={id}
        type="range"
        min={0}
        max={100}
        step={1}
        value={foldPercent}
        disabled={disabled}
        aria-valuetext={words}
        onChange={(e) => onChange(Number(e.target.value))}
        className="w-56 accent-fold"
        data-testid="fold-slider"
      />
      <span aria-hidden="true" className="text-sm text-ink-soft">
        Folded
      </span>
      <output htmlFor={id} className="w-12 text-right tabular-nums text-sm">
        {foldPercent} %
      </output>
    </div>
  );
}
