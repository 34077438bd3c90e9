/** The magnetic tool's table (distance, field) and fields turned into a MagneticInput request. */
import type { MagneticInput } from '../analysis/magnetic';
import { formFieldNumber, tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

export const MAGNETIC_TABLE_KEYS = ['distanceCm', 'fieldUT'] as const;

/** Builds the request from typed rows and the background and threshold fields (µT); blank threshold = default. */
export function magneticTableRequest(
  rows: readonly TableRow[],
  fields: { backgroundUT: string; thresholdUT: string },
): TableRequest<Partial<MagneticInput>> {
  const read = tableNumbers(rows, MAGNETIC_TABLE_KEYS);
  const errors = { ...read.errors };
  const backgroundUT = formFieldNumber(fields.backgroundUT, 'backgroundUT', errors, false);
  const thresholdUT = formFieldNumber(fields.thresholdUT, 'thresholdUT', errors, false);
  const inputOfPath: Record<string, string> = {
    backgroundUT: 'backgroundUT',
    thresholdUT: 'thresholdUT',
    readings: 'table',
  };
  read.rowIndexes.forEach((r, i) => {
    for (const k of MAGNETIC_TABLE_KEYS) inputOfPath[`readings.${i}.${k}`] = tableCellKey(r, k);
  });
  if (Object.keys(errors).length > 0) return { input: null, errors, inputOfPath };
  return {
    input: {
      readings: read.values.map(([distanceCm, fieldUT]) => ({ distanceCm: distanceCm!, fieldUT: fieldUT! })),
      ...(backgroundUT === undefined ? {} : { backgroundUT }),
      ...(thresholdUT === undefined ? {} : { thresholdUT }),
    },
    errors,
    inputOfPath,
  };
}
