/**
 * Reading a typed table: each row is a record of cell texts keyed by column, each cell becomes a number or a
 * problem message keyed "<row>.<column>" (the table's own dotted path), and fully blank rows are skipped.
 */

/** One typed row: column key → the text in its cell. */
export type TableRow = Record<string, string>;
/** Cell key "<row index>.<column key>" → message shown next to that cell. */
export type CellErrors = Record<string, string>;

/** The key of a table cell, as used in CellErrors. */
export function tableCellKey(rowIndex: number, columnKey: string): string {
  return `${rowIndex}.${columnKey}`;
}

/**
 * A typed number, or the reason it is not one. Accepts a decimal comma when there is no dot ("3,5" from a
 * spreadsheet set to a European locale) and an exponent ("1.2e-3"); blank gives null with no message.
 */
export function tableCellNumber(text: string): { value: number | null; problem: string | null } {
  const t = text.trim().replace(/\s+/g, '');
  if (t === '') return { value: null, problem: null };
  const normalised = !t.includes('.') && /^[-+]?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  const value = Number(normalised);
  if (!Number.isFinite(value)) return { value: null, problem: `“${text.trim()}” is not a number` };
  return { value, problem: null };
}

/** The problem of a table with no rows typed, under the key "table". */
export const TABLE_EMPTY_MESSAGE = 'The table is empty: type or paste readings, or load the sample data.';

export interface TableNumbers {
  /** Row indexes of the rows read (blank rows left out). */
  rowIndexes: number[];
  /** One array per read row, values in the order of `keys`; null where an optional cell is blank. */
  values: (number | null)[][];
  errors: CellErrors;
}

/**
 * Reads the number columns `keys` of every non-blank row; a blank cell in a required column and a cell that
 * is not a number are errors, and so is a table with no rows (under "table"). `optional` columns may be blank.
 */
export function tableNumbers(
  rows: readonly TableRow[],
  keys: readonly string[],
  optional: readonly string[] = [],
): TableNumbers {
  const out: TableNumbers = { rowIndexes: [], values: [], errors: {} };
  rows.forEach((row, r) => {
    if (keys.every((k) => (row[k] ?? '').trim() === '')) return;
    const values = keys.map((k) => {
      const { value, problem } = tableCellNumber(row[k] ?? '');
      if (problem) out.errors[tableCellKey(r, k)] = problem;
      else if (value === null && !optional.includes(k)) out.errors[tableCellKey(r, k)] = 'enter a number';
      return value;
    });
    out.rowIndexes.push(r);
    out.values.push(values);
  });
  if (out.rowIndexes.length === 0) out.errors.table = TABLE_EMPTY_MESSAGE;
  return out;
}

/** A tool's request built from its table and fields, or null with the problems; and where API errors go. */
export interface TableRequest<T> {
  input: T | null;
  /** Problems found before sending, keyed by cell key or field name. */
  errors: CellErrors;
  /** Request path (as the API names it) → cell key or field name, to place the API's field errors. */
  inputOfPath: Record<string, string>;
}

/** Reads one number field of a form: its value, or a problem under `name` in `errors`. */
export function formFieldNumber(text: string, name: string, errors: CellErrors, required = true): number | undefined {
  const { value, problem } = tableCellNumber(text);
  if (problem) errors[name] = problem;
  else if (value === null && required) errors[name] = 'enter a number';
  return value ?? undefined;
}
