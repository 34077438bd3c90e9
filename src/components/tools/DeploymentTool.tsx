/**
 * Deployment trials: one row per trial (design, outcome, time, final length) → each design's rate of full
 * deployments with its 95 % Wilson and exact intervals, the trials a ±10-point interval needs, the running
 * rate over the trials, and two designs compared by Newcombe's interval.
 */
import { useState } from 'react';
import {
  DEPLOYMENT_MAX_DESIGNS,
  DEPLOYMENT_MAX_TRIALS,
  DEPLOYMENT_MIN_TRIALS,
  DEPLOYMENT_TARGET_HALF_WIDTH,
  type DeploymentResult,
} from '../../lib/analysis/deployment';
import { deploymentSample } from '../../lib/tools/deployment-sample';
import { deploymentTableRequest } from '../../lib/tools/deployment-table';
import { numberFormat } from '../../lib/tools/number-format';
import type { TableRow } from '../../lib/tools/table-cells';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import Plot from './Plot';
import ResultList from './ResultList';
import RunBar from './RunBar';
import SampleDataButton from './SampleDataButton';
import WarningList from './WarningList';
import { useToolRun } from './useToolRun';

const COLUMNS = [
  { key: 'design', label: 'Design', kind: 'text' as const },
  { key: 'outcome', label: 'Outcome', kind: 'text' as const },
  { key: 'timeS', label: 'Time to deploy', unit: 's' },
  { key: 'finalLengthCm', label: 'Final length', unit: 'cm' },
];
const blank = (): TableRow[] =>
  Array.from({ length: 5 }, () => ({ design: '', outcome: '', timeS: '', finalLengthCm: '' }));
const pct = (f: number) => `${numberFormat(100 * f, 3)} %`;
const range = (r: { lower: number; upper: number }) => `${pct(r.lower)} to ${pct(r.upper)}`;

/** The deployment tool island. */
export default function DeploymentTool() {
  const [rows, setRows] = useState<TableRow[]>(blank);
  const { mutation, errors, unplaced, run } = useToolRun<DeploymentResult>('deployment');
  const r = mutation.data?.result;

  const loadSample = () =>
    setRows(
      deploymentSample().map((t) => ({
        design: t.design,
        outcome: t.outcome,
        timeS: String(t.timeS),
        finalLengthCm: String(t.finalLengthCm),
      })),
    );
  const submit = () => run(deploymentTableRequest(rows), (json) => ({ json }));

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="deployment-input">
        <h2 id="deployment-input" className="text-xl font-bold">
          Your trials
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          One row per trial, in the order you ran them. Outcome: <strong>full</strong>, <strong>partial</strong> or{' '}
          <strong>none</strong>. Give each design a name; rows with the same name are one design (at most{' '}
          {DEPLOYMENT_MAX_DESIGNS} designs, {DEPLOYMENT_MIN_TRIALS} to {DEPLOYMENT_MAX_TRIALS} trials each). Time and
          length may be left blank.
        </p>
        <div className="mt-3">
          <SampleDataButton
            onLoad={loadSample}
            description="two invented booms, 20 trials each: a spring-driven one and an elastic-driven one."
          />
        </div>
        <div className="mt-4">
          <DataTableInput
            caption="Deployment trials"
            columns={COLUMNS}
            rows={rows}
            onChange={setRows}
            errors={errors}
            tableError={errors.table}
            maxRows={DEPLOYMENT_MAX_TRIALS * DEPLOYMENT_MAX_DESIGNS}
          />
        </div>
        <RunBar
          label="Work out the success rate"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type your trials or load the sample data."
        />
      </section>
      {r && mutation.data && (
        <>
          {r.designs.map((d, i) => (
            <ResultList
              key={d.label}
              title={d.label}
              items={[
                { label: 'In plain words', value: d.summary, testId: `deployment-summary-${i}` },
                {
                  label: 'Deployed fully',
                  value: `${d.fullyDeployed} of ${d.trials} (${pct(d.successRate)})`,
                  note:
                    d.partlyDeployed === null ? undefined : `${d.partlyDeployed} partly, ${d.notDeployed} not at all`,
                },
                {
                  label: '95 % range (Wilson score)',
                  value: range(d.wilson),
                  note: 'The range of true rates that fit your trials.',
                  testId: `deployment-wilson-${i}`,
                },
                {
                  label: '95 % range (exact, Clopper–Pearson)',
                  value: range(d.clopperPearson),
                  note: 'A more cautious method: never narrower than it should be, often a little wider.',
                },
                {
                  label: `Trials for ±${100 * DEPLOYMENT_TARGET_HALF_WIDTH} points`,
                  value:
                    d.moreTrialsForTarget === 0
                      ? `${d.trialsForTarget}: you have enough`
                      : `${d.trialsForTarget} in all: ${d.moreTrialsForTarget} more`,
                  note: `Textbook formula n = z²·p(1 − p)/E² at p = ${pct(d.planningRate)}.`,
                  testId: `deployment-more-${i}`,
                },
                ...(d.deployTimeS
                  ? [
                      {
                        label: 'Time to deploy (full deployments)',
                        value: `median ${numberFormat(d.deployTimeS.median)}`,
                        unit: `s (${numberFormat(d.deployTimeS.min)}–${numberFormat(d.deployTimeS.max)} s)`,
                      },
                    ]
                  : []),
                ...(d.finalLengthCm
                  ? [
                      {
                        label: 'Final length',
                        value: `median ${numberFormat(d.finalLengthCm.median)}`,
                        unit: `cm (${numberFormat(d.finalLengthCm.min)}–${numberFormat(d.finalLengthCm.max)} cm)`,
                      },
                    ]
                  : []),
              ]}
            />
          ))}
          {r.comparison && (
            <ResultList
              title="The two designs compared"
              items={[
                { label: 'In plain words', value: r.comparison.summary, testId: 'deployment-comparison' },
                {
                  label: 'Difference in success rate',
                  value: `${numberFormat(100 * r.comparison.difference, 3)} points`,
                  note: `95 % range (Newcombe's method): ${numberFormat(100 * r.comparison.lower, 3)} to ${numberFormat(100 * r.comparison.upper, 3)} points.`,
                },
              ]}
            />
          )}
          <WarningList warnings={r.warnings} />
          <Plot plot={mutation.data.savedResult.plot} />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
