/** The PSD-profile calculator's breakpoint table (frequency, level and/or slope) turned into a request. */
import type { PsdProfileInput } from '../analysis/psd-profile';
import { tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

const KEYS = ['frequencyHz', 'psdG2PerHz', 'slopeDbPerOctave'] as const;

/** Builds the request from breakpoint rows; level and slope cells may be blank. */
export function psdProfileTableRequest(rows: readonly TableRow[]): TableRequest<PsdProfileInput> {
  const read = tableNumbers(rows, KEYS, ['psdG2PerHz', 'slopeDbPerOctave']);
  const inputOfPath: Record<string, string> = { points: 'table' };
  read.rowIndexes.forEach((r, i) => {
    inputOfPath[`points.${i}`] = tableCellKey(r, 'psdG2PerHz');
    for (const k of KEYS) inputOfPath[`points.${i}.${k}`] = tableCellKey(r, k);
  });
  if (Object.keys(read.errors).length > 0) return { input: null, errors: read.errors, inputOfPath };
  const points = read.values.map(([frequencyHz, psdG2PerHz, slopeDbPerOctave]) => ({
    frequencyHz: frequencyHz!,
    ...(psdG2PerHz === null ? {} : { psdG2PerHz }),
    ...(slopeDbPerOctave === null ? {} : { slopeDbPerOctave }),
  }));
  return { input: { points }, errors: {}, inputOfPath };
}
