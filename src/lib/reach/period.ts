/**
 * Reporting periods for reach figures: half-open UTC date ranges [from, to), calendar quarters, school years,
 * the period before a period, and the labels of the buckets a series is cut into. Dates are 'YYYY-MM-DD'
 * strings in UTC; nothing here reads the clock.
 */

/** The month a school year starts (July: school years run July–June). // common practice, no source */
export const SCHOOL_YEAR_START_MONTH = 7;
/** The longest period one request may cover, in months (ten school years). */
export const REACH_PERIOD_MAX_MONTHS = 120;

/** How a series is cut: calendar months, calendar quarters, calendar years or school years. */
export const REACH_BUCKETS = ['month', 'quarter', 'year', 'school_year'] as const;
export type ReachBucket = (typeof REACH_BUCKETS)[number];
/** The heading of a series table's bucket column. */
export const REACH_BUCKET_HEADINGS: Record<ReachBucket, string> = {
  month: 'Month',
  quarter: 'Quarter',
  year: 'Year',
  school_year: 'School year',
};

export interface ReachPeriod {
  /** First day in the period, 'YYYY-MM-DD'. */
  from: string;
  /** First day after the period, 'YYYY-MM-DD'. */
  to: string;
}

const pad = (n: number) => String(n).padStart(2, '0');

/** 'YYYY-MM-DD' of a UTC date. */
export function dateIso(date: Date): string {
  return `${date.getUTCFullYear()}-${pad(date.getUTCMonth() + 1)}-${pad(date.getUTCDate())}`;
}

/** The UTC midnight of a 'YYYY-MM-DD' date. */
export function dateParse(iso: string): Date {
  return new Date(`${iso}T00:00:00Z`);
}

/** The first day of the month `months` after the month of `iso` (negative goes back). */
export function monthShift(iso: string, months: number): string {
  const d = dateParse(iso);
  return dateIso(new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth() + months, 1)));
}

/** Whole months from `from` to `to` when both are first days of a month, else null. */
export function periodMonths(period: ReachPeriod): number | null {
  const a = dateParse(period.from);
  const b = dateParse(period.to);
  if (a.getUTCDate() !== 1 || b.getUTCDate() !== 1) return null;
  return (b.getUTCFullYear() - a.getUTCFullYear()) * 12 + b.getUTCMonth() - a.getUTCMonth();
}

/**
 * The period of the same length just before this one: the previous N months when the period is whole months
 * (a quarter's previous period is the quarter before), else the same number of days before.
 */
export function periodPrevious(period: ReachPeriod): ReachPeriod {
  const months = periodMonths(period);
  if (months !== null) return { from: monthShift(period.from, -months), to: period.from };
  const days = (dateParse(period.to).getTime() - dateParse(period.from).getTime()) / 86_400_000;
  return { from: dateIso(new Date(dateParse(period.from).getTime() - days * 86_400_000)), to: period.from };
}

/** A calendar quarter written 'YYYY-Qn'. */
export const QUARTER_PATTERN = /^(\d{4})-Q([1-4])$/;

/** The period of a calendar quarter 'YYYY-Qn', or null when the text is not one. */
export function quarterPeriod(quarter: string): ReachPeriod | null {
  const m = QUARTER_PATTERN.exec(quarter);
  if (!m) return null;
  const from = `${m[1]}-${pad((Number(m[2]) - 1) * 3 + 1)}-01`;
  return { from, to: monthShift(from, 3) };
}

/** The trend shown beside a quarter: how many calendar quarters, ending with it. */
export const REACH_TREND_QUARTERS = 8;

/** The period of `count` calendar quarters ending with `quarter` (that one included), or null when it is not one. */
export function quartersEnding(quarter: string, count: number): ReachPeriod | null {
  const last = quarterPeriod(quarter);
  return last && { from: monthShift(last.from, -3 * (count - 1)), to: last.to };
}

/** The calendar quarter 'YYYY-Qn' that holds a date. */
export function quarterOf(iso: string): string {
  const d = dateParse(iso);
  return `${d.getUTCFullYear()}-Q${Math.floor(d.getUTCMonth() / 3) + 1}`;
}

/** The first calendar year of the school year holding a date (July 2026 → 2026, March 2027 → 2026). */
export function schoolYearOf(iso: string): number {
  const d = dateParse(iso);
  return d.getUTCMonth() + 1 >= SCHOOL_YEAR_START_MONTH ? d.getUTCFullYear() : d.getUTCFullYear() - 1;
}

/** 'SY 2026–27' for the school year starting in 2026. */
export function schoolYearLabel(startYear: number): string {
  return `SY ${startYear}–${pad((startYear + 1) % 100)}`;
}

/** The quarter of its school year (1–4) that a calendar quarter is. */
export function schoolQuarterNumber(quarter: string): number {
  const m = QUARTER_PATTERN.exec(quarter)!;
  const firstMonth = (Number(m[2]) - 1) * 3 + 1;
  return (((firstMonth - SCHOOL_YEAR_START_MONTH + 12) % 12) / 3 + 1) | 0;
}

/** A quarter as a funder reads it: '2026 Q3 · SY 2026–27 Q1'. */
export function quarterLabel(quarter: string): string {
  const period = quarterPeriod(quarter)!;
  const [year, q] = quarter.split('-');
  return `${year} ${q} · ${schoolYearLabel(schoolYearOf(period.from))} Q${schoolQuarterNumber(quarter)}`;
}

/** The label of the bucket that starts on `start` ('YYYY-MM-DD', a bucket start as the database gives it). */
export function bucketLabel(bucket: ReachBucket, start: string): string {
  switch (bucket) {
    case 'month':
      return start.slice(0, 7);
    case 'quarter':
      return quarterLabel(quarterOf(start));
    case 'year':
      return start.slice(0, 4);
    case 'school_year':
      return schoolYearLabel(schoolYearOf(start));
  }
}

/** Start dates of every bucket that overlaps the period, in order (so a series shows empty buckets as 0). */
export function bucketStarts(bucket: ReachBucket, period: ReachPeriod): string[] {
  const first = dateParse(period.from);
  let start: string;
  let step: number;
  if (bucket === 'month') {
    start = monthShift(period.from, 0);
    step = 1;
  } else if (bucket === 'quarter') {
    start = quarterPeriod(quarterOf(period.from))!.from;
    step = 3;
  } else if (bucket === 'year') {
    start = `${first.getUTCFullYear()}-01-01`;
    step = 12;
  } else {
    start = `${schoolYearOf(period.from)}-${pad(SCHOOL_YEAR_START_MONTH)}-01`;
    step = 12;
  }
  const starts: string[] = [];
  for (let s = start; s < period.to; s = monthShift(s, step)) starts.push(s);
  return starts;
}
