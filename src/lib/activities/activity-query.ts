/**
 * GET /api/activities' query: the library page's filters (`grade`, `kind`, `time`, activity-filter.ts) checked
 * strictly, because a program calling the API should hear that a value is unknown, where the page shows all
 * activities for a stale hand-edited link. Also what the API answers for each activity.
 */
import { z } from 'zod';
import { GRADE_BANDS, TEST_KINDS, TIME_BANDS, type TimeBandId } from './activity-facets';
import type { ActivityFilter } from './activity-filter';
import { activityHrefs, activityDataTools } from './activity-links';
import type { Activity } from './activity-schema';

const oneOf = <T extends readonly [string, ...string[]]>(values: T, what: string) =>
  z.enum(values, { errorMap: () => ({ message: `${what} must be one of ${values.join(', ')}` }) });

const TIME_BAND_IDS = TIME_BANDS.map((b) => b.id) as [TimeBandId, ...TimeBandId[]];

/** The query: each filter optional; an unknown value or parameter is a 400 naming what would work. */
export const ActivityQuerySchema = z
  .object({
    grade: oneOf(GRADE_BANDS, 'grade').optional(),
    kind: oneOf(TEST_KINDS, 'kind').optional(),
    time: oneOf(TIME_BAND_IDS, 'time').optional(),
  })
  .strict();

/** The filter a checked query asks for. */
export function activityQueryFilter(query: z.infer<typeof ActivityQuerySchema>): ActivityFilter {
  return { grade: query.grade ?? null, kind: query.kind ?? null, time: query.time ?? 'any' };
}

/** One activity as the API lists it: its facets and where its pages, PDFs and data tools are. */
export function activitySummary(a: Activity) {
  return {
    slug: a.slug,
    title: a.title,
    summary: a.summary,
    testKind: a.testKind,
    gradeBands: a.gradeBands,
    timeMinutes: a.timeMinutes,
    teamSize: a.teamSize,
    models: a.models,
    safetyNotes: a.safety !== undefined,
    dataTools: activityDataTools(a),
    links: activityHrefs(a.slug),
  };
}
