/**
 * The library's filters: read from a query string (the filter form submits by GET, so it works without
 * JavaScript), applied to a list of activities, and written back as a query string for links.
 */
import { GRADE_BANDS, TEST_KINDS, TIME_BANDS, type GradeBand, type TestKind, type TimeBandId } from './activity-facets';

export interface ActivityFilter {
  /** Keep activities for this grade band; null keeps all. */
  grade: GradeBand | null;
  /** Keep activities of this test kind; null keeps all. */
  kind: TestKind | null;
  /** Keep activities that fit this time band. */
  time: TimeBandId;
}

/** What the filter needs of an activity. */
export interface ActivityFacets {
  gradeBands: readonly GradeBand[];
  testKind: TestKind;
  timeMinutes: number;
}

export const ACTIVITY_FILTER_NONE: ActivityFilter = { grade: null, kind: null, time: 'any' };

const pick = <T extends string>(allowed: readonly T[], value: string | null): T | null =>
  value !== null && (allowed as readonly string[]).includes(value) ? (value as T) : null;

/**
 * The filter a query string asks for (`grade`, `kind`, `time`); unknown or missing values mean "no filter",
 * because a hand-edited or stale link should still show the library rather than an error.
 */
export function activityFilterFromQuery(params: URLSearchParams): ActivityFilter {
  return {
    grade: pick(GRADE_BANDS, params.get('grade')),
    kind: pick(TEST_KINDS, params.get('kind')),
    time:
      pick(
        TIME_BANDS.map((b) => b.id),
        params.get('time'),
      ) ?? 'any',
  };
}

/** The query string for a filter, without defaults ("" when nothing is filtered). */
export function activityFilterToQuery(filter: ActivityFilter): string {
  const params = new URLSearchParams();
  if (filter.grade) params.set('grade', filter.grade);
  if (filter.kind) params.set('kind', filter.kind);
  if (filter.time !== 'any') params.set('time', filter.time);
  return params.toString();
}

/** True when an activity passes every part of the filter. */
export function activityFilterMatches(activity: ActivityFacets, filter: ActivityFilter): boolean {
  const maxMinutes = TIME_BANDS.find((b) => b.id === filter.time)?.maxMinutes ?? Number.POSITIVE_INFINITY;
  return (
    (filter.grade === null || activity.gradeBands.includes(filter.grade)) &&
    (filter.kind === null || activity.testKind === filter.kind) &&
    activity.timeMinutes <= maxMinutes
  );
}

/** The activities that pass the filter, in their given order; [] for an empty list. */
export function activityFilterApply<T extends ActivityFacets>(activities: readonly T[], filter: ActivityFilter): T[] {
  return activities.filter((a) => activityFilterMatches(a, filter));
}
