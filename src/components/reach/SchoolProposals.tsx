/**
 * Schools teachers proposed, waiting for a coordinator: each with the existing schools of a similar name
 * (pg_trgm similarity, from the server) and three actions — accept it into the directory, edit its fields,
 * or merge it into the school it duplicates. The list shrinks as proposals are handled.
 */
import { useRef, useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import type { SchoolDuplicate, SchoolRecord } from '../../lib/reach/school-schema';
import { FormAlert } from '../auth/FormAlert';
import SchoolEditForm from './SchoolEditForm';
import SchoolMergePanel from './SchoolMergePanel';

interface Props {
  initial: SchoolDuplicate[];
}

/** The panels a proposal opens below itself, with their buttons' labels. */
const PANELS = [
  ['edit', 'Edit'],
  ['merge', 'Merge into…'],
] as const;
type Mode = (typeof PANELS)[number][0];
type Open = { id: string; mode: Mode } | null;
const panelButtonId = (schoolId: string, mode: Mode) => `proposal-${mode}-${schoolId}`;

const fieldsText = (s: SchoolRecord) =>
  [
    [s.district, s.region, s.country].filter(Boolean).join(' · ') || 'no district, region or country yet',
    s.setting,
    s.gradeBands.length ? `grades ${s.gradeBands.join(', ')}` : 'no grade bands yet',
    s.highNeed ? `high-need: ${s.highNeedBasis}${s.highNeedYear ? ` (${s.highNeedYear})` : ''}` : 'not high-need',
    `${s.teacherCount} ${s.teacherCount === 1 ? 'teacher' : 'teachers'}, ${s.classCount} ${s.classCount === 1 ? 'class' : 'classes'}`,
  ].join(' · ');

export default function SchoolProposals({ initial }: Props) {
  const [proposals, setProposals] = useState(initial);
  const [open, setOpen] = useState<Open>(null);
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const statusRef = useRef<HTMLDivElement>(null);

  function finish(id: string, message: string) {
    setProposals((list) => list.filter((p) => p.school.id !== id));
    setOpen(null);
    setError(null);
    setDone(`${message} The directory below shows it after a reload.`);
    statusRef.current?.focus();
  }

  async function accept(school: SchoolRecord) {
    setDone(null);
    const result = await apiSettle(`/api/schools/${school.id}`, { method: 'PATCH', body: { status: 'approved' } });
    if (result.ok) finish(school.id, `Accepted ${school.name} into the directory.`);
    else setError(`${school.name}: ${result.error.message}`);
  }

  function edited(school: SchoolRecord) {
    setProposals((list) => list.map((p) => (p.school.id === school.id ? { ...p, school } : p)));
    close();
    setDone(`Saved ${school.name}. It still waits to be accepted.`);
  }

  /** Closes the open panel and gives the focus back to the button that opened it. */
  function close() {
    const button = open && document.querySelector<HTMLButtonElement>(`#${panelButtonId(open.id, open.mode)}`);
    setOpen(null);
    button?.focus();
  }

  return (
    <div data-testid="school-proposals">
      <div ref={statusRef} tabIndex={-1} className="mt-2 space-y-2">
        <FormAlert kind="success" message={done} />
        <FormAlert kind="error" message={error} />
      </div>
      {proposals.length === 0 ? (
        <p className="mt-2">No proposals waiting. Schools teachers propose when they sign up appear here.</p>
      ) : (
        <ul className="mt-2 space-y-3">
          {proposals.map(({ school, similar }) => (
            <li key={school.id} className="card" data-school={school.id}>
              <h3 className="font-semibold">
                <a href={`/reach/schools/${school.id}`}>{school.name}</a>, {school.city}
              </h3>
              <p className="text-sm text-ink-soft">{fieldsText(school)}</p>
              <p className="mt-1 text-sm">
                {similar.length === 0
                  ? 'No existing school has a similar name.'
                  : `Possible duplicate of: ${similar
                      .map((s) => `${s.name}, ${s.city} (${Math.round(s.similarity * 100)}% similar)`)
                      .join('; ')}`}
              </p>
              <div className="mt-2 flex flex-wrap gap-3">
                <button type="button" className="btn-primary text-sm" onClick={() => void accept(school)}>
                  Accept
                </button>
                {PANELS.map(([mode, label]) => (
                  <button
                    key={mode}
                    type="button"
                    className="btn-secondary text-sm"
                    id={panelButtonId(school.id, mode)}
                    aria-expanded={open?.id === school.id && open.mode === mode}
                    onClick={() => setOpen({ id: school.id, mode })}
                  >
                    {label}
                  </button>
                ))}
              </div>
              {open?.id === school.id && (
                <div onKeyDown={(e) => e.key === 'Escape' && close()}>
                  {open.mode === 'edit' ? (
                    <SchoolEditForm school={school} onSaved={edited} onCancel={close} />
                  ) : (
                    <SchoolMergePanel
                      school={school}
                      similar={similar}
                      onMerged={(message) => finish(school.id, message)}
                      onCancel={close}
                    />
                  )}
                </div>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
