import type { InputHTMLAttributes } from 'react';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

interface Props extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name'> {
  /** Field name; also builds the ids of the input, its hint and its error. */
  id: string;
  label: string;
  registration: UseFormRegisterReturn;
  error?: FieldError | undefined;
  hint?: string;
}

/** A labelled input whose hint and error are tied to it with aria-describedby, the error beside the field. */
export function FormField({ id, label, registration, error, hint, ...input }: Props) {
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="mt-0.5 text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <input
        id={id}
        className="field-input"
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        {...input}
        {...registration}
      />
      {error?.message && (
        <p id={errorId} className="field-error">
          {error.message}
        </p>
      )}
    </div>
  );
}
