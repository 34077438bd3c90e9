import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { siteUrl } from '../../../lib/auth/site-url';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { reviewBulkPublish } from '../../../lib/journal/entry-flows.server';
import { ReviewBulkPublishSchema } from '../../../lib/journal/entry-rules';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_LIST } from '../../../lib/http/body-limits';

/** Publishes the selected queue rows at once; entries decided meanwhile come back as skipped. */
export const POST = endpoint({ access: STAFF }, async (context) => {
  const { entryIds } = parseInput(
    ReviewBulkPublishSchema,
    await readJson(context.request, BODY_BYTES_LIST),
    'bulk publish',
  );
  return reviewBulkPublish(actorUser(context.locals.actor), entryIds, {
    siteUrl: siteUrl(context.url),
    requestId: context.locals.requestId,
  });
});
