/** A labelled number field of a tool's form (kept as text until the tool runs), with its hint and error beside it. */
import FieldShell from './FieldShell';

interface Props {
  label: string;
  unit?: string;
  value: string;
  onChange: (value: string) => void;
  hint?: string;
  error?: string | undefined;
  name: string;
}

/** One form field; `name` is the request field it fills, so API errors for it land here. */
export default function NumberField({ label, unit, value, onChange, hint, error, name }: Props) {
  return (
    <FieldShell label={label} unit={unit} hint={hint} error={error}>
      {({ id, describedBy }) => (
        <input
          id={id}
          name={name}
          inputMode="decimal"
          className="field-input max-w-48"
          value={value}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          onChange={(e) => onChange(e.target.value)}
        />
      )}
    </FieldShell>
  );
}
