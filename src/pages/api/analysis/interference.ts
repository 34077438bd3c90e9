/**
 * POST /api/analysis/interference — the interference-hunt tool. Body: JSON InterferenceInputSchema
 * (src/lib/analysis/interference.ts), at most INTERFERENCE_JSON_MAX_BYTES bytes (413 above). Answers
 * { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import {
  INTERFERENCE_JSON_MAX_BYTES,
  InterferenceInputSchema,
  interferenceRank,
} from '../../../lib/analysis/interference';
import { interferenceSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(InterferenceInputSchema, await readJson(request, INTERFERENCE_JSON_MAX_BYTES));
  const result = interferenceRank(input);
  return { result, savedResult: interferenceSavedResult(result) };
});
