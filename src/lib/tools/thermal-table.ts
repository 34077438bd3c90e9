/**
 * The thermal tool's table — a time column and one temperature column per run, as in the CSV form — turned
 * into a ThermalInput request; a blank temperature leaves that reading out of its run only.
 */
import type { ThermalInput } from '../analysis/thermal';
import { tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

/** Column key of run `i` in the thermal table. */
export function thermalRunKey(i: number): string {
  return `run${i}`;
}

/** Builds the request from rows with "timeS" and run columns, and the run labels (blank → "run n"). */
export function thermalTableRequest(rows: readonly TableRow[], labels: readonly string[]): TableRequest<ThermalInput> {
  const runKeys = labels.map((_, i) => thermalRunKey(i));
  const read = tableNumbers(rows, ['timeS', ...runKeys], runKeys);
  const errors = { ...read.errors };
  const inputOfPath: Record<string, string> = { runs: 'table' };
  const runs = labels.map((label, j) => {
    const run = { label: label.trim() || `run ${j + 1}`, timeS: [] as number[], temperatureC: [] as number[] };
    inputOfPath[`runs.${j}.label`] = `label.${j}`;
    inputOfPath[`runs.${j}`] = `label.${j}`;
    read.values.forEach((v, i) => {
      const t = v[0];
      const temp = v[j + 1];
      if (t === null || t === undefined || temp === null || temp === undefined) return;
      const r = read.rowIndexes[i]!;
      inputOfPath[`runs.${j}.timeS.${run.timeS.length}`] = tableCellKey(r, 'timeS');
      inputOfPath[`runs.${j}.temperatureC.${run.temperatureC.length}`] = tableCellKey(r, runKeys[j]!);
      run.timeS.push(t);
      run.temperatureC.push(temp);
    });
    return run;
  });
  if (Object.keys(errors).length > 0) return { input: null, errors, inputOfPath };
  return { input: { runs }, errors, inputOfPath };
}
