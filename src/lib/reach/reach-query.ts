/**
 * The query every reach route takes (period, bucket, grouping, filters), as one zod schema shared by the
 * endpoints, the dashboard and the report. Query strings arrive as text, so booleans and numbers are parsed here.
 */
import { z } from 'zod';
import { REACH_FIGURE_IDS } from './figures';
import {
  dateParse,
  periodMonths,
  QUARTER_PATTERN,
  quarterPeriod,
  REACH_BUCKETS,
  REACH_PERIOD_MAX_MONTHS,
} from './period';

/** Ways a breakdown table is grouped. */
export const REACH_GROUPINGS = ['region', 'setting', 'high_need', 'school'] as const;
export type ReachGrouping = (typeof REACH_GROUPINGS)[number];
/** The heading of a breakdown table's group column. */
export const REACH_GROUPING_LABELS: Record<ReachGrouping, string> = {
  region: 'Region',
  setting: 'Setting',
  high_need: 'High-need',
  school: 'School',
};
export const SCHOOL_SETTINGS = ['rural', 'suburban', 'urban'] as const;

/** Largest page of a breakdown or drill-down table. */
export const REACH_PAGE_SIZE_MAX = 200;
/** Longest region or search text accepted. */
export const REACH_TEXT_MAX = 120;

/**
 * Years a reach period may fall in: nothing is recorded before 2000, and a year past 2099 is a typo. Dates outside
 * would also leave the four-digit form the database and the labels expect.
 */
export const REACH_YEAR_MIN = 2000;
export const REACH_YEAR_MAX = 2099;
const yearInRange = (s: string) => Number(s.slice(0, 4)) >= REACH_YEAR_MIN && Number(s.slice(0, 4)) <= REACH_YEAR_MAX;
const YEAR_RANGE_MESSAGE = `Pick a year from ${REACH_YEAR_MIN} to ${REACH_YEAR_MAX}.`;

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Write the date as YYYY-MM-DD, e.g. 2026-07-01.')
  .refine((s) => !Number.isNaN(dateParse(s).getTime()) && dateParse(s).toISOString().startsWith(s), {
    message: 'That date does not exist.',
  })
  .refine(yearInRange, YEAR_RANGE_MESSAGE);

/** A calendar quarter, YYYY-Qn. */
export const QuarterSchema = z
  .string()
  .regex(QUARTER_PATTERN, 'Write the quarter as YYYY-Qn, e.g. 2026-Q3.')
  .refine(yearInRange, YEAR_RANGE_MESSAGE);

const booleanText = z.enum(['true', 'false']).transform((v) => v === 'true');

/** Filters on the school a fact is credited to. */
export const ReachFiltersSchema = z.object({
  /** Only schools in this region (exact text). */
  region: z.string().trim().min(1).max(REACH_TEXT_MAX).optional(),
  /** Only schools in this setting. */
  setting: z.enum(SCHOOL_SETTINGS).optional(),
  /** Only high-need schools (true) or only the others (false). */
  highNeed: booleanText.optional(),
  /** Only this school. */
  schoolId: z.string().uuid('schoolId must be a school id (a UUID).').optional(),
});

/** A period as from/to dates or as a calendar quarter ('2026-Q3'). */
const PeriodInputSchema = z
  .object({
    /** First day of the period, YYYY-MM-DD. */
    from: isoDate.optional(),
    /** First day after the period, YYYY-MM-DD. */
    to: isoDate.optional(),
    /** A calendar quarter, YYYY-Qn; instead of from and to. */
    quarter: QuarterSchema.optional(),
  })
  .transform((v, ctx) => {
    const period = v.quarter ? quarterPeriod(v.quarter)! : v.from && v.to ? { from: v.from, to: v.to } : null;
    if (!period) {
      ctx.addIssue({ code: 'custom', path: ['from'], message: 'Give a period: from and to, or a quarter.' });
      return z.NEVER;
    }
    if (period.from >= period.to) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: 'The period must end after it starts.' });
      return z.NEVER;
    }
    const months = periodMonths({ from: period.from, to: period.to });
    const days = (dateParse(period.to).getTime() - dateParse(period.from).getTime()) / 86_400_000;
    if ((months ?? days / 30) > REACH_PERIOD_MAX_MONTHS) {
      ctx.addIssue({
        code: 'custom',
        path: ['to'],
        message: `A period may cover at most ${REACH_PERIOD_MAX_MONTHS / 12} years.`,
      });
      return z.NEVER;
    }
    return period;
  });

/** GET /api/reach/figures: headline figures, their change and their series by bucket. */
export const ReachFiguresQuerySchema = z
  .object({ bucket: z.enum(REACH_BUCKETS).default('month') })
  .merge(ReachFiltersSchema)
  .and(PeriodInputSchema);
export type ReachFiguresQuery = z.infer<typeof ReachFiguresQuerySchema>;

const paging = {
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(REACH_PAGE_SIZE_MAX).default(25),
};

/** GET /api/reach/breakdown: one row per group with every figure, sorted and paged on the server. */
export const ReachBreakdownQuerySchema = z
  .object({
    groupBy: z.enum(REACH_GROUPINGS).default('school'),
    sort: z.enum(['group', ...REACH_FIGURE_IDS]).default('students'),
    dir: z.enum(['asc', 'desc']).default('desc'),
    /** Only groups whose name contains this text (ignoring case). */
    q: z.string().trim().max(REACH_TEXT_MAX).optional(),
    ...paging,
  })
  .merge(ReachFiltersSchema)
  .and(PeriodInputSchema);
export type ReachBreakdownQuery = z.infer<typeof ReachBreakdownQuerySchema>;

/** GET /api/reach/rows: the facts one figure counts (the drill-down), paged. */
export const ReachRowsQuerySchema = z
  .object({ figure: z.enum(REACH_FIGURE_IDS), ...paging })
  .merge(ReachFiltersSchema)
  .and(PeriodInputSchema);
export type ReachRowsQuery = z.infer<typeof ReachRowsQuerySchema>;

/** GET /api/reach/report.pdf: one calendar quarter. */
export const ReachReportQuerySchema = z.object({
  quarter: QuarterSchema,
});

/** A URL query string as a plain object (the last value of a repeated key wins). */
export function queryObject(params: URLSearchParams): Record<string, string> {
  return Object.fromEntries(params.entries());
}
