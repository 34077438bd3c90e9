/**
 * CSV exports of the reach tables: papaparse's unparse, a header row, UTF-8 with a byte-order mark (so a
 * spreadsheet opens accented names correctly), and papaparse's escapeFormulae so a cell starting with
 * = + - @ (or a tab or carriage return) is prefixed with ' and read as text, not run as a formula
 * (OWASP, "CSV Injection").
 */
import Papa from 'papaparse';
import { REACH_FIGURES } from './figures';
import type { SchoolRecord } from './school-schema';

export const CSV_BOM = '\uFEFF';

/** A CSV file of the header and rows. */
export function csvFile(header: string[], rows: (string | number)[][]): string {
  return CSV_BOM + Papa.unparse({ fields: header, data: rows }, { escapeFormulae: true, newline: '\r\n' });
}

/** The breakdown table as CSV: the group column as the table names it, then every figure by its label. */
export function reachBreakdownCsv(
  groupHeading: string,
  rows: { groupLabel: string; values: Record<string, number> }[],
): string {
  return csvFile(
    [groupHeading, ...REACH_FIGURES.map((f) => f.label)],
    rows.map((r) => [r.groupLabel, ...REACH_FIGURES.map((f) => r.values[f.id] ?? 0)]),
  );
}

/** A series table as CSV: one row per bucket (its label under `bucketHeading`), then every figure by its label. */
export function reachSeriesCsv(
  bucketHeading: string,
  buckets: { label: string }[],
  series: Record<string, number[]>,
): string {
  return csvFile(
    [bucketHeading, ...REACH_FIGURES.map((f) => f.label)],
    buckets.map((b, i) => [b.label, ...REACH_FIGURES.map((f) => series[f.id]?.[i] ?? 0)]),
  );
}

/** The drill-down table as CSV. */
export function reachRowsCsv(
  amountHeading: string | null,
  rows: { at: string; item: string; amount: number; schoolName: string | null }[],
): string {
  const header = ['Date (UTC)', 'What', 'School', ...(amountHeading ? [amountHeading] : [])];
  return csvFile(
    header,
    rows.map((r) => [r.at.slice(0, 10), r.item, r.schoolName ?? '', ...(amountHeading ? [r.amount] : [])]),
  );
}

/** The schools directory as CSV: one column per field, so a spreadsheet can sort and filter each. */
export function schoolDirectoryCsv(schools: SchoolRecord[]): string {
  return csvFile(
    [
      'School',
      'City',
      'District',
      'Region',
      'Country',
      'Setting',
      'Grade bands',
      'High-need',
      'High-need basis',
      'Basis year',
      'Status',
      'Teachers',
      'Classes',
    ],
    schools.map((s) => [
      s.name,
      s.city,
      s.district,
      s.region,
      s.country,
      s.setting,
      s.gradeBands.join(' '),
      s.highNeed ? 'yes' : 'no',
      s.highNeedBasis,
      s.highNeedYear ?? '',
      s.status,
      s.teacherCount,
      s.classCount,
    ]),
  );
}
