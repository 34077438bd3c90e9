/**
 * The registration box of a public event page: a signed-in teacher registers in one click; anyone else gives a
 * name and a school e-mail (the shared RegistrationCreateSchema checks both here and on the server) and gets
 * the place when they confirm the mailed link. A full event says that a registration joins the waiting list.
 */
import { useState } from 'react';
import type { z } from 'zod';
import { REGISTRANT_NAME_MAX, RegistrationCreateSchema, type RegistrationCreate } from '../../lib/events/event-schemas';
import { apiSettle } from '../../lib/http/client';
import { EmailField } from '../auth/AccountFields';
import { FormAlert } from '../auth/FormAlert';
import { FormField } from '../auth/FormField';
import { useApiForm } from '../auth/useApiForm';
import RegisteredSelect from './RegisteredSelect';

interface Outcome {
  state: 'pending' | 'confirmed' | 'waitlisted' | 'cancelled';
  position?: number;
}

interface Props {
  eventId: string;
  /** Every place is taken: a registration goes on the waiting list. */
  full: boolean;
  /** The signed-in teacher, who registers as themselves; null for a visitor without an account. */
  teacher: { name: string; email: string } | null;
  schools: { id: string; name: string; city: string }[];
}

/** The sentence shown once the server has answered a registration. */
function outcomeText(outcome: Outcome, email: string): string {
  if (outcome.state === 'pending') {
    return `Almost done: we sent a link to ${email}. Your registration counts once you open it and confirm.`;
  }
  if (outcome.state === 'waitlisted') {
    return `The event is full, so you are number ${outcome.position ?? '?'} on the waiting list. If a place comes free it is yours, and we e-mail ${email}.`;
  }
  return `You have a place. We e-mailed ${email} the details with a calendar file and a link to cancel.`;
}

export default function EventRegistration({ eventId, full, teacher, schools }: Props) {
  const [done, setDone] = useState<string | null>(null);
  if (done) return <FormAlert kind="success" message={done} />;
  return teacher ? (
    <TeacherRegistration eventId={eventId} full={full} teacher={teacher} onDone={setDone} />
  ) : (
    <EmailRegistration eventId={eventId} full={full} schools={schools} onDone={setDone} />
  );
}

function TeacherRegistration({
  eventId,
  full,
  teacher,
  onDone,
}: Pick<Props, 'eventId' | 'full'> & { teacher: { name: string; email: string }; onDone: (text: string) => void }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function register(e: { preventDefault(): void }) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    const result = await apiSettle<{ registration: Outcome }>(`/api/events/${eventId}/registrations`, { body: {} });
    setBusy(false);
    if (result.ok) onDone(outcomeText(result.data.registration, teacher.email));
    else setError(result.error.message);
  }
  return (
    <form method="post" onSubmit={register} className="space-y-3" aria-label="Register for this event">
      <FormAlert kind="error" message={error} />
      <p>
        You are signed in as <strong>{teacher.name}</strong> ({teacher.email}); the confirmation goes to that address.
      </p>
      <button type="submit" className="btn-primary" disabled={busy}>
        {full ? 'Join the waiting list' : 'Register'}
      </button>
    </form>
  );
}

function EmailRegistration({
  eventId,
  full,
  schools,
  onDone,
}: Pick<Props, 'eventId' | 'full' | 'schools'> & { onDone: (text: string) => void }) {
  const { form, onSubmit, formError } = useApiForm<
    z.input<typeof RegistrationCreateSchema>,
    RegistrationCreate,
    { registration: Outcome }
  >({
    schema: RegistrationCreateSchema,
    path: `/api/events/${eventId}/registrations`,
    defaultValues: { name: '', email: '', schoolId: null },
    onSuccess: (data, values) => onDone(outcomeText(data.registration, values.email)),
  });
  const { errors, isSubmitting } = form.formState;
  const next = encodeURIComponent(`/events/${eventId}`);
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Register for this event">
      <FormAlert kind="error" message={formError} />
      <p className="text-sm text-ink-soft">
        Teachers with an account can <a href={`/sign-in?next=${next}`}>sign in</a> and register in one click.
      </p>
      <FormField
        id="name"
        label="Your name"
        autoComplete="name"
        maxLength={REGISTRANT_NAME_MAX}
        registration={form.register('name')}
        error={errors.name}
      />
      <EmailField label="School e-mail address" registration={form.register('email')} error={errors.email} />
      <RegisteredSelect
        label="School"
        empty="Not in the list, or I would rather not say"
        options={schools.map((sc) => ({ value: sc.id, label: sc.city ? `${sc.name} (${sc.city})` : sc.name }))}
        registration={form.register('schoolId', { setValueAs: (v: string | null) => (v ? v : null) })}
        error={errors.schoolId}
      />
      <p className="text-sm text-ink-soft">
        We e-mail you a link to confirm the address; the registration counts once you open it. We use your name and
        address for this event only.
      </p>
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        {full ? 'Join the waiting list' : 'Register'}
      </button>
    </form>
  );
}
