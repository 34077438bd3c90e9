/**
 * Checks on a time column shared by the data tools: time must increase row by row, and for spectral
 * analysis it must be evenly sampled. Messages name the row and say what would work.
 */
import { InputError } from '../errors';

/** Largest allowed deviation of any sampling interval from the median interval, as a fraction of it. */
export const SAMPLING_INTERVAL_TOLERANCE = 0.1;

/** Throws InputError when time does not increase strictly from one row to the next (rows counted from 1). */
export function timeSeriesAssertIncreasing(timeS: ArrayLike<number>, what: string, firstRow = 1): void {
  for (let i = 1; i < timeS.length; i++) {
    const dt = timeS[i]! - timeS[i - 1]!;
    if (!(dt > 0)) {
      throw new InputError(
        `Time goes ${dt === 0 ? 'nowhere' : 'backwards'} in the ${what} at row ${i + firstRow} (${timeS[i - 1]} then ${timeS[i]}); ` +
          'each row needs a later time than the one before. Sort the rows by time or remove repeated readings.',
        { time: [`row ${i + firstRow}: ${timeS[i]} is not after ${timeS[i - 1]}`] },
      );
    }
  }
}

function median(values: Float64Array): number {
  const sorted = Float64Array.from(values).sort();
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/**
 * Sample rate in Hz of a strictly increasing, evenly sampled time column in seconds: (n − 1)/(t_last − t_0).
 * Throws InputError when any interval differs from the median interval by more than
 * SAMPLING_INTERVAL_TOLERANCE (uneven sampling would smear a spectrum) or there are fewer than 2 rows.
 */
export function timeSeriesSampleRateHz(timeS: ArrayLike<number>, what: string, firstRow = 1): number {
  const n = timeS.length;
  if (n < 2) throw new InputError(`The ${what} has ${n} row(s); the sample rate needs at least 2 readings.`);
  timeSeriesAssertIncreasing(timeS, what, firstRow);
  const intervals = new Float64Array(n - 1);
  for (let i = 1; i < n; i++) intervals[i - 1] = timeS[i]! - timeS[i - 1]!;
  const typical = median(intervals);
  let worst = -1;
  let uneven = 0;
  for (let i = 0; i < intervals.length; i++) {
    const off = Math.abs(intervals[i]! - typical) / typical;
    if (off > SAMPLING_INTERVAL_TOLERANCE) {
      uneven++;
      if (worst < 0 || off > Math.abs(intervals[worst]! - typical) / typical) worst = i;
    }
  }
  if (uneven > 0) {
    const pct = Math.round(SAMPLING_INTERVAL_TOLERANCE * 100);
    throw new InputError(
      `The ${what} is unevenly sampled: ${uneven} of ${n - 1} intervals differ from the typical ${formatInterval(typical)} by more than ${pct} % ` +
        `(worst at row ${worst + 1 + firstRow}: ${formatInterval(intervals[worst]!)}). ` +
        'Record with a fixed sample rate (most logger apps have a setting), or resample the record to even steps first.',
      { time: [`uneven sampling: ${uneven} interval(s) outside ±${pct} % of ${formatInterval(typical)}`] },
    );
  }
  return (n - 1) / (timeS[n - 1]! - timeS[0]!);
}

function formatInterval(seconds: number): string {
  return seconds < 1 ? `${+(seconds * 1000).toPrecision(4)} ms` : `${+seconds.toPrecision(4)} s`;
}

/** Seconds per unit of a time column, read from its header ("time (ms)", "t_min", "hours"); 1 when it names none. */
export function timeScaleFromHeader(headerCell: string | undefined): number {
  const c = (headerCell ?? '').toLowerCase();
  if (/(^|[^a-z])(us|µs|μs|micros)/.test(c)) return 1e-6;
  if (/(^|[^a-z])(ms|millis)/.test(c)) return 1e-3;
  if (/(^|[^a-z])(min|minutes?)([^a-z]|$)/.test(c)) return 60;
  if (/(^|[^a-z])(h|hr|hours?)([^a-z]|$)/.test(c)) return 3600;
  return 1;
}
