/**
 * POST /api/analysis/orbit-eclipse — orbit period and eclipse length. Body: JSON OrbitEclipseInputSchema (src/lib/analysis/orbit-eclipse.ts), at most
 * ORBIT_ECLIPSE_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  ORBIT_ECLIPSE_JSON_MAX_BYTES,
  OrbitEclipseInputSchema,
  type OrbitEclipseResult,
} from '../../../lib/analysis/orbit-eclipse';
import { orbitEclipseSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(OrbitEclipseInputSchema, await readJson(request, ORBIT_ECLIPSE_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'orbit-eclipse', input } })) as OrbitEclipseResult;
  return { result, savedResult: orbitEclipseSavedResult(input, result) };
});
