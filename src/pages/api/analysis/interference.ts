/**
 * POST /api/analysis/interference — the interference-hunt tool. Body: JSON InterferenceInputSchema
 * (src/lib/analysis/interference.ts), at most INTERFERENCE_JSON_MAX_BYTES bytes (413 above). Answers
 * { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  INTERFERENCE_JSON_MAX_BYTES,
  InterferenceInputSchema,
  type InterferenceResult,
} from '../../../lib/analysis/interference';
import { interferenceSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(InterferenceInputSchema, await readJson(request, INTERFERENCE_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'interference', input } })) as InterferenceResult;
  return { result, savedResult: interferenceSavedResult(result) };
});
