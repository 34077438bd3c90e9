/**
 * Attendance after an event: how many people came from each school, a count only (never names). Saving
 * replaces what was recorded before; the reach figures read these counts. Checked with the API's
 * AttendanceSchema before it is sent.
 */
import { useState } from 'react';
import { ATTENDANCE_COUNT_MAX, AttendanceSchema } from '../../lib/events/event-schemas';
import { apiSettle } from '../../lib/http/client';
import { FormAlert } from '../auth/FormAlert';

interface Row {
  key: number;
  schoolId: string;
  count: string;
}

interface Props {
  eventId: string;
  schools: { value: string; label: string }[];
  /** Counts recorded before, or the registered schools with empty counts when nothing is recorded yet. */
  initial: { schoolId: string; attendeeCount: number | null }[];
}

let nextKey = 0;
const rowNew = (schoolId = '', count = ''): Row => ({ key: nextKey++, schoolId, count });

export default function AttendanceForm({ eventId, schools, initial }: Props) {
  const [rows, setRows] = useState<Row[]>(() =>
    initial.length
      ? initial.map((r) => rowNew(r.schoolId, r.attendeeCount === null ? '' : String(r.attendeeCount)))
      : [rowNew()],
  );
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const update = (key: number, patch: Partial<Row>) =>
    setRows((rs) => rs.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const total = rows.reduce((n, r) => n + (Number.parseInt(r.count, 10) || 0), 0);

  async function save(e: { preventDefault(): void }) {
    e.preventDefault();
    setError(null);
    setSaved(null);
    const filled = rows.filter((r) => r.schoolId || r.count);
    if (filled.some((r) => !r.schoolId))
      return setError('Pick a school on every row that has a count, or remove the row.');
    if (filled.some((r) => !/^\d+$/.test(r.count.trim())))
      return setError(`Give every school a whole number of people, from 0 to ${ATTENDANCE_COUNT_MAX}.`);
    const body = { rows: filled.map((r) => ({ schoolId: r.schoolId, attendeeCount: Number(r.count) })) };
    const checked = AttendanceSchema.safeParse(body);
    if (!checked.success) return setError(checked.error.issues[0]?.message ?? 'Check the rows.');
    setBusy(true);
    const result = await apiSettle(`/api/events/${eventId}/attendance`, { method: 'PUT', body: checked.data });
    setBusy(false);
    if (result.ok)
      setSaved(
        `Attendance saved: ${total} ${total === 1 ? 'person' : 'people'} from ${filled.length} ${filled.length === 1 ? 'school' : 'schools'}.`,
      );
    else setError(result.error.message);
  }

  return (
    <form method="post" noValidate onSubmit={save} className="space-y-3" aria-label="Record attendance">
      <FormAlert kind="error" message={error} />
      <table className="w-full max-w-2xl text-left">
        <thead>
          <tr className="border-b border-ink/20 text-sm">
            <th scope="col" className="py-2 pr-3">
              School
            </th>
            <th scope="col" className="py-2 pr-3">
              People who came
            </th>
            <th scope="col" className="py-2">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={r.key} className="border-b border-ink/10">
              <td className="py-1 pr-3">
                <select
                  className="field-input mt-0"
                  aria-label={`School, row ${i + 1}`}
                  value={r.schoolId}
                  onChange={(e) => update(r.key, { schoolId: e.target.value })}
                >
                  <option value="">Choose a school…</option>
                  {schools.map((s) => (
                    <option key={s.value} value={s.value}>
                      {s.label}
                    </option>
                  ))}
                </select>
              </td>
              <td className="py-1 pr-3">
                <input
                  className="field-input mt-0 max-w-32"
                  type="number"
                  inputMode="numeric"
                  min={0}
                  max={ATTENDANCE_COUNT_MAX}
                  aria-label={`People who came, row ${i + 1}`}
                  value={r.count}
                  onChange={(e) => update(r.key, { count: e.target.value })}
                />
              </td>
              <td className="py-1">
                <button
                  type="button"
                  className="btn-secondary py-1 text-sm"
                  aria-label={`Remove row ${i + 1}`}
                  onClick={() => setRows((rs) => rs.filter((x) => x.key !== r.key))}
                >
                  Remove
                </button>
              </td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" className="py-2 pr-3 text-right">
              Total
            </th>
            <td className="py-2 font-semibold">{total}</td>
            <td />
          </tr>
        </tfoot>
      </table>
      <p className="text-sm text-ink-soft">A count per school only: never write down students' names.</p>
      <FormAlert kind="success" message={saved} />
      <div className="flex flex-wrap gap-3">
        <button type="button" className="btn-secondary" onClick={() => setRows((rs) => [...rs, rowNew()])}>
          Add a school
        </button>
        <button type="submit" className="btn-primary" disabled={busy}>
          Save attendance
        </button>
      </div>
    </form>
  );
}
