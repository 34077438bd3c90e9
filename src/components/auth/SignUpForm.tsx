import { useState } from 'react';
import { SignUpSchema } from '../../lib/auth/schemas';
import { FormAlert } from './FormAlert';
import { EmailField, PasswordField } from './AccountFields';
import { FormField } from './FormField';
import { useApiForm } from './useApiForm';

interface Props {
  schools: { id: string; name: string; city: string }[];
}

/** Teacher sign-up: name, e-mail, password, and a school from the list or a proposed new one. */
export default function SignUpForm({ schools }: Props) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { form, onSubmit, formError, success } = useApiForm({
    schema: SignUpSchema,
    path: '/api/auth/sign-up',
    defaultValues: {
      displayName: '',
      email: '',
      password: '',
      schoolChoice: 'existing',
      schoolId: '',
      proposedSchoolName: '',
      proposedSchoolCity: '',
    },
    onSuccess: (_data, values) => setSentTo(values.email),
  });
  const { errors, isSubmitting } = form.formState;
  const choice = form.watch('schoolChoice');
  if (sentTo) {
    return (
      <div className="space-y-3">
        <FormAlert kind="success" message={success} />
        <p className="text-ink-soft">
          Did not get it? Check the spam folder, or <a href="/sign-in">sign in</a> to have a new link sent.
        </p>
      </div>
    );
  }
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Create a teacher account">
      <FormAlert kind="error" message={formError} />
      <FormField
        id="displayName"
        label="Your name"
        autoComplete="name"
        hint="As your colleagues and the outreach office know you."
        registration={form.register('displayName')}
        error={errors.displayName}
      />
      <EmailField label="School e-mail address" registration={form.register('email')} error={errors.email} />
      <PasswordField kind="new" registration={form.register('password')} error={errors.password} />
      <fieldset className="space-y-3">
        <legend className="field-label">Your school</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" value="existing" {...form.register('schoolChoice')} /> It is in the list
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="proposed" {...form.register('schoolChoice')} /> It is not listed yet
          </label>
        </div>
        {choice === 'existing' ? (
          <div>
            <label htmlFor="schoolId" className="field-label">
              School
            </label>
            <select
              id="schoolId"
              className="field-input"
              aria-invalid={errors.schoolId ? true : undefined}
              aria-describedby={errors.schoolId ? 'schoolId-error' : undefined}
              {...form.register('schoolId')}
            >
              <option value="">Choose your school…</option>
              {schools.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                  {s.city ? ` (${s.city})` : ''}
                </option>
              ))}
            </select>
            {errors.schoolId?.message && (
              <p id="schoolId-error" className="field-error">
                {errors.schoolId.message}
              </p>
            )}
          </div>
        ) : (
          <div className="grid gap-3 sm:grid-cols-2">
            <FormField
              id="proposedSchoolName"
              label="School name"
              registration={form.register('proposedSchoolName')}
              error={errors.proposedSchoolName}
            />
            <FormField
              id="proposedSchoolCity"
              label="Town or city"
              registration={form.register('proposedSchoolCity')}
              error={errors.proposedSchoolCity}
            />
            <p className="text-sm text-ink-soft sm:col-span-2">
              An outreach coordinator checks new schools; you can use Kitwright in the meantime.
            </p>
          </div>
        )}
      </fieldset>
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        {isSubmitting ? 'Creating your account…' : 'Create my account'}
      </button>
    </form>
  );
}
