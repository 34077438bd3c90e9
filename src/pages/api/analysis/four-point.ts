/**
 * POST /api/analysis/four-point — the four-point measurement tool. Body: JSON FourPointInputSchema
 * (src/lib/analysis/four-point.ts), at most FOUR_POINT_JSON_MAX_BYTES bytes (413 above). Answers
 * { result, savedResult }; a flat or degenerate formation is a 400 that says why.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  FOUR_POINT_JSON_MAX_BYTES,
  FourPointInputSchema,
  type FourPointResult,
} from '../../../lib/analysis/four-point';
import { fourPointSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(FourPointInputSchema, await readJson(request, FOUR_POINT_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'four-point', input } })) as FourPointResult;
  return { result, savedResult: fourPointSavedResult(input, result) };
});
