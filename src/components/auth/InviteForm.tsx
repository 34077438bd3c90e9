import { InvitationCreateSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { EmailField } from './AccountFields';
import { useApiForm } from './useApiForm';

/** An admin invites a coordinator or admin by e-mail (one-time link, 7 days). */
export default function InviteForm() {
  const { form, onSubmit, formError, success } = useApiForm<
    { email: string; role: 'coordinator' | 'admin' },
    { email: string; role: 'coordinator' | 'admin' },
    { invitation: { email: string; validDays: number } }
  >({
    schema: InvitationCreateSchema,
    path: '/api/admin/invitations',
    defaultValues: { email: '', role: 'coordinator' },
    onSuccess: () => form.reset({ email: '', role: 'coordinator' }),
  });
  const { errors, isSubmitting, isSubmitSuccessful } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Invite staff">
      <FormAlert kind="error" message={formError} />
      <FormAlert
        kind="success"
        message={success ?? (isSubmitSuccessful ? 'Invitation sent; it works for 7 days.' : null)}
      />
      <EmailField id="invite-email" registration={form.register('email')} error={errors.email} />
      <div>
        <label htmlFor="invite-role" className="field-label">
          Role
        </label>
        <select id="invite-role" className="field-input" {...form.register('role')}>
          <option value="coordinator">Outreach coordinator</option>
          <option value="admin">Admin</option>
        </select>
      </div>
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Send the invitation
      </button>
    </form>
  );
}
