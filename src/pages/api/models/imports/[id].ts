import { ANY_ACCOUNT } from '../../../../lib/auth/actor';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import {
  IMPORTED_MODEL_REQUEST_BYTES_MAX,
  ImportedModelChangeSchema,
} from '../../../../lib/models/imported-model-inputs';
import {
  importedModelChange,
  importedModelFind,
  importedModelRemove,
  importedModelView,
} from '../../../../lib/models/imported-models.server';
import { parseInput } from '../../../../lib/validation';
import { KIT_VIEWERS } from '../../kits/_access';

/** One imported model the caller may see. */
export const GET = endpoint({ access: KIT_VIEWERS }, async ({ locals, params }) => ({
  model: importedModelView(locals.actor, await importedModelFind(locals.actor, params.id ?? '')),
}));

/** Changes title, unit, reduction (owner or staff) or sharing (staff); 409 for unit or reduction once kits use it. */
export const PATCH = endpoint({ access: ANY_ACCOUNT }, async ({ locals, params, request }) => {
  const change = parseInput(
    ImportedModelChangeSchema,
    await readJson(request, IMPORTED_MODEL_REQUEST_BYTES_MAX),
    'model change',
  );
  return { model: await importedModelChange(locals.actor, params.id ?? '', change) };
});

/** Deletes a model and its stored file (owner or staff); 409 while saved kits are built from it. */
export const DELETE = endpoint({ access: ANY_ACCOUNT }, async ({ locals, params }) => {
  await importedModelRemove(locals.actor, params.id ?? '');
  return { ok: true };
});
