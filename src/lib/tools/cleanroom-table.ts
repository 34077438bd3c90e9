/**
 * The clean-room tool's table — one row per sample: location, volume and a count per particle size — turned
 * into a CleanroomInput request, rows with the same location label grouped as that location's samples.
 */
import type { CleanroomInput } from '../analysis/cleanroom';
import { formFieldNumber, tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

/** Column key of the count at particle size `sizeUm` (by size, so unticking a size keeps the other columns). */
export function cleanroomCountKey(sizeUm: number): string {
  return `count-${String(sizeUm).replace('.', '_')}`;
}

export interface CleanroomFields {
  floorAreaM2: string;
  sizesUm: number[];
  countsAre: 'cumulative' | 'differential';
  volumeUnit: 'L' | 'm3';
}

/** Builds the request from sample rows (location, volume, counts) and the room's fields. */
export function cleanroomTableRequest(rows: readonly TableRow[], f: CleanroomFields): TableRequest<CleanroomInput> {
  const countKeys = f.sizesUm.map((size) => cleanroomCountKey(size));
  const read = tableNumbers(rows, ['volume', ...countKeys]);
  const errors = { ...read.errors };
  const floorAreaM2 = formFieldNumber(f.floorAreaM2, 'floorAreaM2', errors);
  const inputOfPath: Record<string, string> = { floorAreaM2: 'floorAreaM2', sizesUm: 'sizesUm', locations: 'table' };
  const locations: CleanroomInput['locations'] = [];
  read.rowIndexes.forEach((r, i) => {
    const label = (rows[r]!.location ?? '').trim();
    if (label === '') errors[tableCellKey(r, 'location')] = 'name the sampling location';
    let li = locations.findIndex((l) => l.label === label);
    if (li < 0) li = locations.push({ label, samples: [] }) - 1;
    const loc = locations[li]!;
    const [volume, ...counts] = read.values[i]!;
    const si = loc.samples.length;
    const base = `locations.${li}.samples.${si}`;
    inputOfPath[`locations.${li}.label`] = tableCellKey(r, 'location');
    inputOfPath[`${base}.volume`] = tableCellKey(r, 'volume');
    inputOfPath[`${base}.counts`] = tableCellKey(r, countKeys[0] ?? 'volume');
    countKeys.forEach((k, ci) => (inputOfPath[`${base}.counts.${ci}`] = tableCellKey(r, k)));
    loc.samples.push({ volume: volume ?? 0, volumeUnit: f.volumeUnit, counts: counts.map((c) => c ?? 0) });
  });
  if (Object.keys(errors).length > 0 || floorAreaM2 === undefined) return { input: null, errors, inputOfPath };
  return {
    input: { floorAreaM2, sizesUm: f.sizesUm, countsAre: f.countsAre, locations },
    errors,
    inputOfPath,
  };
}
