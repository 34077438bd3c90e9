/**
 * POST /api/analysis/launch-stack — the launch-stack calculator. Body: JSON LaunchStackInputSchema
 * (src/lib/analysis/launch-stack.ts), at most LAUNCH_STACK_JSON_MAX_BYTES bytes (413 above). Answers
 * { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import {
  LAUNCH_STACK_JSON_MAX_BYTES,
  LaunchStackInputSchema,
  type LaunchStackResult,
} from '../../../lib/analysis/launch-stack';
import { launchStackSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(LaunchStackInputSchema, await readJson(request, LAUNCH_STACK_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'launch-stack', input } })) as LaunchStackResult;
  return { result, savedResult: launchStackSavedResult(input, result) };
});
