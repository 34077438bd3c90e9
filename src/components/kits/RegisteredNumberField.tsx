import type { UseFormRegisterReturn } from 'react-hook-form';
import FieldShell from '../tools/FieldShell';

interface Props {
  label: string;
  error?: string | undefined;
  /** The form's registration of the field (register(name, { valueAsNumber: true })). */
  registration: UseFormRegisterReturn;
  min?: number;
  max?: number;
  step?: string;
}

/** A number input of the builder's form, registered with react-hook-form, with its label and error (FieldShell). */
export default function RegisteredNumberField({ label, error, registration, min, max, step }: Props) {
  return (
    <FieldShell label={label} error={error}>
      {({ id, describedBy }) => (
        <input
          id={id}
          type="number"
          min={min}
          max={max}
          step={step}
          className="field-input"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          {...registration}
        />
      )}
    </FieldShell>
  );
}
