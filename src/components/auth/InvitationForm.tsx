import { InvitationAcceptSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { PasswordField } from './AccountFields';
import { FormField } from './FormField';
import { useApiForm } from './useApiForm';

interface Props {
  token: string;
  email: string;
  roleLabel: string;
}

/** The typed fields of InvitationAcceptSchema (the token comes from the link). */
const InvitationFieldsSchema = InvitationAcceptSchema.omit({ token: true });

/** Accepts a staff invitation: choose a name and password; signs in on success. */
export default function InvitationForm({ token, email, roleLabel }: Props) {
  const { form, onSubmit, formError } = useApiForm({
    schema: InvitationFieldsSchema,
    path: '/api/auth/invitation',
    defaultValues: { displayName: '', password: '' },
    extra: { token },
    onSuccess: () => window.location.assign('/account?welcome=1'),
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Accept the invitation">
      <p className="text-ink-soft">
        You are joining as {roleLabel} with the address <strong>{email}</strong>.
      </p>
      <FormAlert kind="error" message={formError} />
      <FormField
        id="displayName"
        label="Your name"
        autoComplete="name"
        registration={form.register('displayName')}
        error={errors.displayName}
      />
      <PasswordField kind="new" registration={form.register('password')} error={errors.password} />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Create my account
      </button>
    </form>
  );
}
