/**
 * POST /api/analysis/psd-profile — the Grms of a PSD profile. Body: JSON PsdProfileInputSchema (src/lib/analysis/psd-profile.ts), at most
 * PSD_PROFILE_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  PSD_PROFILE_JSON_MAX_BYTES,
  PsdProfileInputSchema,
  type PsdProfileResult,
} from '../../../lib/analysis/psd-profile';
import { psdProfileSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(PsdProfileInputSchema, await readJson(request, PSD_PROFILE_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'psd-profile', input } })) as PsdProfileResult;
  return { result, savedResult: psdProfileSavedResult(result) };
});
