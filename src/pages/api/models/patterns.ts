import { KIT_REQUEST_BYTES_MAX, PatternsRequestSchema } from '../../../lib/kit/kit-inputs';
import { workRun } from '../../../lib/work/work-pool.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { modelSourceInline } from '../../../lib/models/model-source.server';
import { KIT_VIEWERS } from '../kits/_access';

/** Flat pieces (outline, folds, tabs, hinge tree) and wire boom threads of a model at a scale on a paper weight. */
export const POST = endpoint({ access: KIT_VIEWERS }, async (context) => {
  const input = parseInput(
    PatternsRequestSchema,
    await readJson(context.request, KIT_REQUEST_BYTES_MAX),
    'patterns request',
  );
  return workRun({ kind: 'kit-patterns', input: await modelSourceInline(context.locals.actor, input) });
});
