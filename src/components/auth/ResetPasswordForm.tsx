import { ResetPasswordSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { PasswordField } from './AccountFields';
import { useApiForm } from './useApiForm';

interface Props {
  token: string;
}

/** The typed field of ResetPasswordSchema; the token comes from the link and is sent alongside. */
const ResetPasswordFieldsSchema = ResetPasswordSchema.omit({ token: true });

/** Chooses a new password from a reset link; every other session of the account ends. */
export default function ResetPasswordForm({ token }: Props) {
  const { form, onSubmit, formError, success } = useApiForm({
    schema: ResetPasswordFieldsSchema,
    path: '/api/auth/reset-password',
    defaultValues: { password: '' },
    extra: { token },
  });
  const { errors, isSubmitting, isSubmitSuccessful } = form.formState;
  if (success && isSubmitSuccessful) {
    return (
      <div className="space-y-3">
        <FormAlert kind="success" message={success} />
        <a href="/account" className="btn-primary">
          Go to my account
        </a>
      </div>
    );
  }
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Choose a new password">
      <FormAlert kind="error" message={formError} />
      <PasswordField kind="new" label="New password" registration={form.register('password')} error={errors.password} />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Set my new password
      </button>
    </form>
  );
}
