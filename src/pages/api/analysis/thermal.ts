/**
 * POST /api/analysis/thermal — the thermal-cycling tool. Body: JSON ThermalInput (src/lib/analysis/thermal.ts,
 * ≤ THERMAL_JSON_MAX_BYTES) or CSV text time,run1,run2,… (text/csv, ≤ THERMAL_CSV_MAX_BYTES). Answers
 * { result, savedResult }.
 */
import { endpoint } from '../../../lib/http/endpoint';
import { workRun } from '../../../lib/work/work-pool.server';
import { thermalSavedResult } from '../../../lib/analysis/saved-result-tools';
import { THERMAL_JSON_MAX_BYTES, ThermalInputSchema, type ThermalResult } from '../../../lib/analysis/thermal';
import { THERMAL_CSV_MAX_BYTES, thermalInputFromCsv } from '../../../lib/analysis/thermal-csv';
import { parseInput } from '../../../lib/validation';
import { analysisBodyRead } from './_request-body';

export const POST = endpoint({ access: ['anyone'] }, async ({ request }) => {
  const body = await analysisBodyRead(request, { jsonBytes: THERMAL_JSON_MAX_BYTES, csvBytes: THERMAL_CSV_MAX_BYTES });
  const input = body.kind === 'json' ? parseInput(ThermalInputSchema, body.body) : thermalInputFromCsv(body.text);
  const result = (await workRun({ kind: 'analysis', call: { tool: 'thermal', input } })) as ThermalResult;
  return { result, savedResult: thermalSavedResult(input, result) };
});
