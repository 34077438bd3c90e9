import { ANY_ACCOUNT } from '../../../../lib/auth/actor';
import { endpoint } from '../../../../lib/http/endpoint';
import { json } from '../../../../lib/http/respond';
import { importedModelList, importedModelUpload } from '../../../../lib/models/imported-models.server';
import { KIT_VIEWERS } from '../../kits/_access';

/** The imported models the caller may build: their own and the shared ones (staff: all), newest first. */
export const GET = endpoint({ access: KIT_VIEWERS }, async ({ locals }) => ({
  models: await importedModelList(locals.actor),
}));

/**
 * Imports an OBJ or STL file (multipart: the file in "file", an optional "title"; at most 20 MB and 100,000
 * triangles). Answers 201 with the model: what the check found and repaired, its size in each unit and the
 * unit guessed; 400 naming the first problem of a file paper cannot fold.
 */
export const POST = endpoint({ access: ANY_ACCOUNT }, async ({ locals, request }) =>
  json({ model: await importedModelUpload(locals.actor, request) }, 201),
);
