import { STAFF } from '../../../../lib/auth/actor';
import { actorUser } from '../../../../lib/auth/actor-require';
import { siteUrl } from '../../../../lib/auth/site-url';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { reviewDecide } from '../../../../lib/journal/entry-flows.server';
import { ENTRY_NOTE_MAX, ReviewDecisionSchema } from '../../../../lib/journal/entry-rules';
import { parseInput } from '../../../../lib/validation';

/** Publish, return (with a note) or decline (with a reason) one submitted entry; 409 naming who decided first. */
export const POST = endpoint({ access: STAFF }, async (context) => {
  const input = parseInput(
    ReviewDecisionSchema,
    await readJson(context.request, ENTRY_NOTE_MAX * 4 + 1_000),
    'decision',
  );
  const state = await reviewDecide(actorUser(context.locals.actor), context.params.id ?? '', input, {
    siteUrl: siteUrl(context.url),
    requestId: context.locals.requestId,
  });
  return { id: context.params.id, state };
});
