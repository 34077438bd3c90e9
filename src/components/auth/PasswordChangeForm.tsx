import { PasswordChangeSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { PasswordField } from './AccountFields';
import { useApiForm } from './useApiForm';

/** Changes the password of the signed-in account; other devices are signed out. */
export default function PasswordChangeForm() {
  const { form, onSubmit, formError, success } = useApiForm({
    schema: PasswordChangeSchema,
    path: '/api/auth/password',
    defaultValues: { currentPassword: '', newPassword: '' },
    onSuccess: () => form.reset({ currentPassword: '', newPassword: '' }),
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Change your password">
      <FormAlert kind="error" message={formError} />
      <FormAlert kind="success" message={success} />
      <PasswordField
        kind="current"
        id="currentPassword"
        label="Current password"
        registration={form.register('currentPassword')}
        error={errors.currentPassword}
      />
      <PasswordField
        kind="new"
        id="newPassword"
        label="New password"
        registration={form.register('newPassword')}
        error={errors.newPassword}
      />
      <button type="submit" className="btn-secondary" disabled={isSubmitting}>
        Change my password
      </button>
    </form>
  );
}
