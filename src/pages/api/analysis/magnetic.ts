/**
 * POST /api/analysis/magnetic — the keep-it-non-magnetic tool. Body: JSON MagneticInputSchema (src/lib/analysis/magnetic.ts), at most
 * MAGNETIC_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { MAGNETIC_JSON_MAX_BYTES, MagneticInputSchema, magneticFieldFit } from '../../../lib/analysis/magnetic';
import { magneticSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(MagneticInputSchema, await readJson(request, MAGNETIC_JSON_MAX_BYTES));
  const result = magneticFieldFit(input);
  return { result, savedResult: magneticSavedResult(input.readings, result) };
});
