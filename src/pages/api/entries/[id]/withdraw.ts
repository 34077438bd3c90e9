import { endpoint } from '../../../../lib/http/endpoint';
import { entryForActor } from '../../../../lib/journal/entry-access.server';
import { entryWithdraw } from '../../../../lib/journal/entry-flows.server';
import { entryView } from '../../../../lib/journal/entry-view.server';

/** The teacher withdraws a submitted entry: it becomes a draft again. */
export const POST = endpoint({ access: ['teacher'] }, async ({ locals, params }) => {
  await entryWithdraw(locals.actor, params.id ?? '');
  return { entry: entryView(await entryForActor(locals.actor, params.id ?? ''), locals.actor) };
});
