/**
 * Thermal cycling: temperature logs (a typed table — time and one column per run — or a CSV) → per run the
 * heating or cooling rate, and Newton's-law time constant and final temperature with their uncertainties,
 * every run on one plot with its fitted curve.
 */
import { useCallback, useState } from 'react';
import { THERMAL_MAX_POINTS_PER_RUN, THERMAL_MAX_RUNS, type ThermalResult } from '../../lib/analysis/thermal';
import { THERMAL_CSV_MAX_BYTES } from '../../lib/analysis/thermal-csv';
import type { TableRow } from '../../lib/tools/table-cells';
import { thermalSample } from '../../lib/tools/thermal-sample';
import { thermalRunKey, thermalTableRequest } from '../../lib/tools/thermal-table';
import CsvUpload from './CsvUpload';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import Plot from './Plot';
import RunBar from './RunBar';
import RunLabelFields from './RunLabelFields';
import SampleDataButton from './SampleDataButton';
import ThermalResults from './ThermalResults';
import { useToolRun } from './useToolRun';

const blankRows = (runs: number): TableRow[] =>
  Array.from({ length: 5 }, () =>
    Object.fromEntries(['timeS', ...Array.from({ length: runs }, (_, i) => thermalRunKey(i))].map((k) => [k, ''])),
  );

/** The thermal-cycling island. */
export default function ThermalTool() {
  const [labels, setLabels] = useState<string[]>(['run 1']);
  const [rows, setRows] = useState<TableRow[]>(() => blankRows(1));
  const [fileName, setFileName] = useState<string | null>(null);
  const { mutation, errors, unplaced, run } = useToolRun<ThermalResult>('thermal');
  const r = mutation.data?.result;
  const dots = useCallback((label: string) => !label.endsWith('(fit)'), []);
  const columns = [
    { key: 'timeS', label: 'Time', unit: 's' },
    ...labels.map((l, i) => ({ key: thermalRunKey(i), label: l || `run ${i + 1}`, unit: '°C' })),
  ];

  const loadSample = () => {
    const s = thermalSample();
    setLabels(s.runs.map((x) => x.label));
    setRows(
      s.timeS.map((t, i) => ({
        timeS: String(t),
        ...Object.fromEntries(s.runs.map((x, j) => [thermalRunKey(j), String(x.temperatureC[i])])),
      })),
    );
    setFileName(null);
  };
  const runFile = (file: { name: string; text: string }) => {
    setFileName(file.name);
    run({ input: file.text, errors: {}, inputOfPath: {} }, (csv) => ({ csv }));
  };

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="thermal-input">
        <h2 id="thermal-input" className="text-xl font-bold">
          Your temperature logs
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          One time column (seconds) and one temperature column (°C) per run — for example one run with the blanket and
          one without. Up to {THERMAL_MAX_RUNS} runs of {THERMAL_MAX_POINTS_PER_RUN.toLocaleString('en-US')} readings;
          the time-constant fit needs at least 5 readings.
        </p>
        <div className="mt-3">
          <SampleDataButton
            onLoad={loadSample}
            description="two invented cooling curves from 48 °C, bare and blanketed, read every 30 s for 20 minutes."
          />
        </div>
        <RunLabelFields
          labels={labels}
          errors={errors}
          maxRuns={THERMAL_MAX_RUNS}
          onChange={(next) => {
            setLabels(next);
            setFileName(null);
          }}
        />
        <div className="mt-4">
          <DataTableInput
            caption="Temperature readings per run"
            columns={columns}
            rows={rows}
            onChange={(next) => {
              setRows(next);
              setFileName(null);
            }}
            errors={fileName ? {} : errors}
            tableError={fileName ? undefined : errors.table}
            maxRows={THERMAL_MAX_POINTS_PER_RUN}
          />
        </div>
        <div className="mt-4">
          <CsvUpload
            label="Or upload a temperature-log CSV"
            hint="time, then one column per run, with a header naming the runs (time_s, no blanket, with blanket)."
            maxBytes={THERMAL_CSV_MAX_BYTES}
            onFile={runFile}
            error={fileName && mutation.error ? mutation.error.message : undefined}
          />
          {fileName && <p className="mt-2 text-sm">Using {fileName}.</p>}
        </div>
        <RunBar
          label="Fit the runs"
          onRun={() => {
            setFileName(null);
            run(thermalTableRequest(rows, labels), (json) => ({ json }));
          }}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type readings, upload a CSV or load the sample data."
        />
      </section>
      {r && mutation.data && <ThermalResults r={r} />}
      {r && mutation.data && <Plot plot={mutation.data.savedResult.plot} pointsOnly={dots} />}
      {r && mutation.data && <DownloadResultButton savedResult={mutation.data.savedResult} />}
    </div>
  );
}
