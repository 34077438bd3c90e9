/**
 * POST /api/analysis/vibration — the shake-test tool. Body: JSON VibrationInput (src/lib/analysis/vibration.ts,
 * ≤ VIBRATION_JSON_MAX_BYTES) or CSV text time,x,y,z (text/csv, ≤ VIBRATION_CSV_MAX_BYTES, options as query
 * parameters ?units=g|m/s2|auto&segmentLength=1024). Rows above VIBRATION_MAX_SAMPLES or bytes above the cap:
 * 413. Answers { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { vibrationSavedResult } from '../../../lib/analysis/saved-result-tools';
import {
  VIBRATION_JSON_MAX_BYTES,
  VibrationInputSchema,
  VibrationOptionsSchema,
  type VibrationResult,
} from '../../../lib/analysis/vibration';
import { VIBRATION_CSV_MAX_BYTES, vibrationInputFromCsv } from '../../../lib/analysis/vibration-csv';
import { parseInput } from '../../../lib/validation';
import { analysisBodyRead } from './_request-body';

export const POST = endpoint({ access: ['anyone'] }, async ({ request, url }) => {
  const body = await analysisBodyRead(request, {
    jsonBytes: VIBRATION_JSON_MAX_BYTES,
    csvBytes: VIBRATION_CSV_MAX_BYTES,
  });
  if (body.kind === 'json') {
    const input = parseInput(VibrationInputSchema, body.body);
    const result = (await workRun({ kind: 'analysis', call: { tool: 'vibration', input } })) as VibrationResult;
    return { result, savedResult: vibrationSavedResult(result) };
  }
  const segment = url.searchParams.get('segmentLength');
  const options = parseInput(
    VibrationOptionsSchema,
    {
      units: url.searchParams.get('units') ?? undefined,
      segmentLength: segment === null ? undefined : Number(segment),
    },
    'query',
  );
  const { input, unitSource } = vibrationInputFromCsv(body.text, options);
  const result = (await workRun({
    kind: 'analysis',
    call: { tool: 'vibration', input, unitSource },
  })) as VibrationResult;
  return { result, savedResult: vibrationSavedResult(result) };
});
