/**
 * A typed data table: one text input per cell (numbers are read when the tool runs, so a half-typed value
 * is never lost), rows added and removed with buttons, a block pasted from a spreadsheet spread over the
 * cells, and each cell's error shown under it and tied to it with aria-describedby.
 */
import { useId, type ClipboardEvent } from 'react';
import { pasteGridApply, pasteGridParse } from '../../lib/tools/paste-grid';
import { tableCellKey, type CellErrors, type TableRow } from '../../lib/tools/table-cells';

export interface TableColumn {
  key: string;
  label: string;
  unit?: string;
  kind?: 'number' | 'text';
}

interface Props {
  caption: string;
  columns: TableColumn[];
  rows: TableRow[];
  onChange: (rows: TableRow[]) => void;
  errors?: CellErrors;
  /** An error about the table as a whole (too few rows, etc.). */
  tableError?: string | undefined;
  maxRows: number;
}

/** Rows drawn as inputs; a longer pasted record is kept and sent, but only this many rows are shown. */
const SHOWN_ROWS = 200;

/** An editable table of cells with add/remove row, spreadsheet paste and per-cell errors. */
export default function DataTableInput({ caption, columns, rows, onChange, errors = {}, tableError, maxRows }: Props) {
  const id = useId();
  const keys = columns.map((c) => c.key);
  const blankRow = (): TableRow => Object.fromEntries(keys.map((k) => [k, '']));
  const setCell = (r: number, key: string, value: string) =>
    onChange(rows.map((row, i) => (i === r ? { ...row, [key]: value } : row)));
  const paste = (e: ClipboardEvent<HTMLInputElement>, r: number, c: number) => {
    const text = e.clipboardData.getData('text/plain');
    if (!/[\t\n]/.test(text.trim())) return;
    e.preventDefault();
    onChange(pasteGridApply(rows, pasteGridParse(text), r, c, keys).slice(0, maxRows));
  };
  const hiddenErrors = Object.keys(errors).filter((k) => Number(k.split('.')[0]) >= SHOWN_ROWS).length;
  const tableErrorId = `${id}-table-error`;
  return (
    <div>
      {tableError && (
        <p id={tableErrorId} className="field-error" role="alert">
          {tableError}
        </p>
      )}
      <div className="mt-2 max-h-[28rem] overflow-auto rounded-lg border border-ink/15" tabIndex={-1}>
        <table className="w-full border-collapse text-sm" aria-describedby={tableError ? tableErrorId : undefined}>
          <caption className="sr-only">{caption}</caption>
          <thead className="sticky top-0 bg-paper-deep">
            <tr>
              <th scope="col" className="w-10 px-2 py-1 text-left">
                #
              </th>
              {columns.map((c) => (
                <th key={c.key} scope="col" className="px-2 py-1 text-left">
                  {c.label}
                  {c.unit && <span className="font-normal text-ink-soft"> ({c.unit})</span>}
                </th>
              ))}
              <th scope="col" className="px-2 py-1">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.slice(0, SHOWN_ROWS).map((row, r) => (
              <tr key={r} className="border-t border-ink/10 align-top">
                <th scope="row" className="px-2 py-1 text-left font-normal text-ink-soft">
                  {r + 1}
                </th>
                {columns.map((c, ci) => {
                  const key = tableCellKey(r, c.key);
                  const error = errors[key];
                  const errorId = `${id}-${r}-${c.key}-error`;
                  return (
                    <td key={c.key} className="px-1 py-1">
                      <input
                        className="block w-full min-w-20 rounded border border-ink/30 bg-white px-2 py-1"
                        inputMode={c.kind === 'text' ? 'text' : 'decimal'}
                        aria-label={`${c.label}, row ${r + 1}`}
                        aria-invalid={error ? true : undefined}
                        aria-describedby={error ? errorId : undefined}
                        value={row[c.key] ?? ''}
                        onChange={(e) => setCell(r, c.key, e.target.value)}
                        onPaste={(e) => paste(e, r, ci)}
                        data-cell={key}
                      />
                      {error && (
                        <p id={errorId} className="field-error text-xs">
                          {error}
                        </p>
                      )}
                    </td>
                  );
                })}
                <td className="px-1 py-1">
                  <button
                    type="button"
                    className="btn-secondary px-2 py-1 text-xs"
                    aria-label={`Remove row ${r + 1}`}
                    onClick={() => onChange(rows.filter((_, i) => i !== r))}
                  >
                    ✕
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length > SHOWN_ROWS && (
        <p className="mt-1 text-sm text-ink-soft">
          {rows.length - SHOWN_ROWS} more rows are kept and sent but not shown
          {hiddenErrors > 0 ? `; ${hiddenErrors} of them have problems` : ''}.
        </p>
      )}
      <div className="no-print mt-2 flex flex-wrap items-center gap-2">
        <button
          type="button"
          className="btn-secondary px-3 py-1 text-sm"
          disabled={rows.length >= maxRows}
          onClick={() => onChange([...rows, blankRow()])}
        >
          Add row
        </button>
        <button
          type="button"
          className="btn-secondary px-3 py-1 text-sm"
          disabled={rows.length === 0}
          onClick={() => onChange([blankRow()])}
        >
          Clear table
        </button>
        <span className="text-sm text-ink-soft">
          Tip: copy cells from a spreadsheet and paste them into a cell. At most {maxRows.toLocaleString('en-US')} rows.
        </span>
      </div>
    </div>
  );
}
