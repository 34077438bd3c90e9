/**
 * Ranges for the readings the data tools accept. A finite number can still overflow: 1e308 squared, or divided by
 * 5e-324, is Infinity, and a result of Infinity is no answer. So every reading has a range wide enough for any
 * real instrument and narrow enough that sums of squares, powers and ratios of the tool stay finite, and the
 * range is named in the 400.
 */
import { z } from 'zod';

/** Longest time stamp, s (about 32 years of logging). */
export const READING_TIME_MAX_S = 1e9;

/** A finite number from min to max, refused with a message that names the range and its unit. */
export function readingBetween(min: number, max: number, unit: string) {
  const range = `from ${min} to ${max}${unit ? ` ${unit}` : ''}`;
  return z
    .number({ invalid_type_error: `must be a number ${range}` })
    .finite(`must be a finite number ${range}`)
    .min(min, `must be ${range}`)
    .max(max, `must be ${range}`);
}

/** A time stamp in seconds within ±READING_TIME_MAX_S. */
export const ReadingTimeSchema = readingBetween(-READING_TIME_MAX_S, READING_TIME_MAX_S, 's');

/** True when every number anywhere in the value (objects and arrays, nested) is finite. */
export function readingsFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(readingsFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(readingsFinite);
  return true;
}
