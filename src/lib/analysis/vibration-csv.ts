/**
 * Turns an accelerometer CSV (columns time, x, y, z; optional header) into a vibration request. The time
 * column is in seconds unless its header names another unit (time-series.ts); a header naming g or m/s² sets the unit when the
 * request leaves it on 'auto'.
 */
import { parseInput } from '../validation';
import { accelerationUnitFromHeader, type AccelerationUnitSource } from './acceleration-units';
import { csvTableParse } from './csv-table';
import { timeScaleFromHeader } from './time-series';
import { VIBRATION_MAX_SAMPLES, VibrationInputSchema, type VibrationInput, type VibrationOptions } from './vibration';

/** Largest accelerometer CSV accepted, bytes (an hour at 100 Hz is about 11 MB of CSV). */
export const VIBRATION_CSV_MAX_BYTES = 16_000_000;

const COLUMNS = ['time', 'x', 'y', 'z'] as const;

/**
 * Parses accelerometer CSV text (time, x, y, z) with the given options into a validated VibrationInput
 * and says where the unit came from. Throws InputError (bad cells, too few columns) or
 * PayloadTooLargeError (more than VIBRATION_MAX_SAMPLES rows).
 */
export function vibrationInputFromCsv(
  text: string,
  options: VibrationOptions = {},
): { input: VibrationInput; unitSource: AccelerationUnitSource } {
  const table = csvTableParse(text, {
    maxRows: VIBRATION_MAX_SAMPLES,
    minColumns: 4,
    expectedColumns: COLUMNS,
    what: 'accelerometer CSV',
  });
  const [t, x, y, z] = table.columns as [number[], number[], number[], number[]];
  const scale = timeScaleFromHeader(table.header?.[0]);
  const timeS = scale === 1 ? t : t.map((v) => v * scale);
  let units = options.units ?? 'auto';
  let unitSource: AccelerationUnitSource = 'stated';
  if (units === 'auto' && table.header) {
    const found = table.header
      .slice(1, 4)
      .map(accelerationUnitFromHeader)
      .find((u) => u !== null);
    if (found) {
      units = found;
      unitSource = 'header';
    }
  }
  const input = parseInput(VibrationInputSchema, { ...options, units, timeS, x, y, z }, 'accelerometer CSV');
  return { input, unitSource };
}
