/**
 * "Save to the class journal" under a tool's result: for a signed-in teacher or a class session, adds the saved
 * result to one of their draft (or returned) entries, or starts a new draft with it. Anyone else is told how to
 * get there. The entries and classes are asked for only when the panel opens.
 */
import { useState } from 'react';
import type { SavedResult } from '../../lib/analysis/saved-result';
import { ApiError, api, apiSettle } from '../../lib/http/client';
import type { EntrySummary } from '../../lib/journal/entry-view.server';
import { ENTRY_SAVED_RESULTS_MAX, ENTRY_TEAM_NAME_MAX, ENTRY_TITLE_MAX } from '../../lib/journal/entry-rules';
import { FormAlert } from '../auth/FormAlert';
import TextField from './TextField';
import SelectField from './SelectField';

interface Choices {
  /** Entries that can still change (draft or returned) and have room for a result. */
  drafts: EntrySummary[];
  /** The teacher's classes; null for a class session (it writes as a team). */
  classes: { id: string; name: string }[] | null;
}

const NEW = 'new';

async function choicesLoad(): Promise<Choices> {
  const { entries } = await api<{ entries: EntrySummary[] }>('/api/entries');
  let classes: Choices['classes'] = null;
  try {
    classes = (await api<{ classes: { id: string; name: string }[] }>('/api/classes')).classes;
  } catch (err) {
    // A class session may not list classes (403): it writes for its own class as a team.
    if (!(err instanceof ApiError) || (err.status !== 403 && err.status !== 401)) throw err;
  }
  const drafts = entries.filter(
    (e) =>
      (e.state === 'draft' || e.state === 'returned') &&
      e.resultCount < ENTRY_SAVED_RESULTS_MAX &&
      (classes !== null || e.authorKind === 'team'),
  );
  return { drafts, classes };
}

/** The button and its panel. */
export default function SaveToJournal({ savedResult }: { savedResult: SavedResult }) {
  const [open, setOpen] = useState(false);
  const [choices, setChoices] = useState<Choices | null>(null);
  const [target, setTarget] = useState(NEW);
  const [classId, setClassId] = useState('');
  const [teamName, setTeamName] = useState('');
  const [title, setTitle] = useState(savedResult.plot.title);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<{ id: string; title: string } | null>(null);
  const [outside, setOutside] = useState(false);

  async function openPanel() {
    setOpen(true);
    setError(null);
    setSaved(null);
    try {
      const c = await choicesLoad();
      setChoices(c);
      setTarget(c.drafts[0]?.id ?? NEW);
      setClassId(c.classes?.[0]?.id ?? '');
    } catch (err) {
      if (err instanceof ApiError && (err.status === 401 || err.status === 403)) setOutside(true);
      else setError(err instanceof Error ? err.message : 'That did not work; try again.');
    }
  }

  async function save() {
    setBusy(true);
    setError(null);
    const result =
      target === NEW
        ? await apiSettle<{ entry: { id: string; title: string } }>('/api/entries', {
            body: {
              title,
              savedResults: [savedResult],
              ...(choices?.classes ? { classId } : { teamName }),
            },
          })
        : await apiSettle<{ entry: { id: string; title: string } }>(`/api/entries/${target}/results`, {
            body: { savedResult },
          });
    setBusy(false);
    if (!result.ok) setError(result.error.message);
    else setSaved(result.data.entry);
  }

  if (!open)
    return (
      <button type="button" className="btn-secondary" onClick={() => void openPanel()}>
        Save to the class journal
      </button>
    );
  return (
    <section className="card w-full space-y-3" aria-label="Save to the class journal" data-testid="save-to-journal">
      {outside ? (
        <p>
          Journal entries are written by teachers (<a href="/sign-in">sign in</a>) and by student teams through their
          class code (<a href="/join">join a class</a>).
        </p>
      ) : saved ? (
        <FormAlert kind="success" message={`Saved to “${saved.title}”.`} />
      ) : !choices ? (
        !error && <p className="text-ink-soft">Loading your entries…</p>
      ) : (
        <>
          <SelectField
            label="Save into"
            name="entry"
            value={target}
            onChange={setTarget}
            options={[
              ...choices.drafts.map((d) => ({
                value: d.id,
                label: `${d.title}${d.teamName ? ` (${d.teamName})` : ''} · ${d.resultCount} of ${ENTRY_SAVED_RESULTS_MAX} results`,
              })),
              { value: NEW, label: 'A new draft entry' },
            ]}
          />
          {target === NEW && (
            <div className="flex flex-wrap gap-6">
              {choices.classes ? (
                <SelectField
                  label="Class"
                  name="classId"
                  value={classId}
                  onChange={setClassId}
                  options={choices.classes.map((c) => ({ value: c.id, label: c.name }))}
                />
              ) : (
                <TextField
                  label="Team name"
                  name="teamName"
                  hint="A team name only, never students' names."
                  maxLength={ENTRY_TEAM_NAME_MAX}
                  value={teamName}
                  onChange={setTeamName}
                />
              )}
              <TextField
                label="Entry title"
                name="title"
                maxLength={ENTRY_TITLE_MAX}
                value={title}
                onChange={setTitle}
              />
            </div>
          )}
          <button type="button" className="btn-primary" disabled={busy} onClick={() => void save()}>
            Save the result
          </button>
        </>
      )}
      {saved && (
        <p>
          <a href={`/entries/${saved.id}/edit`}>Open the entry</a> to write about it and submit it.
        </p>
      )}
      {error && <FormAlert kind="error" message={error} />}
    </section>
  );
}
