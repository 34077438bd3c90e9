/**
 * What an entry's teacher or team may do to it now: submit (with the photo-release confirmation when it has
 * photos), withdraw a submitted entry, approve a team's submitted entry, delete a draft. The server decides again;
 * this island only offers the actions the entry's state allows and reloads the page after one.
 */
import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import { PHOTO_RELEASE_STATEMENT } from '../../lib/photos/photo-rules';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  entryId: string;
  /** The entry's state as the page read it. */
  state: string;
  authorKind: 'teacher' | 'team';
  teacherApproved: boolean;
  /** The visitor is the class's teacher (not the class session). */
  asTeacher: boolean;
  /** The visitor may change the entry now (draft or returned, on its author side). */
  editable: boolean;
  photoCount: number;
  /** Where to go after deleting. */
  listHref: string;
}

/** The entry's action buttons. */
export default function EntryActions(props: Props) {
  const { entryId, state, authorKind, teacherApproved, asTeacher, editable, photoCount, listHref } = props;
  const [confirmed, setConfirmed] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const approving = asTeacher && state === 'submitted' && authorKind === 'team' && !teacherApproved;
  // A team's own submission waits for the teacher, who confirms the photos when approving. The box shows even
  // with no photos counted at load, since photos may be added on this page meanwhile; the server decides.
  const needsConsent = asTeacher && (editable || approving);

  async function act(path: string, body?: unknown, method: 'POST' | 'DELETE' = 'POST', next?: string) {
    setBusy(true);
    setError(null);
    const result = await apiSettle(path, { method, body });
    if (!result.ok) {
      setError(result.error.message);
      setBusy(false);
      return;
    }
    window.location.assign(next ?? window.location.pathname);
  }

  if (!editable && !approving && !(asTeacher && state === 'submitted')) return null;
  return (
    <div className="card no-print space-y-3" data-testid="entry-actions">
      {needsConsent && (
        // Wrapped, not tied by id: each island numbers its useId ids from the same start, so ids can repeat.
        <label className="flex items-start gap-2">
          <input
            type="checkbox"
            className="mt-1"
            checked={confirmed}
            onChange={(e) => setConfirmed(e.currentTarget.checked)}
          />
          <span>
            <strong>I confirm:</strong> {PHOTO_RELEASE_STATEMENT}
          </span>
        </label>
      )}
      <div className="flex flex-wrap gap-3">
        {editable && (
          <button
            type="button"
            className="btn-primary"
            disabled={busy || (needsConsent && photoCount > 0 && !confirmed)}
            onClick={() => void act(`/api/entries/${entryId}/submit`, { photosConfirmed: confirmed })}
          >
            {asTeacher ? 'Submit for review' : 'Send to our teacher'}
          </button>
        )}
        {approving && (
          <button
            type="button"
            className="btn-primary"
            disabled={busy || (needsConsent && photoCount > 0 && !confirmed)}
            onClick={() => void act(`/api/entries/${entryId}/approve`, { photosConfirmed: confirmed })}
          >
            Approve and send for review
          </button>
        )}
        {asTeacher && state === 'submitted' && (
          <button
            type="button"
            className="btn-secondary"
            disabled={busy}
            onClick={() => void act(`/api/entries/${entryId}/withdraw`)}
          >
            Withdraw (back to draft)
          </button>
        )}
        {editable && (
          <button
            type="button"
            className="btn-secondary"
            disabled={busy}
            onClick={() => {
              if (window.confirm('Delete this entry, its photos and its results? This cannot be undone.'))
                void act(`/api/entries/${entryId}`, undefined, 'DELETE', listHref);
            }}
          >
            Delete entry
          </button>
        )}
      </div>
      {needsConsent && !confirmed && photoCount > 0 && (
        <p className="text-sm text-ink-soft">Tick the confirmation first: this entry has photos.</p>
      )}
      {error && <FormAlert kind="error" message={error} />}
    </div>
  );
}
