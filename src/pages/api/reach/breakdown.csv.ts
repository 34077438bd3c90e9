import { STAFF } from '../../../lib/auth/actor';
import { endpoint } from '../../../lib/http/endpoint';
import { reachBreakdownCsv } from '../../../lib/reach/reach-csv';
import { reachBreakdownPage } from '../../../lib/reach/reach-data.server';
import { csvResponse } from '../../../lib/reach/csv-response';
import { queryObject, REACH_GROUPING_LABELS, ReachBreakdownQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';

/** The breakdown table as CSV: every row under the same filters and order as the table (all pages). */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(ReachBreakdownQuerySchema, queryObject(url.searchParams), 'breakdown query');
  const { rows } = await reachBreakdownPage(q, true);
  return csvResponse(
    reachBreakdownCsv(REACH_GROUPING_LABELS[q.groupBy], rows),
    `reach-by-${q.groupBy}-${q.from}-to-${q.to}.csv`,
  );
});
