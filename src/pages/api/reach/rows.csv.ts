import { STAFF } from '../../../lib/auth/actor';
import { endpoint } from '../../../lib/http/endpoint';
import { reachFigure } from '../../../lib/reach/figures';
import { reachRowsCsv } from '../../../lib/reach/reach-csv';
import { reachRowsPage } from '../../../lib/reach/reach-data.server';
import { csvResponse } from '../../../lib/reach/csv-response';
import { queryObject, ReachRowsQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';

/** The drill-down as CSV: every row under the same filters (all pages). */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(ReachRowsQuerySchema, queryObject(url.searchParams), 'drill-down query');
  const { rows } = await reachRowsPage(q, true);
  return csvResponse(
    reachRowsCsv(reachFigure(q.figure).amountLabel ?? null, rows),
    `reach-${q.figure}-${q.from}-to-${q.to}.csv`,
  );
});
