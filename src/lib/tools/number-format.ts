/** Numbers for results lists: a few significant figures, plain notation in the everyday range, exponents outside it. */

/**
 * Formats a number to `significant` figures: plain notation from 0.001 to 1 000 000, exponent notation
 * ("1.2 × 10⁻⁵") outside; null, NaN and ±Infinity give "—".
 */
export function numberFormat(value: number | null | undefined, significant = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e6) {
    const fixed = Number(value.toPrecision(significant));
    return fixed.toLocaleString('en-US', { maximumFractionDigits: 12 });
  }
  const [mantissa, exponent] = value.toExponential(significant - 1).split('e');
  const superscript = String(Number(exponent)).replace(/[-0-9]/g, (d) => '⁻⁰¹²³⁴⁵⁶⁷⁸⁹'['-0123456789'.indexOf(d)]!);
  return `${mantissa} × 10${superscript}`;
}

/** A byte count as "12 kB" / "3.4 MB" (decimal units, as the limits are stated). */
export function bytesFormat(bytes: number): string {
  if (bytes < 1000) return `${bytes} bytes`;
  if (bytes < 1e6) return `${numberFormat(bytes / 1000, 3)} kB`;
  return `${numberFormat(bytes / 1e6, 3)} MB`;
}
