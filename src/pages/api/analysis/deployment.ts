/**
 * POST /api/analysis/deployment — the deploy-test tool. Body: JSON DeploymentInputSchema
 * (src/lib/analysis/deployment.ts), at most DEPLOYMENT_JSON_MAX_BYTES bytes (413 above). Answers
 * { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { DEPLOYMENT_JSON_MAX_BYTES, DeploymentInputSchema, deploymentAnalyse } from '../../../lib/analysis/deployment';
import { deploymentSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(DeploymentInputSchema, await readJson(request, DEPLOYMENT_JSON_MAX_BYTES));
  const result = deploymentAnalyse(input);
  return { result, savedResult: deploymentSavedResult(result) };
});
