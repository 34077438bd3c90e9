import type { Role } from '../../lib/auth/actor';
import { roleHome } from '../../lib/auth/page-access';
import { SignInSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { EmailField, PasswordField } from './AccountFields';
import { useApiForm } from './useApiForm';

interface Props {
  /** Where to go after signing in (a same-site path); null: the role's home page. */
  next: string | null;
}

/** E-mail and password sign-in; on success the browser goes to `next`. */
export default function SignInForm({ next }: Props) {
  const { form, onSubmit, formError } = useApiForm<
    { email: string; password: string },
    { email: string; password: string },
    { actor: { role: Role } }
  >({
    schema: SignInSchema,
    path: '/api/auth/sign-in',
    defaultValues: { email: '', password: '' },
    onSuccess: (data) => window.location.assign(next ?? roleHome(data.actor.role)),
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Sign in">
      <FormAlert kind="error" message={formError} />
      <EmailField registration={form.register('email')} error={errors.email} />
      <PasswordField kind="current" registration={form.register('password')} error={errors.password} />
      <div className="flex flex-wrap items-center gap-4">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>
          {isSubmitting ? 'Signing in…' : 'Sign in'}
        </button>
        <a href="/forgot-password">Forgot your password?</a>
      </div>
    </form>
  );
}
