import { z } from 'zod';
import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { siteUrl } from '../../../lib/auth/site-url';
import { KitInputsSchema } from '../../../lib/kit/kit-inputs';
import { kitRequestOf } from '../../../lib/kit/kit-inputs';
import { demoModelResolve } from '../../../lib/kit/demo-models.server';
import { kitFileResponse } from '../../../lib/kit/kit-files.server';
import { kitPreviewFile } from '../../../lib/kit/kit-preview.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';

const PreviewFileSchema = z.object({
  inputs: KitInputsSchema,
  output: z.enum(['pdf', 'svg', 'stl', 'json']),
  /** For SVG: the 1-based sheet. */
  sheet: z.number().int().min(1).optional(),
});

/** One file of an unsaved kit, for the builder's downloads before saving (its QR code points at the builder). */
export const POST = endpoint({ access: ANY_ACCOUNT }, async (context) => {
  const { inputs, output, sheet } = parseInput(PreviewFileSchema, await readJson(context.request, 200_000), 'download');
  const qrUrl = `${siteUrl(context.url).replace(/\/+$/, '')}/kits/new`;
  const build = await kitPreviewFile(inputs, qrUrl, output);
  const request = kitRequestOf(inputs, demoModelResolve(inputs).model, qrUrl);
  return kitFileResponse(context.request, request, build, output, {
    sheet: sheet === undefined ? null : String(sheet),
  });
});
