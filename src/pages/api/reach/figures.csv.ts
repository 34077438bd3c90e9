import { STAFF } from '../../../lib/auth/actor';
import { endpoint } from '../../../lib/http/endpoint';
import { REACH_BUCKET_HEADINGS } from '../../../lib/reach/period';
import { reachSeriesCsv } from '../../../lib/reach/reach-csv';
import { reachFilters, reachSummary } from '../../../lib/reach/reach-data.server';
import { csvResponse } from '../../../lib/reach/csv-response';
import { queryObject, ReachFiguresQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';

/** Every figure by bucket as CSV (the school page's table over time): the same numbers as /api/reach/figures. */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(ReachFiguresQuerySchema, queryObject(url.searchParams), 'reach query');
  const summary = await reachSummary({ from: q.from, to: q.to }, q.bucket, reachFilters(q));
  return csvResponse(
    reachSeriesCsv(REACH_BUCKET_HEADINGS[q.bucket], summary.buckets, summary.series),
    `reach-by-${q.bucket}-${q.from}-to-${q.to}.csv`,
  );
});
