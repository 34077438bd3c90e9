/**
 * Merging a proposed school into an existing one, in two steps: pick the school to keep (the near-duplicate
 * names first, or any approved school found by name), then confirm with what moves — its teachers, classes
 * (with their kits and entries) and events, read from GET /api/schools/ID — before POST /api/schools/ID/merge.
 */
import { useEffect, useRef, useState } from 'react';
import { api, apiSettle } from '../../lib/http/client';
import type { SchoolDuplicate, SchoolRecord } from '../../lib/reach/school-schema';
import { FormAlert } from '../auth/FormAlert';

type Target = { id: string; name: string; city: string; note?: string };

interface Props {
  school: SchoolRecord;
  similar: SchoolDuplicate['similar'];
  onMerged: (message: string) => void;
  onCancel: () => void;
}

interface People {
  teachers: { displayName: string }[];
  classes: { name: string }[];
  events: { title: string }[];
}

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export default function SchoolMergePanel({ school, similar, onMerged, onCancel }: Props) {
  const [search, setSearch] = useState('');
  const [found, setFound] = useState<Target[]>([]);
  const [target, setTarget] = useState<Target | null>(null);
  const [people, setPeople] = useState<People | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const confirmHeading = useRef<HTMLHeadingElement>(null);
  const searchBox = useRef<HTMLInputElement>(null);
  const candidates: Target[] = [
    ...similar.map((s) => ({ ...s, note: `similar name, ${Math.round(s.similarity * 100)}%` })),
    ...found.filter((f) => f.id !== school.id && !similar.some((s) => s.id === f.id)),
  ];

  useEffect(() => {
    if (search.trim().length < 2) return setFound([]);
    const abort = new AbortController();
    api<{ schools: SchoolRecord[] }>('/api/schools/directory', {
      query: { q: search.trim(), status: 'approved', pageSize: 10 },
      signal: abort.signal,
    })
      .then((d) => setFound(d.schools))
      .catch((e: Error) => abort.signal.aborted || setError(e.message));
    return () => abort.abort();
  }, [search]);
  useEffect(() => (people ? confirmHeading.current : searchBox.current)?.focus(), [people]);

  async function review() {
    setError(null);
    const result = await apiSettle<People>(`/api/schools/${school.id}`);
    if (result.ok) setPeople(result.data);
    else setError(result.error.message);
  }

  async function merge() {
    setBusy(true);
    const result = await apiSettle(`/api/schools/${school.id}/merge`, { body: { intoId: target!.id } });
    setBusy(false);
    if (!result.ok) return setError(result.error.message);
    onMerged(`Merged ${school.name} into ${target!.name}.`);
  }

  if (people && target) {
    return (
      <div className="mt-3 space-y-3 rounded-lg border border-ink/15 p-4" data-testid="merge-confirm">
        <h4 ref={confirmHeading} tabIndex={-1} className="font-semibold">
          Merge {school.name} into {target.name}?
        </h4>
        <p className="text-sm">
          {count(people.teachers.length, 'teacher', 'teachers')}, {count(people.classes.length, 'class', 'classes')}{' '}
          (with their kits and journal entries) and {count(people.events.length, 'event', 'events')} move to{' '}
          {target.name}, {target.city}. {school.name} is then removed from the directory. This cannot be undone.
        </p>
        {people.teachers.length > 0 && (
          <p className="text-sm text-ink-soft">Teachers: {people.teachers.map((t) => t.displayName).join(', ')}</p>
        )}
        <FormAlert kind="error" message={error} />
        <div className="flex gap-3">
          <button type="button" className="btn-primary" disabled={busy} onClick={() => void merge()}>
            Merge now
          </button>
          <button type="button" className="btn-secondary" onClick={() => setPeople(null)}>
            Back
          </button>
        </div>
      </div>
    );
  }

  return (
    <fieldset className="mt-3 space-y-3 rounded-lg border border-ink/15 p-4">
      <legend className="px-1 font-semibold">Merge {school.name} into an existing school</legend>
      <label className="block text-sm">
        Find another school by name or city
        <input
          ref={searchBox}
          className="field-input"
          type="search"
          value={search}
          onChange={(e) => setSearch((e.target as HTMLInputElement).value)}
        />
      </label>
      {candidates.length === 0 ? (
        <p className="text-sm">No similar school found: search for the school to keep.</p>
      ) : (
        <ul className="space-y-1">
          {candidates.map((c) => (
            <li key={c.id}>
              <label className="text-sm">
                <input
                  type="radio"
                  name={`merge-into-${school.id}`}
                  className="mr-2"
                  checked={target?.id === c.id}
                  onChange={() => setTarget(c)}
                />
                {c.name}, {c.city}
                {c.note && <span className="text-ink-soft"> ({c.note})</span>}
              </label>
            </li>
          ))}
        </ul>
      )}
      <FormAlert kind="error" message={error} />
      <div className="flex gap-3">
        <button type="button" className="btn-primary" disabled={!target} onClick={() => void review()}>
          Review the merge
        </button>
        <button type="button" className="btn-secondary" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </fieldset>
  );
}
