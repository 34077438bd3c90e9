import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { entryForActor } from '../../../../lib/journal/entry-access.server';
import { entrySubmit } from '../../../../lib/journal/entry-flows.server';
import { EntrySubmitSchema } from '../../../../lib/journal/entry-rules';
import { entryView } from '../../../../lib/journal/entry-view.server';
import { parseInput } from '../../../../lib/validation';
import { ENTRY_AUTHORS } from '../_access';
import { BODY_BYTES_TOKEN } from '../../../../lib/http/body-limits';

/** Submits a draft or returned entry: a teacher's goes to review, a team's waits for its teacher's approval. */
export const POST = endpoint({ access: ENTRY_AUTHORS }, async ({ locals, params, request }) => {
  const { photosConfirmed } = parseInput(EntrySubmitSchema, await readJson(request, BODY_BYTES_TOKEN), 'submission');
  await entrySubmit(locals.actor, params.id ?? '', photosConfirmed);
  return { entry: entryView(await entryForActor(locals.actor, params.id ?? ''), locals.actor) };
});
