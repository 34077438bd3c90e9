import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { siteUrl } from '../../../lib/auth/site-url';
import { KitInputsSchema } from '../../../lib/kit/kit-inputs';
import { kitPreview } from '../../../lib/kit/kit-preview.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';

/** Every sheet of an unsaved kit as SVG, with the plain-words scale summary (nothing is saved). */
export const POST = endpoint({ access: ANY_ACCOUNT }, async (context) => {
  const inputs = parseInput(KitInputsSchema, await readJson(context.request, 200_000), 'kit');
  return kitPreview(inputs, `${siteUrl(context.url).replace(/\/+$/, '')}/kits/new`);
});
