import { SAVED_RESULT_MAX_BYTES } from '../../../../lib/analysis/saved-result';
import { endpoint } from '../../../../lib/http/endpoint';
import { json, readJson } from '../../../../lib/http/respond';
import { entryForActor } from '../../../../lib/journal/entry-access.server';
import { entryResultAdd } from '../../../../lib/journal/entry-flows.server';
import { EntryResultAddSchema } from '../../../../lib/journal/entry-rules';
import { entryView } from '../../../../lib/journal/entry-view.server';
import { parseInput } from '../../../../lib/validation';
import { ENTRY_AUTHORS } from '../_access';

/** "Save to the class journal": adds a data tool's saved result to a draft or returned entry (at most three). */
export const POST = endpoint({ access: ENTRY_AUTHORS }, async ({ locals, params, request }) => {
  const { savedResult } = parseInput(
    EntryResultAddSchema,
    await readJson(request, SAVED_RESULT_MAX_BYTES + 1_000),
    'saved result',
  );
  await entryResultAdd(locals.actor, params.id ?? '', savedResult);
  return json({ entry: entryView(await entryForActor(locals.actor, params.id ?? ''), locals.actor) }, 201);
});
