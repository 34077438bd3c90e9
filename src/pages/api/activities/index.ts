/**
 * GET /api/activities — the activity library, in library order, narrowed by the library page's filters:
 * ?grade=K-2|3-5|6-8|9-12, ?kind=<test kind>, ?time=one-period|two-periods|any (src/lib/activities/activity-query.ts).
 * Answers { activities, total } where total counts the whole library. Open to anyone, like the library page.
 */
import { activityQueryFilter, ActivityQuerySchema, activitySummary } from '../../../lib/activities/activity-query';
import { activityFilterApply } from '../../../lib/activities/activity-filter';
import { activitiesAll } from '../../../lib/activities/activity-store.server';
import { endpoint } from '../../../lib/http/endpoint';
import { parseInput } from '../../../lib/validation';

export const GET = endpoint({ access: ['anyone'] }, async ({ url }) => {
  const query = parseInput(ActivityQuerySchema, Object.fromEntries(url.searchParams), 'activity filter');
  const all = (await activitiesAll()).map((e) => e.data);
  return { activities: activityFilterApply(all, activityQueryFilter(query)).map(activitySummary), total: all.length };
});
