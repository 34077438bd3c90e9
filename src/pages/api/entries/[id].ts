import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { entryForActor } from '../../../lib/journal/entry-access.server';
import { entryRemove, entryUpdate } from '../../../lib/journal/entry-flows.server';
import { ENTRY_REQUEST_BYTES_MAX, EntryUpdateSchema } from '../../../lib/journal/entry-rules';
import { entryView } from '../../../lib/journal/entry-view.server';
import { parseInput } from '../../../lib/validation';
import { ENTRY_AUTHORS } from './_access';

/** One entry: published ones for anyone; unpublished ones for its class, its teacher and reviewers (else 404). */
export const GET = endpoint({ access: ['anyone'] }, async ({ locals, params }) => ({
  entry: entryView(await entryForActor(locals.actor, params.id ?? ''), locals.actor),
}));

/** Changes a draft or returned entry (its teacher, or its team through the class session). */
export const PATCH = endpoint({ access: ENTRY_AUTHORS }, async ({ locals, params, request }) => {
  const patch = parseInput(EntryUpdateSchema, await readJson(request, ENTRY_REQUEST_BYTES_MAX), 'entry');
  await entryUpdate(locals.actor, params.id ?? '', patch);
  return { entry: entryView(await entryForActor(locals.actor, params.id ?? ''), locals.actor) };
});

/** Deletes a draft or returned entry. */
export const DELETE = endpoint({ access: ENTRY_AUTHORS }, async ({ locals, params }) => {
  await entryRemove(locals.actor, params.id ?? '');
  return { ok: true, id: params.id };
});
