/**
 * Which unit an accelerometer record is in, g or m/s². Order of evidence: what the user states, then the
 * header (a unit token such as "m/s^2", "m/s²", "ms2" or "(g)", "_g", "[g]"), then the size of the readings.
 */

/** Standard gravity, m/s² (3rd CGPM, 1901: exact). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

export type AccelerationUnit = 'g' | 'm/s2';
export type AccelerationUnitSource = 'stated' | 'header' | 'gravity' | 'assumed';

/** The unit named in a header cell, or null when it names none. */
export function accelerationUnitFromHeader(cell: string): AccelerationUnit | null {
  const c = cell.toLowerCase().replace(/\s+/g, '');
  if (/m\/s(\^?2|²)|m\/s\/s|ms\^?-?2|m·s-2|mps2|ms2/.test(c)) return 'm/s2';
  if (/(^|[^a-z])g($|[^a-z])|\(g\)|\[g\]|_g$/.test(c)) return 'g';
  return null;
}

/**
 * Guesses the unit from the readings: a sensor at rest or shaken gently reads gravity, so the median
 * length of the (x, y, z) vector is about 1 in g and about 9.8 in m/s². Median |a| in 0.5 … 2 → g,
 * in 4.9 … 19.6 → m/s²; otherwise (gravity removed, or a violent record) null.
 */
export function accelerationUnitFromGravity(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  z: ArrayLike<number>,
): AccelerationUnit | null {
  const n = x.length;
  const step = Math.max(1, Math.floor(n / 20_000));
  const mags: number[] = [];
  for (let i = 0; i < n; i += step) mags.push(Math.hypot(x[i]!, y[i]!, z[i]!));
  mags.sort((a, b) => a - b);
  const med = mags[mags.length >> 1] ?? 0;
  if (med >= 0.5 && med <= 2) return 'g';
  if (med >= 0.5 * STANDARD_GRAVITY_M_PER_S2 && med <= 2 * STANDARD_GRAVITY_M_PER_S2) return 'm/s2';
  return null;
}
