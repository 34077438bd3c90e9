import { z } from 'zod';
import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { KIT_REQUEST_BYTES_MAX, KitInputsSchema } from '../../../lib/kit/kit-inputs';
import { kitFile, kitFileResponse } from '../../../lib/kit/kit-files.server';
import { kitPreviewFile } from '../../../lib/kit/kit-preview.server';
import { endpoint } from '../../../lib/http/endpoint';
import { progressWanted, type StreamedFile } from '../../../lib/http/progress-lines';
import { progressResponse } from '../../../lib/http/progress-stream';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { modelSourceInline } from '../../../lib/models/model-source.server';

const PreviewFileSchema = z.object({
  inputs: KitInputsSchema,
  output: z.enum(['pdf', 'svg', 'stl', 'json']),
  /** For SVG: the 1-based sheet. */
  sheet: z.number().int().min(1).optional(),
});

/**
 * One file of an unsaved kit, for the builder's downloads before saving (no QR code: the kit has no page yet).
 * With `Accept: application/x-ndjson` the build streams its stages and the file comes base64 in the last line.
 */
export const POST = endpoint({ access: ANY_ACCOUNT }, async (context) => {
  const parsed = parseInput(PreviewFileSchema, await readJson(context.request, KIT_REQUEST_BYTES_MAX), 'download');
  const { output, sheet } = parsed;
  const inputs = await modelSourceInline(context.locals.actor, parsed.inputs);
  const sheetParam = { sheet: sheet === undefined ? null : String(sheet) };
  if (!progressWanted(context.request)) {
    const { request, build } = await kitPreviewFile(inputs, output);
    return kitFileResponse(context.request, request, build, output, sheetParam);
  }
  return progressResponse(context.request, context.locals.requestId, async (onStage, signal): Promise<StreamedFile> => {
    const { request, build } = await kitPreviewFile(inputs, output, { onStage, signal });
    const file = kitFile(request, build, output, sheetParam);
    return { name: file.name, type: file.type, base64: Buffer.from(file.body).toString('base64') };
  });
});
