/**
 * The shake-test tool's typed table (time, x, y, z) turned into CSV text for the API's CSV form, so a typed
 * or pasted record and an uploaded file take the same path (units and sampling checks on the server). API
 * errors about a CSV name its file row ("row 12"): the header is row 1, so data row r is file row r + 2.
 */
import { tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

export const VIBRATION_TABLE_KEYS = ['timeS', 'x', 'y', 'z'] as const;

/** Builds CSV text "time_s,x,y,z" from typed rows, or the cells' problems. */
export function vibrationTableRequest(rows: readonly TableRow[]): TableRequest<string> {
  const read = tableNumbers(rows, VIBRATION_TABLE_KEYS);
  const inputOfPath: Record<string, string> = { timeS: 'table', x: 'table', y: 'table', z: 'table' };
  read.rowIndexes.forEach((r, i) => {
    inputOfPath[`row ${i + 2}`] = tableCellKey(r, 'timeS');
    for (const k of VIBRATION_TABLE_KEYS) inputOfPath[`${k === 'timeS' ? 'timeS' : k}.${i}`] = tableCellKey(r, k);
  });
  if (Object.keys(read.errors).length > 0) return { input: null, errors: read.errors, inputOfPath };
  const csv = ['time_s,x,y,z', ...read.values.map((v) => v.join(','))].join('\n') + '\n';
  return { input: csv, errors: {}, inputOfPath };
}
