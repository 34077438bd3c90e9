import { STAFF } from '../../../lib/auth/actor';
import { reviewQueueNow, reviewQueuePage } from '../../../lib/db/entries';
import { endpoint } from '../../../lib/http/endpoint';
import { ReviewQueueQuerySchema } from '../../../lib/journal/entry-rules';
import { entrySummary } from '../../../lib/journal/entry-view.server';
import { parseInput } from '../../../lib/validation';

/** One page of the review queue: submitted, teacher-approved entries, filtered and sorted on the server. */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const query = parseInput(ReviewQueueQuerySchema, Object.fromEntries(url.searchParams), 'query');
  const now = reviewQueueNow();
  const { rows, total } = await reviewQueuePage(query, now);
  return {
    entries: rows.map((r) => entrySummary(r, now)),
    total,
    page: query.page,
    pageSize: query.pageSize,
    pageCount: Math.max(1, Math.ceil(total / query.pageSize)),
  };
});
