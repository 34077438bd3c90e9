/**
 * Scans of a live link as a day-by-day series for its chart: the stored rows hold only days with scans, so the
 * days between get a zero. Days are UTC calendar days ("2026-03-09"), as the scans table stores them.
 */

export interface ScanDay {
  day: string;
  count: number;
}

const DAY_MS = 86_400_000;

/** Days since 1970-01-01 of a UTC day "YYYY-MM-DD" (the x value of the chart). */
export function scanDayNumber(day: string): number {
  return Math.round(Date.parse(`${day}T00:00:00Z`) / DAY_MS);
}

/** The UTC day "YYYY-MM-DD" of a day number. */
export function scanDayFromNumber(n: number): string {
  return new Date(n * DAY_MS).toISOString().slice(0, 10);
}

/**
 * The `days` days ending on `lastDay` (inclusive), oldest first, each with its count (0 without a row). Rows
 * outside the window are left out; `days` below 1 gives an empty series.
 */
export function linkScanDays(rows: ScanDay[], lastDay: string, days: number): ScanDay[] {
  const byDay = new Map(rows.map((r) => [r.day, r.count]));
  const last = scanDayNumber(lastDay);
  const out: ScanDay[] = [];
  for (let n = last - days + 1; n <= last; n++) {
    const day = scanDayFromNumber(n);
    out.push({ day, count: byDay.get(day) ?? 0 });
  }
  return out;
}
