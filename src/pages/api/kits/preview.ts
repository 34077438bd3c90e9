import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { KIT_REQUEST_BYTES_MAX, KitInputsSchema } from '../../../lib/kit/kit-inputs';
import { kitPreview } from '../../../lib/kit/kit-preview.server';
import { endpoint } from '../../../lib/http/endpoint';
import { progressWanted } from '../../../lib/http/progress-lines';
import { progressResponse } from '../../../lib/http/progress-stream';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { modelSourceInline } from '../../../lib/models/model-source.server';

/**
 * Every sheet of an unsaved kit as SVG, with the plain-words scale summary (nothing is saved). With
 * `Accept: application/x-ndjson` the build streams its stages first (src/lib/http/progress-lines.ts).
 */
export const POST = endpoint({ access: ANY_ACCOUNT }, async (context) => {
  const inputs = await modelSourceInline(
    context.locals.actor,
    parseInput(KitInputsSchema, await readJson(context.request, KIT_REQUEST_BYTES_MAX), 'kit'),
  );
  if (!progressWanted(context.request)) return kitPreview(inputs);
  return progressResponse(context.request, context.locals.requestId, (onStage, signal) =>
    kitPreview(inputs, { onStage, signal }),
  );
});
