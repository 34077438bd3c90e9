import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { entryForActor } from '../../../../lib/journal/entry-access.server';
import { entryApprove } from '../../../../lib/journal/entry-flows.server';
import { EntrySubmitSchema } from '../../../../lib/journal/entry-rules';
import { entryView } from '../../../../lib/journal/entry-view.server';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_TOKEN } from '../../../../lib/http/body-limits';

/** The teacher approves a team's submitted entry, so it reaches the review queue. */
export const POST = endpoint({ access: ['teacher'] }, async ({ locals, params, request }) => {
  const { photosConfirmed } = parseInput(EntrySubmitSchema, await readJson(request, BODY_BYTES_TOKEN), 'approval');
  await entryApprove(locals.actor, params.id ?? '', photosConfirmed);
  return { entry: entryView(await entryForActor(locals.actor, params.id ?? ''), locals.actor) };
});
