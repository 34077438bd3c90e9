import { ForgotPasswordSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { EmailField } from './AccountFields';
import { useApiForm } from './useApiForm';

/** Asks for a reset link by e-mail; the answer is the same whether or not the address has an account. */
export default function ForgotPasswordForm() {
  const { form, onSubmit, formError, success } = useApiForm({
    schema: ForgotPasswordSchema,
    path: '/api/auth/forgot-password',
    defaultValues: { email: '' },
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Reset your password">
      <FormAlert kind="error" message={formError} />
      <FormAlert kind="success" message={success} />
      <EmailField label="E-mail address of your account" registration={form.register('email')} error={errors.email} />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Send me a reset link
      </button>
    </form>
  );
}
