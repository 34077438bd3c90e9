/**
 * POST /api/analysis/deployment — the deploy-test tool. Body: JSON DeploymentInputSchema
 * (src/lib/analysis/deployment.ts), at most DEPLOYMENT_JSON_MAX_BYTES bytes (413 above). Answers
 * { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  DEPLOYMENT_JSON_MAX_BYTES,
  DeploymentInputSchema,
  type DeploymentResult,
} from '../../../lib/analysis/deployment';
import { deploymentSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(DeploymentInputSchema, await readJson(request, DEPLOYMENT_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'deployment', input } })) as DeploymentResult;
  return { result, savedResult: deploymentSavedResult(result) };
});
