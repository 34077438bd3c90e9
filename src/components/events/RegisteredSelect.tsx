/** A select bound to a react-hook-form field, inside the tools' FieldShell (label, hint and error tied to it). */
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';
import FieldShell from '../tools/FieldShell';

export type Option = { value: string; label: string };

export default function RegisteredSelect(o: {
  label: string;
  hint?: string;
  options: Option[];
  empty?: string;
  registration: UseFormRegisterReturn;
  error?: FieldError | undefined;
}) {
  return (
    <FieldShell label={o.label} hint={o.hint} error={o.error?.message}>
      {({ id, describedBy }) => (
        <select
          id={id}
          className="field-input"
          aria-invalid={o.error ? true : undefined}
          aria-describedby={describedBy}
          {...o.registration}
        >
          {o.empty !== undefined && <option value="">{o.empty}</option>}
          {o.options.map((opt) => (
            <option key={opt.value} value={opt.value}>
              {opt.label}
            </option>
          ))}
        </select>
      )}
    </FieldShell>
  );
}
