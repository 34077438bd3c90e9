/**
 * A coordinator's decision on one entry: publish after ticking every check, or send it back to its teacher with
 * a note saying what to change, or decline it with a reason. A 409 (someone decided first) is shown as the server
 * words it, naming who.
 */
import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import { ENTRY_NOTE_MAX, REVIEW_CHECKLIST, type ReviewChecklistItem } from '../../lib/journal/entry-rules';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  entryId: string;
}

const ITEMS = Object.keys(REVIEW_CHECKLIST) as ReviewChecklistItem[];

/** The review form. */
export default function ReviewDecision({ entryId }: Props) {
  const [checks, setChecks] = useState<Record<string, boolean>>({});
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  // A fixed id: the page's plot islands number their useId ids from the same start as this one would.
  const noteId = 'review-note';
  const allTicked = ITEMS.every((i) => checks[i]);

  async function decide(decision: 'publish' | 'return' | 'decline') {
    setBusy(true);
    setError(null);
    const body =
      decision === 'publish'
        ? { decision, checklist: Object.fromEntries(ITEMS.map((i) => [i, true])), ...(note ? { note } : {}) }
        : { decision, note };
    const result = await apiSettle<{ state: string }>(`/api/review/${entryId}/decision`, { body });
    if (!result.ok) {
      setBusy(false);
      setError(result.error.message);
      return;
    }
    window.location.assign(`/review?decided=${result.data.state}`);
  }

  return (
    <section className="card space-y-4" aria-labelledby="decision-h" data-testid="review-decision">
      <h2 id="decision-h" className="text-xl font-bold">
        Decision
      </h2>
      <fieldset className="space-y-2">
        <legend className="font-semibold">Before publishing, check that the entry has:</legend>
        {ITEMS.map((item) => (
          <label key={item} className="flex items-start gap-2">
            <input
              type="checkbox"
              className="mt-1"
              checked={checks[item] ?? false}
              onChange={(e) => {
                const on = e.currentTarget.checked;
                setChecks((c) => ({ ...c, [item]: on }));
              }}
            />
            {REVIEW_CHECKLIST[item]}
          </label>
        ))}
      </fieldset>
      <div>
        <label className="field-label" htmlFor={noteId}>
          Note to the teacher
        </label>
        <p className="text-sm text-ink-soft">
          Required to send an entry back or decline it: say what to change or why.
        </p>
        <textarea
          id={noteId}
          className="field-input min-h-24 w-full"
          maxLength={ENTRY_NOTE_MAX}
          value={note}
          onChange={(e) => setNote(e.currentTarget.value)}
        />
      </div>
      <div className="flex flex-wrap gap-3">
        <button
          type="button"
          className="btn-primary"
          disabled={busy || !allTicked}
          onClick={() => void decide('publish')}
        >
          Publish
        </button>
        <button
          type="button"
          className="btn-secondary"
          disabled={busy || !note.trim()}
          onClick={() => void decide('return')}
        >
          Send back with the note
        </button>
        <button
          type="button"
          className="btn-secondary"
          disabled={busy || !note.trim()}
          onClick={() => void decide('decline')}
        >
          Decline
        </button>
      </div>
      {error && <FormAlert kind="error" message={error} />}
    </section>
  );
}
