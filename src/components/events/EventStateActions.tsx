/**
 * Publish, unpublish or cancel an event (PATCH with its state). Publishing makes the page public and opens
 * registration; cancelling keeps the page, marked cancelled, and asks first because registrants are not
 * e-mailed by it.
 */
import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  eventId: string;
  state: 'draft' | 'published' | 'cancelled';
  /** People holding a place or a waiting-list spot, named in the cancel question. */
  registered: number;
}

type Target = Props['state'];

export default function EventStateActions({ eventId, state, registered }: Props) {
  const [busy, setBusy] = useState(false);
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function change(next: Target) {
    setBusy(true);
    setError(null);
    const result = await apiSettle(`/api/events/${eventId}`, { method: 'PATCH', body: { state: next } });
    if (result.ok) {
      window.location.reload();
      return;
    }
    setError(result.error.message);
    setBusy(false);
  }
  return (
    <div className="space-y-3">
      <FormAlert kind="error" message={error} />
      <div className="flex flex-wrap gap-3">
        {state !== 'published' && (
          <button type="button" className="btn-primary" disabled={busy} onClick={() => void change('published')}>
            {state === 'draft' ? 'Publish' : 'Publish again'}
          </button>
        )}
        {state === 'published' && (
          <button type="button" className="btn-secondary" disabled={busy} onClick={() => void change('draft')}>
            Back to draft
          </button>
        )}
        {state !== 'cancelled' && !asking && (
          <button type="button" className="btn-secondary" disabled={busy} onClick={() => setAsking(true)}>
            Cancel the event…
          </button>
        )}
      </div>
      {asking && (
        <div
          role="group"
          aria-label="Cancel the event?"
          className="rounded-lg border border-danger/30 bg-danger-light p-3"
        >
          <p className="text-danger">
            Cancel this event? Its page stays up, marked cancelled, and registration closes.{' '}
            {registered > 0
              ? `The ${registered} registered ${registered === 1 ? 'person is' : 'people are'} not e-mailed by this: export the list and write to them.`
              : 'Nobody has registered yet.'}
          </p>
          <div className="mt-2 flex gap-3">
            <button type="button" className="btn-primary" disabled={busy} onClick={() => void change('cancelled')}>
              Yes, cancel the event
            </button>
            <button type="button" className="btn-secondary" disabled={busy} onClick={() => setAsking(false)}>
              Keep it
            </button>
          </div>
        </div>
      )}
    </div>
  );
}
