/**
 * The deploy-test tool's table — one row per trial: design, outcome, time to deploy, final length — turned
 * into a DeploymentInput request, rows with the same design name grouped as that design's trials in order.
 */
import { DEPLOYMENT_MAX_DESIGNS, type DeploymentInput, type DeploymentOutcome } from '../analysis/deployment';
import { tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

/** Number columns of the table (time and length may be left blank). */
export const DEPLOYMENT_TABLE_NUMBER_KEYS = ['timeS', 'finalLengthCm'] as const;

const OUTCOME_WORDS: Record<string, DeploymentOutcome> = {
  full: 'full',
  fully: 'full',
  f: 'full',
  yes: 'full',
  y: 'full',
  partial: 'partial',
  partly: 'partial',
  part: 'partial',
  p: 'partial',
  none: 'none',
  not: 'none',
  no: 'none',
  n: 'none',
};

/** A typed outcome ("full", "partly", "no" …, any case) as the API's word, or null when it is none of them. */
export function deploymentOutcomeRead(text: string): DeploymentOutcome | null {
  return OUTCOME_WORDS[text.trim().toLowerCase()] ?? null;
}

/** Builds the request from trial rows; blank rows are skipped, at most DEPLOYMENT_MAX_DESIGNS design names. */
export function deploymentTableRequest(rows: readonly TableRow[]): TableRequest<DeploymentInput> {
  const errors: Record<string, string> = {};
  const inputOfPath: Record<string, string> = { designs: 'table' };
  const designs: { label: string; trials: DeploymentInput['designs'][number]['trials'] & object }[] = [];
  const filled = rows
    .map((row, r) => ({ row, r }))
    .filter(({ row }) =>
      ['design', 'outcome', ...DEPLOYMENT_TABLE_NUMBER_KEYS].some((k) => (row[k] ?? '').trim() !== ''),
    );
  if (filled.length === 0) errors.table = 'The table is empty: type one row per trial, or load the sample data.';
  const numbers = tableNumbers(
    filled.map(({ row }) => row),
    DEPLOYMENT_TABLE_NUMBER_KEYS,
    DEPLOYMENT_TABLE_NUMBER_KEYS,
  );
  filled.forEach(({ row, r }, i) => {
    for (const k of DEPLOYMENT_TABLE_NUMBER_KEYS) {
      const problem = numbers.errors[tableCellKey(i, k)];
      if (problem) errors[tableCellKey(r, k)] = problem;
    }
    const label = (row.design ?? '').trim();
    if (label === '') errors[tableCellKey(r, 'design')] = 'name the design';
    const outcome = deploymentOutcomeRead(row.outcome ?? '');
    if (!outcome) errors[tableCellKey(r, 'outcome')] = 'write full, partial or none';
    let d = designs.findIndex((x) => x.label === label);
    if (d < 0) {
      d = designs.push({ label, trials: [] }) - 1;
      inputOfPath[`designs.${d}.label`] = tableCellKey(r, 'design');
      inputOfPath[`designs.${d}.trials`] = tableCellKey(r, 'design');
    }
    const t = designs[d]!.trials.length;
    inputOfPath[`designs.${d}.trials.${t}.outcome`] = tableCellKey(r, 'outcome');
    inputOfPath[`designs.${d}.trials.${t}.timeS`] = tableCellKey(r, 'timeS');
    inputOfPath[`designs.${d}.trials.${t}.finalLengthCm`] = tableCellKey(r, 'finalLengthCm');
    // tableNumbers skips rows whose number cells are all blank, so its values are found by row index.
    const at = numbers.rowIndexes.indexOf(i);
    const [timeS, finalLengthCm] = at < 0 ? [] : numbers.values[at]!;
    designs[d]!.trials.push({
      outcome: outcome ?? 'none',
      ...(timeS == null ? {} : { timeS }),
      ...(finalLengthCm == null ? {} : { finalLengthCm }),
    });
  });
  if (designs.length > DEPLOYMENT_MAX_DESIGNS) {
    errors.table = `The table names ${designs.length} designs (${designs.map((d) => d.label).join(', ')}); compare at most ${DEPLOYMENT_MAX_DESIGNS} at once.`;
  }
  if (Object.keys(errors).length > 0) return { input: null, errors, inputOfPath };
  return { input: { designs }, errors, inputOfPath };
}
