/**
 * The button behind a mailed registration link: confirm the address (and get a place or a waiting-list spot)
 * or cancel. The page only shows what the link is about; the change happens on this POST, never on opening the
 * link, so a mail scanner that follows links changes nothing.
 */
import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  action: 'confirm' | 'cancel';
  token: string;
  eventHref: string;
}

type ConfirmAnswer = { registration: { state: 'confirmed' | 'waitlisted'; position?: number } };
type CancelAnswer = { registration: { state: 'cancelled'; promoted: boolean } };

function confirmText({ registration }: ConfirmAnswer): string {
  return registration.state === 'waitlisted'
    ? `Your address is confirmed. The event filled up, so you are number ${registration.position ?? '?'} on the waiting list; if a place comes free it is yours and we e-mail you.`
    : 'Your registration is confirmed: you have a place. We e-mailed you the details with a calendar file.';
}

function cancelText({ registration }: CancelAnswer): string {
  return registration.promoted
    ? 'Your registration is cancelled. Your place went to the first person on the waiting list. Thank you for letting us know.'
    : 'Your registration is cancelled. Thank you for letting us know.';
}

export default function RegistrationLinkAction({ action, token, eventHref }: Props) {
  const [state, setState] = useState<'idle' | 'busy'>('idle');
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  async function submit(event: { preventDefault(): void }) {
    event.preventDefault();
    setState('busy');
    setError(null);
    const result = await apiSettle<ConfirmAnswer | CancelAnswer>(`/api/events/registrations/${action}`, {
      body: { token },
    });
    if (!result.ok) setError(result.error.message);
    else
      setDone(
        action === 'confirm' ? confirmText(result.data as ConfirmAnswer) : cancelText(result.data as CancelAnswer),
      );
    setState('idle');
  }
  if (done) {
    return (
      <div className="space-y-3">
        <FormAlert kind="success" message={done} />
        <a href={eventHref}>Back to the event</a>
      </div>
    );
  }
  return (
    <form method="post" onSubmit={submit} className="space-y-4">
      <FormAlert kind="error" message={error} />
      <button
        type="submit"
        className={action === 'confirm' ? 'btn-primary' : 'btn-secondary'}
        disabled={state === 'busy'}
      >
        {action === 'confirm' ? 'Confirm my registration' : 'Cancel my registration'}
      </button>
    </form>
  );
}
