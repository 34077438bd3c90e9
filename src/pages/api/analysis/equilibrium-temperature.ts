/**
 * POST /api/analysis/equilibrium-temperature — sunlit equilibrium temperature. Body: JSON EquilibriumTemperatureInputSchema (src/lib/analysis/equilibrium-temperature.ts), at most
 * EQUILIBRIUM_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  EQUILIBRIUM_JSON_MAX_BYTES,
  EquilibriumTemperatureInputSchema,
  type EquilibriumTemperatureResult,
} from '../../../lib/analysis/equilibrium-temperature';
import { equilibriumTemperatureSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(EquilibriumTemperatureInputSchema, await readJson(request, EQUILIBRIUM_JSON_MAX_BYTES));
  const result = (await workRun({
    kind: 'analysis',
    call: { tool: 'equilibrium-temperature', input },
  })) as EquilibriumTemperatureResult;
  return { result, savedResult: equilibriumTemperatureSavedResult(input, result) };
});
