import { STAFF } from '../../../lib/auth/actor';
import { endpoint } from '../../../lib/http/endpoint';
import { reachFilters, reachSummary } from '../../../lib/reach/reach-data.server';
import { queryObject, ReachFiguresQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';

/** Headline reach figures of a period with the period before, their definitions, and a series by bucket. */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(ReachFiguresQuerySchema, queryObject(url.searchParams), 'reach query');
  return reachSummary({ from: q.from, to: q.to }, q.bucket, reachFilters(q));
});
