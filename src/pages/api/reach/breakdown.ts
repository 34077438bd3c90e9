import { STAFF } from '../../../lib/auth/actor';
import { endpoint } from '../../../lib/http/endpoint';
import { reachBreakdownPage } from '../../../lib/reach/reach-data.server';
import { queryObject, ReachBreakdownQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';

/** Every reach figure per region, setting, high-need flag or school: filtered, sorted and paged on the server. */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const q = parseInput(ReachBreakdownQuerySchema, queryObject(url.searchParams), 'breakdown query');
  const { rows, total } = await reachBreakdownPage(q);
  return { rows, total, page: q.page, pageSize: q.pageSize };
});
