/**
 * Pasting a block of cells from a spreadsheet into a typed table: spreadsheets put tabs between cells and
 * newlines between rows on the clipboard; a CSV text pasted from an editor uses commas or semicolons.
 */
import type { TableRow } from './table-cells';

/** Splits clipboard text into rows of cells (tab-, then semicolon-, then comma-separated); empty lines dropped. */
export function pasteGridParse(text: string): string[][] {
  const lines = text
    .replace(/\r\n?/g, '\n')
    .split('\n')
    .filter((l) => l.trim() !== '');
  const sep = text.includes('\t') ? '\t' : text.includes(';') ? ';' : ',';
  return lines.map((l) => l.split(sep).map((c) => c.trim()));
}

/**
 * Writes a grid into rows from (rowIndex, first column `columnKeys[columnIndex]`) rightwards and downwards,
 * adding rows as needed; cells beyond the last column are dropped. A first grid row whose cells are not numbers
 * (a header) is skipped when pasting into the first row. Returns new rows; the input is not changed.
 */
export function pasteGridApply(
  rows: readonly TableRow[],
  grid: string[][],
  rowIndex: number,
  columnIndex: number,
  columnKeys: readonly string[],
): TableRow[] {
  const out = rows.map((r) => ({ ...r }));
  const isHeader = (cells: string[]) => cells.some((c) => c !== '' && !Number.isFinite(Number(c.replace(',', '.'))));
  const body = rowIndex === 0 && grid.length > 1 && isHeader(grid[0]!) ? grid.slice(1) : grid;
  body.forEach((cells, i) => {
    const r = rowIndex + i;
    while (out.length <= r) out.push(Object.fromEntries(columnKeys.map((k) => [k, ''])));
    cells.forEach((cell, j) => {
      const key = columnKeys[columnIndex + j];
      if (key !== undefined) out[r]![key] = cell;
    });
  });
  return out;
}
