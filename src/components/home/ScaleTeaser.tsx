import { useId, useState } from 'react';
import { lengthLabel, type UnitSystem } from '../../lib/layout/units';
import { SHEET_MARGIN_MM, SHEET_SIZES, type SheetSizeId } from '../../lib/layout/sheet-sizes';

/** The demo probe's body, 2.4 m across the flats of its hexagon (product scenario). */
const BODY_ACROSS_FLATS_MM = 2400;
const RATIOS = [5, 10, 20, 25, 50] as const;
const PAPER: SheetSizeId[] = ['letter', 'a4', 'tabloid', 'a3'];

/** A one-glance answer to "how big will the model be on my paper?" for the landing page. */
export default function ScaleTeaser() {
  const [ratio, setRatio] = useState<number>(20);
  const [paper, setPaper] = useState<SheetSizeId>('letter');
  const units: UnitSystem = paper === 'letter' || paper === 'tabloid' ? 'us' : 'metric';
  const id = useId();
  const bodyMm = BODY_ACROSS_FLATS_MM / ratio;
  const sheet = SHEET_SIZES[paper];
  const printableMm = Math.min(sheet.widthMm, sheet.heightMm) - 2 * SHEET_MARGIN_MM;
  const fits = bodyMm <= printableMm;

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
      <p className="mt-4 text-lg" aria-live="polite" data-testid="scale-teaser-result">
        At 1:{ratio} the probe body is <strong>{lengthLabel(bodyMm, units)}</strong> across:{' '}
        {fits ? (
          <span className="font-semibold text-fold-dark">it fits on one {sheet.label} sheet.</span>
        ) : (
          <span className="font-semibold text-caution">
            too wide for {sheet.label}; pick a smaller scale or tile it.
          </span>
        )}
      </p>
    </div>
  );
}
