/**
 * What the dashboard, the API and the quarterly report show, assembled from the SQL of src/lib/db/reach.ts:
 * headline figures with the period before, series by bucket, the breakdown table and the drill-down.
 * The dashboard page, the API and the PDF all call these, so they cannot show different numbers.
 */
import { reachBreakdown, reachCells, reachRows, reachTotals, type ReachFilters } from '../db/reach';
import { REACH_FIGURES, type ReachFigureId } from './figures';
import { bucketLabel, bucketStarts, periodPrevious, type ReachBucket, type ReachPeriod } from './period';
import type { ReachBreakdownQuery, ReachRowsQuery } from './reach-query';

export interface ReachHeadline {
  id: ReachFigureId;
  label: string;
  definition: string;
  value: number;
  previous: number;
}

export interface ReachSummary {
  period: ReachPeriod;
  previous: ReachPeriod;
  bucket: ReachBucket;
  buckets: { start: string; label: string }[];
  figures: ReachHeadline[];
  /** Each figure's value in each bucket, in the order of `buckets`. */
  series: Record<ReachFigureId, number[]>;
}

/** The filters part of a parsed reach query. */
export function reachFilters(q: ReachFilters): ReachFilters {
  return { region: q.region, setting: q.setting, highNeed: q.highNeed, schoolId: q.schoolId };
}

/** Headline figures of the period beside the period before, and every figure's series by bucket. */
export async function reachSummary(period: ReachPeriod, bucket: ReachBucket, filters: ReachFilters) {
  const previous = periodPrevious(period);
  const [totals, cells] = await Promise.all([
    reachTotals(period, previous, filters),
    reachCells(period, bucket, 'none', filters),
  ]);
  const starts = bucketStarts(bucket, period);
  const series = Object.fromEntries(REACH_FIGURES.map((f) => [f.id, starts.map(() => 0)])) as Record<
    ReachFigureId,
    number[]
  >;
  for (const cell of cells) {
    const i = starts.indexOf(cell.bucket);
    if (i >= 0) series[cell.figure][i] = cell.value;
  }
  const summary: ReachSummary = {
    period,
    previous,
    bucket,
    buckets: starts.map((start) => ({ start, label: bucketLabel(bucket, start) })),
    figures: REACH_FIGURES.map((f) => ({
      id: f.id,
      label: f.label,
      definition: f.definition,
      value: totals.current[f.id],
      previous: totals.previous[f.id],
    })),
    series,
  };
  return summary;
}

/** The breakdown table's page (or every row when `all`). */
export function reachBreakdownPage(q: ReachBreakdownQuery, all = false) {
  return reachBreakdown({ from: q.from, to: q.to }, reachFilters(q), {
    grouping: q.groupBy,
    sort: q.sort,
    dir: q.dir,
    q: q.q,
    page: all ? null : { offset: (q.page - 1) * q.pageSize, limit: q.pageSize },
  });
}

/** The drill-down page of one figure (or every row when `all`). */
export function reachRowsPage(q: ReachRowsQuery, all = false) {
  return reachRows(
    q.figure,
    { from: q.from, to: q.to },
    reachFilters(q),
    all ? null : { offset: (q.page - 1) * q.pageSize, limit: q.pageSize },
  );
}
