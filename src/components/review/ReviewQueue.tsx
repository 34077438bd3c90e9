/**
 * The coordinators' review queue: submitted, teacher-approved entries in a TanStack Table whose paging, sorting
 * and filters run on the server (/api/review/queue). Keyboard: ↑/↓ (or j/k) move between rows, Space selects the
 * row, Enter opens its review page. Selected rows are published together after the same checklist as one entry.
 */
import { useMemo, useRef, useState } from 'react';
import { QueryClient, QueryClientProvider, keepPreviousData, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type RowSelectionState,
  type SortingState,
} from '@tanstack/react-table';
import { api, apiSettle } from '../../lib/http/client';
import type { EntrySummary } from '../../lib/journal/entry-view.server';
import { REVIEW_CHECKLIST, type ReviewChecklistItem } from '../../lib/journal/entry-rules';
import { FormAlert } from '../auth/FormAlert';
import SelectField from '../tools/SelectField';

interface Option {
  value: string;
  label: string;
}
interface Props {
  schools: Option[];
  activities: Option[];
}
interface QueuePage {
  entries: EntrySummary[];
  total: number;
  page: number;
  pageCount: number;
}

const PAGE_SIZE = 25;
const AGES: Option[] = [
  { value: '', label: 'Any age' },
  { value: '0-2', label: 'Up to 2 days' },
  { value: '3-7', label: '3 to 7 days' },
  { value: '8-', label: 'More than a week' },
];
const SORT_OF_COLUMN: Record<string, string> = {
  title: 'title',
  schoolName: 'school',
  className: 'class',
  activitySlug: 'activity',
  waitingDays: 'submitted',
};
const column = createColumnHelper<EntrySummary>();
const NO_ENTRIES: EntrySummary[] = [];

/** The queue island. */
export default function ReviewQueue(props: Props) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { refetchOnWindowFocus: false, staleTime: 10_000 } } }),
  );
  return (
    <QueryClientProvider client={client}>
      <QueueTable {...props} />
    </QueryClientProvider>
  );
}

function QueueTable({ schools, activities }: Props) {
  const [schoolId, setSchoolId] = useState('');
  const [activity, setActivity] = useState('');
  const [age, setAge] = useState('');
  const [page, setPage] = useState(1);
  // Oldest first: the entry that waited longest is decided first.
  const [sorting, setSorting] = useState<SortingState>([{ id: 'waitingDays', desc: true }]);
  const [selection, setSelection] = useState<RowSelectionState>({});
  const [checks, setChecks] = useState<Record<ReviewChecklistItem, boolean>>({
    noFacesOrNames: false,
    noPersonalData: false,
    onTopic: false,
    respectful: false,
  });
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const rowRefs = useRef<(HTMLTableRowElement | null)[]>([]);
  const queryClient = useQueryClient();

  const [minAge, maxAge] = age ? age.split('-') : ['', ''];
  const sort = sorting[0];
  const query = {
    schoolId: schoolId || undefined,
    activity: activity || undefined,
    minAgeDays: minAge || undefined,
    maxAgeDays: maxAge || undefined,
    // "Waiting longest" is the earliest submission: ascending submitted time is descending age.
    sort: sort ? SORT_OF_COLUMN[sort.id] : 'submitted',
    dir: sort ? (sort.id === 'waitingDays' ? (sort.desc ? 'asc' : 'desc') : sort.desc ? 'desc' : 'asc') : 'asc',
    page,
    pageSize: PAGE_SIZE,
  };
  const data = useQuery({
    queryKey: ['review-queue', query],
    queryFn: ({ signal }) => api<QueuePage>('/api/review/queue', { query, signal }),
    placeholderData: keepPreviousData,
  });

  // Stable between renders: TanStack Table recomputes its rows whenever columns or data change identity.
  const columns = useMemo(
    () => [
      column.display({
        id: 'select',
        header: () => <span className="sr-only">Select</span>,
        cell: ({ row }) => (
          <input
            type="checkbox"
            aria-label={`Select “${row.original.title}”`}
            checked={row.getIsSelected()}
            onChange={row.getToggleSelectedHandler()}
            tabIndex={-1}
          />
        ),
      }),
      column.accessor('title', {
        header: 'Entry',
        cell: (c) => (
          <a href={`/review/${c.row.original.id}`} tabIndex={-1}>
            {c.getValue()}
          </a>
        ),
      }),
      column.accessor('schoolName', { header: 'School', cell: (c) => c.getValue() ?? '—' }),
      column.accessor('className', { header: 'Class' }),
      column.accessor('activitySlug', {
        header: 'Activity',
        cell: (c) => activities.find((a) => a.value === c.getValue())?.label ?? '—',
      }),
      column.accessor('waitingDays', {
        header: 'Waiting',
        cell: (c) => `${c.getValue() ?? 0} day${c.getValue() === 1 ? '' : 's'}`,
      }),
    ],
    [activities],
  );
  const table = useReactTable({
    data: data.data?.entries ?? NO_ENTRIES,
    columns,
    getRowId: (r) => r.id,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    pageCount: data.data?.pageCount ?? 1,
    enableSortingRemoval: false,
    state: { sorting, rowSelection: selection },
    onSortingChange: (next) => {
      setSorting(next);
      setPage(1);
    },
    onRowSelectionChange: setSelection,
  });

  const filter = (set: (v: string) => void) => (v: string) => {
    set(v);
    setPage(1);
    setSelection({});
  };
  const selectedIds = Object.keys(selection).filter((id) => selection[id]);
  const allTicked = Object.values(checks).every(Boolean);

  function rowKey(e: React.KeyboardEvent<HTMLTableRowElement>, index: number, id: string) {
    const move = (to: number) => {
      e.preventDefault();
      rowRefs.current[Math.max(0, Math.min(to, table.getRowModel().rows.length - 1))]?.focus();
    };
    if (e.key === 'ArrowDown' || e.key === 'j') move(index + 1);
    else if (e.key === 'ArrowUp' || e.key === 'k') move(index - 1);
    else if (e.key === 'Home') move(0);
    else if (e.key === 'End') move(Infinity);
    else if (e.key === ' ') {
      e.preventDefault();
      table.getRow(id).toggleSelected();
    } else if (e.key === 'Enter') window.location.assign(`/review/${id}`);
  }

  async function publishSelected() {
    setBusy(true);
    setMessage(null);
    const result = await apiSettle<{ published: string[]; skipped: string[] }>('/api/review/bulk-publish', {
      body: { entryIds: selectedIds, checklist: checks },
    });
    setBusy(false);
    if (!result.ok) {
      setMessage({ kind: 'error', text: result.error.message });
      return;
    }
    const { published, skipped } = result.data;
    setMessage({
      kind: 'success',
      text:
        `Published ${published.length} entr${published.length === 1 ? 'y' : 'ies'}.` +
        (skipped.length ? ` ${skipped.length} had been decided meanwhile and were left as they were.` : ''),
    });
    setSelection({});
    await queryClient.invalidateQueries({ queryKey: ['review-queue'] });
  }

  const rows = table.getRowModel().rows;
  const pageData = data.data;
  return (
    <div className="space-y-4">
      <div className="card flex flex-wrap gap-6" role="search" aria-label="Filter the queue">
        <SelectField
          label="School"
          name="schoolId"
          value={schoolId}
          onChange={filter(setSchoolId)}
          options={[{ value: '', label: 'All schools' }, ...schools]}
        />
        <SelectField
          label="Activity"
          name="activity"
          value={activity}
          onChange={filter(setActivity)}
          options={[{ value: '', label: 'All activities' }, ...activities]}
        />
        <SelectField label="Waiting" name="age" value={age} onChange={filter(setAge)} options={AGES} />
      </div>
      <p className="text-sm text-ink-soft" id="queue-keys">
        Keyboard: ↑ and ↓ move between entries, Space selects one, Enter opens it.
      </p>
      {data.isError && <FormAlert kind="error" message={(data.error as Error).message} />}
      {pageData && pageData.total === 0 ? (
        <p className="card" data-testid="queue-empty">
          Nothing waits for review{schoolId || activity || age ? ' with these filters' : ''}.
        </p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left" aria-describedby="queue-keys" data-testid="review-queue">
            <caption className="sr-only">Entries waiting for review</caption>
            <thead>
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header) => {
                    const sorted = header.column.getIsSorted();
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        className="pb-2 pr-3"
                        aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}
                      >
                        {header.column.getCanSort() && header.id !== 'select' ? (
                          <button
                            type="button"
                            className="font-semibold underline-offset-2 hover:underline"
                            onClick={header.column.getToggleSortingHandler()}
                          >
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            {sorted === 'asc' ? ' ▲' : sorted === 'desc' ? ' ▼' : ''}
                          </button>
                        ) : (
                          flexRender(header.column.columnDef.header, header.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {rows.map((row, index) => (
                <tr
                  key={row.id}
                  ref={(el) => {
                    rowRefs.current[index] = el;
                  }}
                  tabIndex={0}
                  aria-selected={row.getIsSelected()}
                  data-entry-id={row.id}
                  className="border-t border-ink/10 focus:bg-fold-light focus:outline-none aria-selected:bg-paper-deep"
                  onKeyDown={(e) => rowKey(e, index, row.id)}
                >
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="py-2 pr-3">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {pageData && pageData.pageCount > 1 && (
        <nav className="flex items-center gap-3" aria-label="Queue pages">
          <button type="button" className="btn-secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>
            Previous
          </button>
          <span>
            Page {pageData.page} of {pageData.pageCount} · {pageData.total} entries
          </span>
          <button
            type="button"
            className="btn-secondary"
            disabled={page >= pageData.pageCount}
            onClick={() => setPage(page + 1)}
          >
            Next
          </button>
        </nav>
      )}
      {selectedIds.length > 0 && (
        <section className="card space-y-2" aria-labelledby="bulk-h" data-testid="bulk-publish">
          <h2 id="bulk-h" className="text-lg font-bold">
            Publish {selectedIds.length} selected entr{selectedIds.length === 1 ? 'y' : 'ies'}
          </h2>
          <p className="text-sm text-ink-soft">Tick each check only if it holds for every selected entry.</p>
          {(Object.keys(REVIEW_CHECKLIST) as ReviewChecklistItem[]).map((item) => (
            <label key={item} className="flex items-start gap-2">
              <input
                type="checkbox"
                className="mt-1"
                checked={checks[item]}
                onChange={(e) => {
                  const on = e.currentTarget.checked;
                  setChecks((c) => ({ ...c, [item]: on }));
                }}
              />
              {REVIEW_CHECKLIST[item]}
            </label>
          ))}
          <button
            type="button"
            className="btn-primary"
            disabled={busy || !allTicked}
            onClick={() => void publishSelected()}
          >
            Publish the selected entries
          </button>
        </section>
      )}
      {message && <FormAlert kind={message.kind} message={message.text} />}
    </div>
  );
}
