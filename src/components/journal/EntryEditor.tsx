/**
 * Writing a draft or returned entry: title, Markdown body with a preview (the server's sanitized HTML, the same
 * readers will see), the activity and the kit, the team name of a team entry, and the saved results (added from
 * the data tools' "Save to the class journal", removed here). Saves with PATCH; the server checks every field.
 */
import { useState } from 'react';
import type { SavedResult } from '../../lib/analysis/saved-result';
import { apiSettle } from '../../lib/http/client';
import {
  ENTRY_BODY_MAX,
  ENTRY_SAVED_RESULTS_MAX,
  ENTRY_TEAM_NAME_MAX,
  ENTRY_TITLE_MAX,
} from '../../lib/journal/entry-rules';
import { FormAlert } from '../auth/FormAlert';
import FieldShell from '../tools/FieldShell';
import SelectField from '../tools/SelectField';
import TextField from '../tools/TextField';

interface Option {
  value: string;
  label: string;
}

interface Props {
  entryId: string;
  title: string;
  body: string;
  bodyHtml: string;
  activitySlug: string | null;
  kitId: string | null;
  teamName: string | null;
  savedResults: SavedResult[];
  activities: Option[];
  kits: Option[];
}

interface Saved {
  entry: { bodyHtml: string; savedResults: SavedResult[] };
}

/** The entry form. */
export default function EntryEditor(props: Props) {
  const [title, setTitle] = useState(props.title);
  const [body, setBody] = useState(props.body);
  const [bodyHtml, setBodyHtml] = useState(props.bodyHtml);
  const [activitySlug, setActivitySlug] = useState(props.activitySlug ?? '');
  const [kitId, setKitId] = useState(props.kitId ?? '');
  const [teamName, setTeamName] = useState(props.teamName ?? '');
  const [results, setResults] = useState(props.savedResults);
  const [tab, setTab] = useState<'write' | 'preview'>('write');
  const [busy, setBusy] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);

  async function save(patch: Record<string, unknown> = {}): Promise<boolean> {
    setBusy(true);
    setMessage(null);
    const result = await apiSettle<Saved>(`/api/entries/${props.entryId}`, {
      method: 'PATCH',
      body: {
        title,
        body,
        activitySlug: activitySlug || null,
        kitId: kitId || null,
        ...(props.teamName !== null ? { teamName } : {}),
        savedResults: results,
        ...patch,
      },
    });
    setBusy(false);
    if (!result.ok) {
      setFields(result.error.fields);
      setMessage({ kind: 'error', text: result.error.message });
      return false;
    }
    setFields({});
    setBodyHtml(result.data.entry.bodyHtml);
    setResults(result.data.entry.savedResults);
    setMessage({ kind: 'success', text: 'Draft saved.' });
    return true;
  }

  async function preview() {
    if (await save()) setTab('preview');
  }

  const err = (name: string) => fields[name]?.join(' ');
  return (
    <form
      className="card space-y-5"
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
      aria-label="Entry"
    >
      {props.teamName !== null && (
        <TextField
          label="Team name"
          name="teamName"
          hint="A team name only, never students' names."
          error={err('teamName')}
          value={teamName}
          maxLength={ENTRY_TEAM_NAME_MAX}
          onChange={setTeamName}
        />
      )}
      <TextField
        label="Title"
        name="title"
        error={err('title')}
        value={title}
        maxLength={ENTRY_TITLE_MAX}
        required
        onChange={setTitle}
      />
      <div>
        <div role="tablist" aria-label="Body" className="flex gap-2">
          <button
            type="button"
            role="tab"
            aria-selected={tab === 'write'}
            className={tab === 'write' ? 'btn-primary' : 'btn-secondary'}
            onClick={() => setTab('write')}
          >
            Write
          </button>
          <button
            type="button"
            role="tab"
            aria-selected={tab === 'preview'}
            className={tab === 'preview' ? 'btn-primary' : 'btn-secondary'}
            onClick={() => void preview()}
            disabled={busy}
          >
            Preview (saves the draft)
          </button>
        </div>
        {tab === 'write' ? (
          <FieldShell
            label="What your class did and found"
            hint="Markdown: **bold**, *italic*, lists with -, links as [words](https://…). No student names."
            error={err('body')}
          >
            {({ id, describedBy }) => (
              <textarea
                id={id}
                name="body"
                className="field-input min-h-48 w-full font-mono text-sm"
                value={body}
                maxLength={ENTRY_BODY_MAX}
                aria-describedby={describedBy}
                onChange={(e) => setBody(e.currentTarget.value)}
              />
            )}
          </FieldShell>
        ) : (
          <div
            role="tabpanel"
            className="prose mt-3 max-w-prose rounded border border-ink/10 p-3"
            data-testid="entry-preview"
            // The server's sanitized HTML (markdown-it with raw HTML off, then sanitize-html).
            dangerouslySetInnerHTML={{ __html: bodyHtml || '<p><em>Nothing written yet.</em></p>' }}
          />
        )}
      </div>
      <div className="flex flex-wrap gap-6">
        <SelectField
          label="Activity"
          name="activitySlug"
          value={activitySlug}
          onChange={setActivitySlug}
          options={[{ value: '', label: 'No activity' }, ...props.activities]}
          error={err('activitySlug')}
        />
        <SelectField
          label="Kit"
          name="kitId"
          value={kitId}
          onChange={setKitId}
          hint={props.kits.length === 0 ? 'This class has no saved kit yet.' : undefined}
          options={[{ value: '', label: 'No kit' }, ...props.kits]}
          error={err('kitId')}
        />
      </div>
      <section aria-labelledby="entry-results-h">
        <h2 id="entry-results-h" className="text-lg font-semibold">
          Results ({results.length} of {ENTRY_SAVED_RESULTS_MAX})
        </h2>
        {results.length === 0 ? (
          <p className="text-ink-soft">
            No results yet. On a <a href="/tools">data tool</a>, run your readings and press “Save to the class
            journal”.
          </p>
        ) : (
          <ul className="mt-2 space-y-2" data-testid="entry-results">
            {results.map((r, i) => (
              <li key={`${r.tool}-${i}`} className="flex flex-wrap items-center gap-3">
                <span>
                  <strong>{r.plot.title}</strong> <span className="text-sm text-ink-soft">{r.inputsSummary}</span>
                </span>
                <button
                  type="button"
                  className="btn-secondary py-1 text-sm"
                  disabled={busy}
                  onClick={() => void save({ savedResults: results.filter((_, j) => j !== i) })}
                >
                  Remove
                </button>
              </li>
            ))}
          </ul>
        )}
      </section>
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Saving…' : 'Save draft'}
      </button>
      {message && <FormAlert kind={message.kind} message={message.text} />}
    </form>
  );
}
