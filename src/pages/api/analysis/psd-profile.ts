/**
 * POST /api/analysis/psd-profile — the Grms of a PSD profile. Body: JSON PsdProfileInputSchema (src/lib/analysis/psd-profile.ts), at most
 * PSD_PROFILE_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { PSD_PROFILE_JSON_MAX_BYTES, PsdProfileInputSchema, psdProfileGrms } from '../../../lib/analysis/psd-profile';
import { psdProfileSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(PsdProfileInputSchema, await readJson(request, PSD_PROFILE_JSON_MAX_BYTES));
  const result = psdProfileGrms(input);
  return { result, savedResult: psdProfileSavedResult(result) };
});
