import { z } from 'zod';
import { KitTitleSchema } from '../../../lib/kit/kit-settings';
import { kitDelete } from '../../../lib/db/kits';
import { kitOwnedOrThrow, kitRenameOwned, kitView, kitVisible } from '../../../lib/kit/saved-kit.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { KIT_VIEWERS } from './_access';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

const KitRenameSchema = z.object({ title: KitTitleSchema });

/** A saved kit's metadata and download links. */
export const GET = endpoint({ access: KIT_VIEWERS }, async ({ locals, params }) => ({
  kit: kitView(await kitVisible(locals.actor, params.id ?? '')),
}));

/** Renames a kit (its teacher only). */
export const PATCH = endpoint({ access: ['teacher'] }, async (context) => {
  const row = await kitOwnedOrThrow(context.locals.actor, context.params.id ?? '');
  const { title } = parseInput(KitRenameSchema, await readJson(context.request, BODY_BYTES_FORM), 'rename');
  await kitRenameOwned(row, title);
  return { kit: kitView(await kitVisible(context.locals.actor, row.id)) };
});

/** Deletes a kit (its teacher only). */
export const DELETE = endpoint({ access: ['teacher'] }, async ({ locals, params }) => {
  const row = await kitOwnedOrThrow(locals.actor, params.id ?? '');
  await kitDelete(row.id);
  return { ok: true, id: row.id };
});
