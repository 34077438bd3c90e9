import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH } from '../../lib/auth/password-rules';
import { FormField } from './FormField';

interface Props {
  registration: UseFormRegisterReturn;
  error?: FieldError | undefined;
  id?: string;
  label?: string;
}

/** The e-mail field every account form uses. */
export function EmailField({ registration, error, id = 'email', label = 'E-mail address' }: Props) {
  return (
    <FormField id={id} label={label} type="email" autoComplete="email" registration={registration} error={error} />
  );
}

/** A password field: "new" ones carry the length rule as a hint and ask the browser to suggest one. */
export function PasswordField({
  registration,
  error,
  id = 'password',
  label = 'Password',
  kind,
}: Props & { kind: 'new' | 'current' }) {
  return (
    <FormField
      id={id}
      label={label}
      type="password"
      autoComplete={kind === 'new' ? 'new-password' : 'current-password'}
      hint={
        kind === 'new'
          ? `At least ${PASSWORD_MIN_LENGTH} characters, no other rules. A few unrelated words are easy to remember and hard to guess.`
          : undefined
      }
      registration={registration}
      error={error}
    />
  );
}
