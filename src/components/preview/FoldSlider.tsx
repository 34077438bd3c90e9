import { useId } from 'react';

interface Props {
  foldPercent: number;
  onChange(percent: number): void;
  foldWholeKit: boolean;
  onFoldWholeKitChange(whole: boolean): void;
  disabled?: boolean;
}

/**
 * The fold slider: a native range input (arrow keys, Page Up/Down, Home/End) from flat sheet to folded part,
 * and whether it folds the whole kit or only the current step's pieces.
 */
export default function FoldSlider({ foldPercent, onChange, foldWholeKit, onFoldWholeKitChange, disabled }: Props) {
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
      <label className="flex items-center gap-2 text-sm">
        <input
          type="checkbox"
          checked={foldWholeKit}
          disabled={disabled}
          onChange={(e) => onFoldWholeKitChange(e.target.checked)}
          className="accent-fold"
        />
        Fold the whole kit (otherwise only this step’s pieces)
      </label>
    </div>
  );
}
