/**
 * POST /api/analysis/magnetic — the keep-it-non-magnetic tool. Body: JSON MagneticInputSchema (src/lib/analysis/magnetic.ts), at most
 * MAGNETIC_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import { MAGNETIC_JSON_MAX_BYTES, MagneticInputSchema, type MagneticResult } from '../../../lib/analysis/magnetic';
import { magneticSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(MagneticInputSchema, await readJson(request, MAGNETIC_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'magnetic', input } })) as MagneticResult;
  return { result, savedResult: magneticSavedResult(input.readings, result) };
});
