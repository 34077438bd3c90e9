import { endpoint } from '../../../../../lib/http/endpoint';
import { readJson } from '../../../../../lib/http/respond';
import {
  IMPORTED_MODEL_REQUEST_BYTES_MAX,
  MeshKitSummaryRequestSchema,
} from '../../../../../lib/models/imported-model-inputs';
import { importedModelKitSummary } from '../../../../../lib/models/imported-models.server';
import { parseInput } from '../../../../../lib/validation';
import { KIT_VIEWERS } from '../../../kits/_access';

/**
 * What the model makes as a kit at a scale on a sheet and paper: pieces, sheets, cut length, glue tabs, taped
 * edges and the fold-back check. The unfold runs in the worker pool.
 */
export const POST = endpoint({ access: KIT_VIEWERS }, async ({ locals, params, request }) => {
  const settings = parseInput(
    MeshKitSummaryRequestSchema,
    await readJson(request, IMPORTED_MODEL_REQUEST_BYTES_MAX),
    'summary request',
  );
  return { summary: await importedModelKitSummary(locals.actor, params.id ?? '', settings) };
});
