/** The label, hint and error around one form control, with the ids that tie them to it. */
import { useId, type ReactNode } from 'react';

interface Props {
  label: string;
  unit?: string | undefined;
  hint?: string | undefined;
  error?: string | undefined;
  /** Draws the control, given its id and the ids it is described by. */
  children: (ids: { id: string; describedBy: string | undefined }) => ReactNode;
}

/** Wraps a control so its hint and error are read with it (aria-describedby) and shown beside it. */
export default function FieldShell({ label, unit, hint, error, children }: Props) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
        {unit && <span className="font-normal text-ink-soft"> ({unit})</span>}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="mt-0.5 text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {children({ id, describedBy })}
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}
