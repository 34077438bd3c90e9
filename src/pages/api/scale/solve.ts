import { KIT_REQUEST_BYTES_MAX, ScaleSolveRequestSchema } from '../../../lib/kit/kit-inputs';
import { kitScaleSolve } from '../../../lib/kit/kit-preview.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { modelSourceInline } from '../../../lib/models/model-source.server';
import { KIT_VIEWERS } from '../kits/_access';

/** The solver's scale for paper and venue together, with plain-words explanations and the nearest alternatives. */
export const POST = endpoint({ access: KIT_VIEWERS }, async (context) => {
  const input = parseInput(
    ScaleSolveRequestSchema,
    await readJson(context.request, KIT_REQUEST_BYTES_MAX),
    'scale request',
  );
  return kitScaleSolve(await modelSourceInline(context.locals.actor, input));
});
