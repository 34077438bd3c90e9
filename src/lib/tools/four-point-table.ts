/** The four-point tool's table (sensor, x, y, z, reading) and unit field turned into a FourPointInput request. */
import type { FourPointInput } from '../analysis/four-point';
import { tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

export const FOUR_POINT_TABLE_KEYS = ['x', 'y', 'z', 'value'] as const;

/** Builds the request from typed rows (label text, numbers in cm and the reading's unit). */
export function fourPointTableRequest(rows: readonly TableRow[], unit: string): TableRequest<FourPointInput> {
  const read = tableNumbers(rows, FOUR_POINT_TABLE_KEYS);
  const errors = { ...read.errors };
  const inputOfPath: Record<string, string> = { points: 'table', unit: 'unit' };
  read.rowIndexes.forEach((r, i) => {
    inputOfPath[`points.${i}.positionCm`] = tableCellKey(r, 'x');
    inputOfPath[`points.${i}.positionCm.0`] = tableCellKey(r, 'x');
    inputOfPath[`points.${i}.positionCm.1`] = tableCellKey(r, 'y');
    inputOfPath[`points.${i}.positionCm.2`] = tableCellKey(r, 'z');
    inputOfPath[`points.${i}.value`] = tableCellKey(r, 'value');
    inputOfPath[`points.${i}.label`] = tableCellKey(r, 'label');
  });
  if (Object.keys(errors).length > 0) return { input: null, errors, inputOfPath };
  return {
    input: {
      unit: unit.trim(),
      points: read.values.map(([x, y, z, value], i) => {
        const label = (rows[read.rowIndexes[i]!]!.label ?? '').trim();
        return { ...(label ? { label } : {}), positionCm: [x!, y!, z!], value: value! };
      }),
    },
    errors,
    inputOfPath,
  };
}
