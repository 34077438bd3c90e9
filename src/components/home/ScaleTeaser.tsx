import { useId, useState } from 'react';
import { lengthLabel, type UnitSystem } from '../../lib/layout/units';
import { SHEET_SIZES, type SheetSizeId } from '../../lib/layout/sheet-sizes';

/** The demo probe's body, 2.4 m across the flats of its hexagon (product scenario). */
const BODY_ACROSS_FLATS_MM = 2400;
const RATIOS = [5, 10, 20, 25, 50] as const;
const PAPER: SheetSizeId[] = ['letter', 'a4', 'tabloid', 'a3'];

interface Props {
  /** The worked example the server solved: its scale, its paper and the solver's words for its kit. */
  example: { scaleDenominator: number; sheetSizeId: SheetSizeId; text: string };
}

/**
 * "How big will the model be?" for the landing page: the body's size at a scale is arithmetic; what the kit
 * then is (sheets, whether a class can cut it) only the solver says, so the island shows the solver's words for
 * the example it was given and sends other choices to the scale tool rather than guessing.
 */
export default function ScaleTeaser({ example }: Props) {
  const [ratio, setRatio] = useState<number>(example.scaleDenominator);
  const [paper, setPaper] = useState<SheetSizeId>(example.sheetSizeId);
  const units: UnitSystem = paper === 'letter' || paper === 'tabloid' ? 'us' : 'metric';
  const id = useId();
  const bodyMm = BODY_ACROSS_FLATS_MM / ratio;
  const isExample = ratio === example.scaleDenominator && paper === example.sheetSizeId;

  return (
    <div className="card" data-testid="scale-teaser">
      <p className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Try a scale</p>
      <div className="mt-3 flex flex-wrap gap-4">
        <fieldset>
          <legend className="field-label">Scale</legend>
          <div className="mt-1 flex flex-wrap gap-1">
            {RATIOS.map((r) => (
              <button
                key={r}
                type="button"
                aria-pressed={ratio === r}
                onClick={() => setRatio(r)}
                className={ratio === r ? 'btn-primary px-3 py-1' : 'btn-secondary px-3 py-1'}
              >
                1:{r}
              </button>
            ))}
          </div>
        </fieldset>
        <div>
          <label className="field-label" htmlFor={`${id}-paper`}>
            Paper
          </label>
          <select
            id={`${id}-paper`}
            className="field-input"
            value={paper}
            onChange={(e) => setPaper(e.target.value as SheetSizeId)}
          >
            {PAPER.map((p) => (
              <option key={p} value={p}>
                {SHEET_SIZES[p].label}
              </option>
            ))}
          </select>
        </div>
      </div>
      <div aria-live="polite" className="mt-4 space-y-2">
        <p className="text-lg" data-testid="scale-teaser-result">
          At 1:{ratio} the probe body is <strong>{lengthLabel(bodyMm, units)}</strong> across.
        </p>
        {isExample ? (
          <p data-testid="scale-teaser-kit">The kit: {example.text}</p>
        ) : (
          <p data-testid="scale-teaser-kit">
            How many {SHEET_SIZES[paper].label} sheets that takes, and whether your class can cut it:{' '}
            <a href={`/tools/scale?sheet=${paper}&units=${units}`}>ask the scale solver</a>.
          </p>
        )}
      </div>
    </div>
  );
}
