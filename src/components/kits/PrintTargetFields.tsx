import type { KitForm } from '../../lib/kit/kit-settings';
import FieldShell from '../tools/FieldShell';
import SelectField from '../tools/SelectField';

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

/** The STL's print target in the builder: a bed (a preset size or a custom one) and the nozzle, each a FieldShell. */
export default function PrintTargetFields({ value, beds, nozzlesMm, bedMinMm, bedMaxMm, errors, onChange }: Props) {
  const bedKey = value.bed.kind === 'preset' ? value.bed.id : 'custom';
  const custom = value.bed.kind === 'custom' ? value.bed : null;
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="field-label">3D print (STL)</legend>
      <div className="grid grid-cols-[1fr_6rem] gap-3">
        <SelectField
          label="Print bed"
          name="print.bed"
          value={bedKey}
          options={[
            ...beds.map((b) => ({ value: b.id, label: b.label })),
            { value: 'custom', label: 'Custom width × depth × height' },
          ]}
          onChange={(key) =>
            onChange(
              {
                ...value,
                bed:
                  key === 'custom'
                    ? { kind: 'custom', widthMm: 200, depthMm: 200, heightMm: 200 }
                    : { kind: 'preset', id: key },
              },
              true,
            )
          }
        />
        <SelectField
          label="Nozzle, mm"
          name="print.nozzleMm"
          value={String(value.nozzleMm)}
          options={nozzlesMm.map((n) => ({ value: String(n), label: String(n) }))}
          error={errors?.nozzleMm}
          onChange={(n) => onChange({ ...value, nozzleMm: Number(n) }, true)}
        />
      </div>
      {custom && (
        <div className="grid grid-cols-3 gap-3">
          {SIDES.map(([key, label]) => (
            <FieldShell key={key} label={`${label}, mm`} error={errors?.[key]}>
              {({ id, describedBy }) => (
                <input
                  id={id}
                  type="number"
                  step="any"
                  min={bedMinMm}
                  max={bedMaxMm}
                  className="field-input"
                  value={Number.isFinite(custom[key]) ? custom[key] : ''}
                  aria-invalid={errors?.[key] ? true : undefined}
                  aria-describedby={describedBy}
                  onChange={(e) => onChange({ ...value, bed: { ...custom, [key]: e.target.valueAsNumber } }, false)}
                />
              )}
            </FieldShell>
          ))}
        </div>
      )}
    </fieldset>
  );
}
