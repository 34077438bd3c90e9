import { z } from 'zod';
import { siteUrl } from '../../../lib/auth/site-url';
import { kitListForActor } from '../../../lib/db/kits';
import { KIT_REQUEST_BYTES_MAX, KitInputsSchema } from '../../../lib/kit/kit-inputs';
import { kitSave, kitView, kitVisible } from '../../../lib/kit/saved-kit.server';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { KIT_VIEWERS } from './_access';

const KitSaveSchema = z.object({
  /** One of the teacher's own classes. */
  classId: z.string().uuid('classId must be the id of one of your classes'),
  inputs: KitInputsSchema,
});

/** The kits the caller may open, newest first; ?classId= narrows to one class. */
export const GET = endpoint({ access: KIT_VIEWERS }, async ({ locals, url }) => {
  const classId = url.searchParams.get('classId') ?? undefined;
  return { kits: (await kitListForActor(locals.actor, classId)).map(kitView) };
});

/** Saves a kit to one of the teacher's own classes: 404 for a class that is not theirs. */
export const POST = endpoint({ access: ['teacher'] }, async (context) => {
  const { classId, inputs } = parseInput(KitSaveSchema, await readJson(context.request, KIT_REQUEST_BYTES_MAX), 'kit');
  const id = await kitSave(context.locals.actor, classId, inputs, siteUrl(context.url));
  return json({ kit: kitView(await kitVisible(context.locals.actor, id)) }, 201);
});
