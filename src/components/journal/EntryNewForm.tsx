/**
 * Starting an entry: a teacher picks the class, a team (through its class session) gives its team name; both give
 * a title. The draft is created at once and its page opens to write the rest and add photos.
 */
import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import { ENTRY_TEAM_NAME_MAX, ENTRY_TITLE_MAX } from '../../lib/journal/entry-rules';
import { FormAlert } from '../auth/FormAlert';
import TextField from '../tools/TextField';
import SelectField from '../tools/SelectField';

interface Props {
  /** The teacher's classes; null for a class session (which writes as a team). */
  classes: { value: string; label: string }[] | null;
}

/** The new-entry form. */
export default function EntryNewForm({ classes }: Props) {
  const [classId, setClassId] = useState(classes?.[0]?.value ?? '');
  const [teamName, setTeamName] = useState('');
  const [title, setTitle] = useState('');
  const [busy, setBusy] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [error, setError] = useState<string | null>(null);

  async function create() {
    setBusy(true);
    const result = await apiSettle<{ entry: { id: string } }>('/api/entries', {
      body: classes ? { classId, title } : { teamName, title },
    });
    if (!result.ok) {
      setBusy(false);
      setFields(result.error.fields);
      setError(result.error.message);
      return;
    }
    window.location.assign(`/entries/${result.data.entry.id}/edit`);
  }

  return (
    <form
      className="card max-w-2xl space-y-4"
      aria-label="New entry"
      onSubmit={(e) => {
        e.preventDefault();
        void create();
      }}
    >
      <h2 className="text-xl font-bold">Start an entry</h2>
      {classes ? (
        <SelectField label="Class" name="classId" value={classId} onChange={setClassId} options={classes} />
      ) : (
        <TextField
          label="Team name"
          name="teamName"
          hint="A team name only (e.g. Team Comet), never students' names."
          error={fields.teamName?.join(' ')}
          required
          maxLength={ENTRY_TEAM_NAME_MAX}
          value={teamName}
          onChange={setTeamName}
        />
      )}
      <TextField
        label="Title"
        name="title"
        error={fields.title?.join(' ')}
        required
        maxLength={ENTRY_TITLE_MAX}
        value={title}
        onChange={setTitle}
      />
      <button type="submit" className="btn-primary" disabled={busy || (classes !== null && !classId)}>
        Start the entry
      </button>
      {error && <FormAlert kind="error" message={error} />}
    </form>
  );
}
