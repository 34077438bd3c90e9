import type { KitForm } from '../../lib/kit/kit-settings';

type PrintChoice = NonNullable<KitForm['print']>;

interface Props {
  value: PrintChoice;
  beds: { id: string; label: string }[];
  nozzlesMm: readonly number[];
  bedMinMm: number;
  bedMaxMm: number;
  /** Field errors of the print choice, by field name. */
  errors?: Partial<Record<'widthMm' | 'depthMm' | 'heightMm' | 'nozzleMm', string>>;
  /** `now` is false while a size is being typed, so the preview waits for a pause. */
  onChange: (next: PrintChoice, now: boolean) => void;
}

const SIDES = [
  ['widthMm', 'Width'],
  ['depthMm', 'Depth'],
  ['heightMm', 'Height'],
] as const;

/** The STL's print target in the builder: a bed (a preset size or a custom one) and the nozzle. */
export default function PrintTargetFields({ value, beds, nozzlesMm, bedMinMm, bedMaxMm, errors, onChange }: Props) {
  const bedKey = value.bed.kind === 'preset' ? value.bed.id : 'custom';
  const custom = value.bed.kind === 'custom' ? value.bed : null;
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="field-label">3D print (STL)</legend>
      <div className="grid grid-cols-[1fr_6rem] gap-3">
        <div>
          <label className="field-label" htmlFor="kit-print-bed">
            Print bed
          </label>
          <select
            id="kit-print-bed"
            className="field-input"
            value={bedKey}
            onChange={(e) =>
              onChange(
                {
                  ...value,
                  bed:
                    e.target.value === 'custom'
                      ? { kind: 'custom', widthMm: 200, depthMm: 200, heightMm: 200 }
                      : { kind: 'preset', id: e.target.value },
                },
                true,
              )
            }
          >
            {beds.map((b) => (
              <option key={b.id} value={b.id}>
                {b.label}
              </option>
            ))}
            <option value="custom">Custom width × depth × height</option>
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="kit-print-nozzle">
            Nozzle, mm
          </label>
          <select
            id="kit-print-nozzle"
            className="field-input"
            value={String(value.nozzleMm)}
            onChange={(e) => onChange({ ...value, nozzleMm: Number(e.target.value) }, true)}
          >
            {nozzlesMm.map((n) => (
              <option key={n} value={String(n)}>
                {n}
              </option>
            ))}
          </select>
        </div>
      </div>
      {custom && (
        <div className="grid grid-cols-3 gap-3">
          {SIDES.map(([key, label]) => (
            <div key={key}>
              <label className="field-label" htmlFor={`kit-print-${key}`}>
                {label}, mm
              </label>
              <input
                id={`kit-print-${key}`}
                type="number"
                step="any"
                min={bedMinMm}
                max={bedMaxMm}
                className="field-input"
                value={Number.isFinite(custom[key]) ? custom[key] : ''}
                aria-invalid={errors?.[key] ? true : undefined}
                aria-describedby={errors?.[key] ? `kit-print-${key}-err` : undefined}
                onChange={(e) => onChange({ ...value, bed: { ...custom, [key]: e.target.valueAsNumber } }, false)}
              />
              {errors?.[key] && (
                <p id={`kit-print-${key}-err`} className="field-error">
                  {errors[key]}
                </p>
              )}
            </div>
          ))}
        </div>
      )}
    </fieldset>
  );
}
