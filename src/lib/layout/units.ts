/**
 * Exact length conversions and display helpers. 1 in = 25.4 mm, 1 ft = 0.3048 m and 1 yd = 0.9144 m
 * exactly (the 1959 international yard and pound agreement; NIST SP 811 (2008), Appendix B).
 */
export const MM_PER_INCH = 25.4;
export const MM_PER_FOOT = 304.8;
export const MM_PER_YARD = 914.4;
/** PDF user space unit is 1/72 in (ISO 32000-1:2008, 8.3.2.3). */
export const PT_PER_MM = 72 / MM_PER_INCH;

export type UnitSystem = 'metric' | 'us';

/** Millimetres to PDF points. */
export function mmToPt(lengthMm: number): number {
  return lengthMm * PT_PER_MM;
}

/** Inches to millimetres. */
export function inchToMm(lengthIn: number): number {
  return lengthIn * MM_PER_INCH;
}

/** Feet to millimetres. */
export function feetToMm(lengthFt: number): number {
  return lengthFt * MM_PER_FOOT;
}

/**
 * A length for people to read, in the unit that suits its size: mm / cm / m for metric, in / ft for US
 * customary. Degenerate input (NaN, ±∞) returns "—".
 */
export function lengthLabel(lengthMm: number, units: UnitSystem): string {
  if (!Number.isFinite(lengthMm)) return '—';
  const abs = Math.abs(lengthMm);
  if (units === 'metric') {
    if (abs < 10) return `${round(lengthMm, 1)} mm`;
    if (abs < 1000) return `${round(lengthMm / 10, 1)} cm`;
    return `${round(lengthMm / 1000, 2)} m`;
  }
  const inches = lengthMm / MM_PER_INCH;
  if (Math.abs(inches) < 36) return `${round(inches, 2)} in`;
  return `${round(lengthMm / MM_PER_FOOT, 1)} ft`;
}

function round(value: number, digits: number): string {
  return String(Number(value.toFixed(digits)));
}
