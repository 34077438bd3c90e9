/**
 * Turns a temperature-log CSV into thermal runs: the first column is time (seconds unless its header
 * names minutes, hours or ms), every further column one run, named by its header ("lamp", "blanket").
 */
import { parseInput } from '../validation';
import { csvTableParse } from './csv-table';
import { THERMAL_MAX_POINTS_PER_RUN, THERMAL_MAX_RUNS, ThermalInputSchema, type ThermalInput } from './thermal';
import { timeScaleFromHeader } from './time-series';

/** Largest temperature-log CSV accepted, bytes. */
export const THERMAL_CSV_MAX_BYTES = 2_000_000;

/**
 * Parses CSV text (time, run 1, run 2, …) into a validated thermal request. Throws InputError for bad
 * cells or too few columns, PayloadTooLargeError above THERMAL_MAX_POINTS_PER_RUN rows.
 */
export function thermalInputFromCsv(text: string): ThermalInput {
  const table = csvTableParse(text, {
    maxRows: THERMAL_MAX_POINTS_PER_RUN,
    minColumns: 2,
    maxColumns: THERMAL_MAX_RUNS + 1,
    expectedColumns: ['time', 'temperature'],
    what: 'temperature log',
  });
  const [time, ...temps] = table.columns as [number[], ...number[][]];
  const scale = timeScaleFromHeader(table.header?.[0]);
  const timeS = scale === 1 ? time : time.map((v) => v * scale);
  const runs = temps.map((temperatureC, i) => ({
    label: table.header?.[i + 1] || `run ${i + 1}`,
    timeS,
    temperatureC,
  }));
  return parseInput(ThermalInputSchema, { runs }, 'temperature log');
}
