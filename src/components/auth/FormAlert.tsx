interface Props {
  kind: 'error' | 'success';
  message: string | null;
}

/** The message of a whole form (not one field): announced to screen readers when it appears. */
export function FormAlert({ kind, message }: Props) {
  if (!message) return null;
  return (
    <div
      role={kind === 'error' ? 'alert' : 'status'}
      className={
        kind === 'error'
          ? 'rounded-lg border border-danger/30 bg-danger-light px-3 py-2 text-sm text-danger'
          : 'rounded-lg border border-fold/30 bg-fold-light px-3 py-2 text-sm text-fold-dark'
      }
    >
      {message}
    </div>
  );
}
