/**
 * POST /api/analysis/cleanroom — the clean-room tool. Body: JSON CleanroomInputSchema (src/lib/analysis/cleanroom.ts), at most
 * CLEANROOM_JSON_MAX_BYTES bytes (413 above). Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { readJson } from '../../../lib/http/respond';
import { CLEANROOM_JSON_MAX_BYTES, CleanroomInputSchema, type CleanroomResult } from '../../../lib/analysis/cleanroom';
import { cleanroomSavedResult } from '../../../lib/analysis/saved-result-tools';
import { parseInput } from '../../../lib/validation';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const input = parseInput(CleanroomInputSchema, await readJson(request, CLEANROOM_JSON_MAX_BYTES));
  const result = (await workRun({ kind: 'analysis', call: { tool: 'cleanroom', input } })) as CleanroomResult;
  return { result, savedResult: cleanroomSavedResult(result) };
});
