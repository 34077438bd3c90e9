/** A labelled select of a tool's form, with a hint and an error tied to it. */
import FieldShell from './FieldShell';

interface Props {
  label: string;
  name: string;
  value: string;
  options: { value: string; label: string }[];
  /** More options after `options`, each list under its own heading (an optgroup). */
  groups?: { label: string; options: { value: string; label: string }[] }[];
  onChange: (value: string) => void;
  hint?: string;
  error?: string | undefined;
}

/** One select; `name` is the request field it fills, so API errors for it land here. */
export default function SelectField({ label, name, value, options, groups = [], onChange, hint, error }: Props) {
  return (
    <FieldShell label={label} hint={hint} error={error}>
      {({ id, describedBy }) => (
        <select
          id={id}
          name={name}
          className="field-input max-w-64"
          value={value}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          onChange={(e) => onChange(e.target.value)}
        >
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
          {groups
            .filter((g) => g.options.length > 0)
            .map((g) => (
              <optgroup key={g.label} label={g.label}>
                {g.options.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </optgroup>
            ))}
        </select>
      )}
    </FieldShell>
  );
}
