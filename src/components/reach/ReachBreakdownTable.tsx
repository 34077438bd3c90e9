/**
 * The breakdown table: one row per region, setting, high-need flag or school with every reach figure.
 * TanStack Table in manual mode: sorting, the name filter and paging happen on the server
 * (/api/reach/breakdown), so 2,000 schools never reach the browser at once. The CSV link asks for the same
 * query, so the file holds what the table shows under its filters (every page).
 */
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useEffect, useMemo, useState } from 'react';
import { api } from '../../lib/http/client';
import type { ReachFigureId } from '../../lib/reach/figures';
import { REACH_GROUPING_LABELS, REACH_GROUPINGS, type ReachGrouping } from '../../lib/reach/reach-query';

interface Row {
  groupKey: string;
  groupLabel: string;
  values: Record<ReachFigureId, number>;
}

interface Props {
  /** The period and school filters as query parameters. */
  query: Record<string, string>;
  figures: { id: ReachFigureId; label: string }[];
}

const PAGE_SIZE = 25;

export default function ReachBreakdownTable({ query, figures }: Props) {
  const [groupBy, setGroupBy] = useState<ReachGrouping>('school');
  const [sorting, setSorting] = useState<SortingState>([{ id: 'students', desc: true }]);
  const [filter, setFilter] = useState('');
  const [page, setPage] = useState(1);
  const [data, setData] = useState<{ rows: Row[]; total: number }>({ rows: [], total: 0 });
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const params = useMemo(
    () => ({
      ...query,
      groupBy,
      sort: sorting[0]?.id ?? 'students',
      dir: sorting[0]?.desc === false ? 'asc' : 'desc',
      q: filter,
    }),
    [query, groupBy, sorting, filter],
  );
  useEffect(() => setPage(1), [params]);
  useEffect(() => {
    const abort = new AbortController();
    setBusy(true);
    api<{ rows: Row[]; total: number }>('/api/reach/breakdown', {
      query: { ...params, page, pageSize: PAGE_SIZE },
      signal: abort.signal,
    })
      .then((d) => (setData(d), setError(null)))
      .catch((e: Error) => abort.signal.aborted || setError(e.message))
      .finally(() => abort.signal.aborted || setBusy(false));
    return () => abort.abort();
  }, [params, page]);

  const columns = useMemo<ColumnDef<Row>[]>(
    () => [
      { id: 'group', header: REACH_GROUPING_LABELS[groupBy], accessorFn: (r) => r.groupLabel },
      ...figures.map((f): ColumnDef<Row> => ({ id: f.id, header: f.label, accessorFn: (r) => r.values[f.id] })),
    ],
    [figures, groupBy],
  );
  const table = useReactTable({
    data: data.rows,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    pageCount: Math.max(1, Math.ceil(data.total / PAGE_SIZE)),
    state: { sorting },
    onSortingChange: setSorting,
  });
  const csv = `/api/reach/breakdown.csv?${new URLSearchParams(
    Object.entries(params).filter(([, v]) => v !== '') as [string, string][],
  )}`;
  const pages = Math.max(1, Math.ceil(data.total / PAGE_SIZE));

  return (
    <div>
      <div className="flex flex-wrap items-end gap-4">
        <label className="text-sm">
          Group by
          <select
            className="ml-2 rounded border border-ink/30 px-2 py-1"
            value={groupBy}
            onChange={(e) => setGroupBy((e.target as HTMLSelectElement).value as ReachGrouping)}
          >
            {REACH_GROUPINGS.map((g) => (
              <option value={g}>{REACH_GROUPING_LABELS[g]}</option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          Name contains
          <input
            className="ml-2 rounded border border-ink/30 px-2 py-1"
            value={filter}
            onChange={(e) => setFilter((e.target as HTMLInputElement).value)}
          />
        </label>
        <a className="btn-secondary text-sm" href={csv} download data-testid="breakdown-csv">
          Download CSV
        </a>
      </div>
      {error && (
        <p role="alert" className="mt-2 text-danger">
          {error}
        </p>
      )}
      <div className="mt-3 overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="breakdown-table" aria-busy={busy}>
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id} className="border-b border-ink/20">
                {hg.headers.map((h) => (
                  <th key={h.id} className="py-2 pr-3" aria-sort={sortState(h.column.getIsSorted())}>
                    <button type="button" className="font-semibold" onClick={h.column.getToggleSortingHandler()}>
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      {h.column.getIsSorted() === 'asc' ? ' ▲' : h.column.getIsSorted() === 'desc' ? ' ▼' : ''}
                    </button>
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-ink/10">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="py-1 pr-3">
                    {cell.column.id === 'group' && groupBy === 'school' && row.original.groupKey ? (
                      <a href={`/reach/schools/${row.original.groupKey}`}>{row.original.groupLabel}</a>
                    ) : (
                      String(cell.getValue())
                    )}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-2 flex items-center gap-3 text-sm">
        <button type="button" disabled={page <= 1} onClick={() => setPage(page - 1)}>
          Previous
        </button>
        Page {page} of {pages} · {data.total} rows
        <button type="button" disabled={page >= pages} onClick={() => setPage(page + 1)}>
          Next
        </button>
      </p>
    </div>
  );
}

function sortState(sorted: false | 'asc' | 'desc'): 'ascending' | 'descending' | 'none' {
  return sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none';
}
