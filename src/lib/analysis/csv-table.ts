/**
 * Reads a numeric CSV table (an optional header row, then numbers) with papaparse, column by column, and
 * refuses anything it cannot use with a message naming the row, the column and what would work.
 */
import Papa from 'papaparse';
import { InputError, PayloadTooLargeError } from '../errors';

export interface CsvTable {
  /** Header cells, trimmed; null when the first row was already numbers. */
  header: string[] | null;
  /** One array per column, in file order. */
  columns: number[][];
  /** Number of data rows (header excluded). */
  rowCount: number;
}

export interface CsvTableOptions {
  /** Data rows above this are refused with PayloadTooLargeError (413). */
  maxRows: number;
  /** The table needs at least this many columns. */
  minColumns: number;
  /** Read up to this many columns (as many as the first row has); default minColumns. */
  maxColumns?: number;
  /** Column names used in messages when there is no header, e.g. ['time', 'x', 'y', 'z']. */
  expectedColumns: readonly string[];
  /** What the table is, for messages ("accelerometer CSV"). */
  what: string;
}

function isNumberCell(cell: string): boolean {
  return cell.trim() !== '' && Number.isFinite(Number(cell.trim()));
}

function cellProblem(cell: string): string {
  const t = cell.trim();
  if (t === '') return 'is empty';
  if (/^-?\d+,\d+$/.test(t)) return `"${t}" uses a decimal comma; use a decimal point (1.5, not 1,5)`;
  if (/^[-+]?(nan|inf(inity)?)$/i.test(t)) return `"${t}" is not a finite number`;
  return `"${t.slice(0, 40)}" is not a number`;
}

/**
 * Parses CSV text into numeric columns (as many as the first row has, between minColumns and
 * maxColumns; extra columns ignored); a first row with any non-numeric cell is taken as the header.
 * Throws InputError for text in number cells, missing cells or an empty table, and PayloadTooLargeError above `maxRows` data rows.
 */
export function csvTableParse(text: string, options: CsvTableOptions): CsvTable {
  const { maxRows, minColumns, expectedColumns, what } = options;
  const maxColumns = Math.max(minColumns, options.maxColumns ?? minColumns);
  let width = minColumns;
  let columns: number[][] = [];
  let header: string[] | null = null;
  let fileRow = 0;
  let failure: Error | null = null;
  const name = (c: number) => (header?.[c] ? `"${header[c]}"` : (expectedColumns[c] ?? `${c + 1}`));

  Papa.parse<string[]>(text, {
    skipEmptyLines: 'greedy',
    comments: '#',
    step(result, parser) {
      fileRow++;
      const row = result.data;
      if (fileRow === 1) {
        width = Math.min(Math.max(row.length, minColumns), maxColumns);
        columns = Array.from({ length: width }, () => []);
      }
      if (fileRow === 1 && !row.slice(0, width).every(isNumberCell)) {
        header = row.map((c) => c.trim());
        if (header.length < minColumns) {
          failure = new InputError(
            `The ${what} header has ${header.length} column(s); it needs ${minColumns}: ${expectedColumns.join(', ')}.`,
          );
          parser.abort();
        }
        return;
      }
      const dataRows = columns[0]?.length ?? 0;
      if (dataRows >= maxRows) {
        failure = new PayloadTooLargeError(
          `The ${what} has more than ${maxRows.toLocaleString('en-US')} data rows, the most this tool reads; send a shorter record or a lower sample rate.`,
        );
        parser.abort();
        return;
      }
      if (row.length < width) {
        failure = new InputError(
          `Row ${fileRow} of the ${what} has ${row.length} column(s); each row needs ${width}${width === minColumns ? `: ${expectedColumns.join(', ')}` : ''}.`,
        );
        parser.abort();
        return;
      }
      for (let c = 0; c < width; c++) {
        const cell = row[c]!;
        const value = Number(cell);
        if (cell.trim() === '' || !Number.isFinite(value)) {
          failure = new InputError(`Row ${fileRow}, column ${name(c)} of the ${what}: ${cellProblem(cell)}.`, {
            [`row ${fileRow}`]: [`column ${name(c)} ${cellProblem(cell)}`],
          });
          parser.abort();
          return;
        }
        columns[c]!.push(value);
      }
    },
  });
  if (failure) throw failure;
  const rowCount = columns[0]?.length ?? 0;
  if (rowCount === 0) {
    throw new InputError(
      `The ${what} has no data rows; expected columns ${expectedColumns.join(', ')} with one reading a row.`,
    );
  }
  return { header, columns, rowCount };
}
