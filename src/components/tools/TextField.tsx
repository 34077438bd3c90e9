/** A labelled one-line text input with a hint and an error tied to it. */
import FieldShell from './FieldShell';

interface Props {
  label: string;
  name: string;
  value: string;
  maxLength: number;
  onChange: (value: string) => void;
  hint?: string | undefined;
  error?: string | undefined;
  required?: boolean;
}

/** One text input; `name` is the request field it fills, so API errors for it land here. */
export default function TextField({ label, name, value, maxLength, onChange, hint, error, required }: Props) {
  return (
    <FieldShell label={label} hint={hint} error={error}>
      {({ id, describedBy }) => (
        <input
          id={id}
          name={name}
          className="field-input"
          value={value}
          maxLength={maxLength}
          required={required}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          onChange={(e) => onChange(e.currentTarget.value)}
        />
      )}
    </FieldShell>
  );
}
