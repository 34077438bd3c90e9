/**
 * The shake test: an accelerometer record (uploaded CSV, typed or pasted table, or the sample) → RMS, peak
 * and crest factor per axis, the overall Grms, the PSD by Welch's method, its dominant frequencies and band
 * Grms. Typed rows are sent as CSV too, so every record takes the same checks on the server.
 */
import { useState } from 'react';
import { VIBRATION_MAX_SAMPLES, VIBRATION_MIN_SAMPLES, type VibrationResult } from '../../lib/analysis/vibration';
import { VIBRATION_CSV_MAX_BYTES } from '../../lib/analysis/vibration-csv';
import { WELCH_MAX_SEGMENT_LENGTH, WELCH_MIN_SEGMENT_LENGTH } from '../../lib/analysis/welch-psd';
import type { TableRow } from '../../lib/tools/table-cells';
import { vibrationSampleCsv, VIBRATION_SAMPLE_COUNT, VIBRATION_SAMPLE_RATE_HZ } from '../../lib/tools/vibration-sample';
import { VIBRATION_TABLE_KEYS, vibrationTableRequest } from '../../lib/tools/vibration-table';
import CsvUpload from './CsvUpload';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import Plot from './Plot';
import RunBar from './RunBar';
import SampleDataButton from './SampleDataButton';
import SelectField from './SelectField';
import VibrationResults from './VibrationResults';
import { useToolRun } from './useToolRun';

const COLUMNS = VIBRATION_TABLE_KEYS.map((key) =>
  key === 'timeS' ? { key, label: 'Time', unit: 's' } : { key, label: key, unit: 'g or m/s²' },
);
const SEGMENTS: string[] = [];
for (let n = WELCH_MIN_SEGMENT_LENGTH; n <= WELCH_MAX_SEGMENT_LENGTH; n *= 2) SEGMENTS.push(String(n));
const blankRows = (): TableRow[] => Array.from({ length: 4 }, () => ({ timeS: '', x: '', y: '', z: '' }));
type Source = { kind: 'table' } | { kind: 'file'; name: string; text: string };

/** The shake-test island. */
export default function VibrationTool() {
  const [rows, setRows] = useState<TableRow[]>(blankRows);
  const [source, setSource] = useState<Source>({ kind: 'table' });
  const [units, setUnits] = useState('auto');
  const [segmentLength, setSegmentLength] = useState('');
  const { mutation, errors, unplaced, run } = useToolRun<VibrationResult>('vibration');
  const r = mutation.data?.result;
  const query = { units, segmentLength: segmentLength || undefined };

  const runFile = (file: { name: string; text: string }) => {
    setSource({ kind: 'file', ...file });
    run({ input: file.text, errors: {}, inputOfPath: { segmentLength: 'segmentLength' } }, (csv) => ({ csv, query }));
  };
  const submit = () => {
    if (source.kind === 'file') return runFile(source);
    run(vibrationTableRequest(rows), (csv) => ({ csv, query }));
  };
  const fileError = source.kind === 'file' && mutation.error ? mutation.error.message : undefined;

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="vibration-input">
        <h2 id="vibration-input" className="text-xl font-bold">
          Your shake record
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          Columns: time, then acceleration along x, y and z, one reading a row, evenly spaced. At least{' '}
          {VIBRATION_MIN_SAMPLES} readings (about {VIBRATION_MIN_SAMPLES / 100} s at 100 Hz), at most{' '}
          {VIBRATION_MAX_SAMPLES.toLocaleString('en-US')}.
        </p>
        <div className="mt-3">
          <SampleDataButton
            onLoad={() => runFile({ name: 'sample data (20 Hz + 80 Hz shake)', text: vibrationSampleCsv() })}
            description={`an invented ${VIBRATION_SAMPLE_COUNT / VIBRATION_SAMPLE_RATE_HZ} s record at ${VIBRATION_SAMPLE_RATE_HZ} Hz of a model shaken at 20 Hz and 80 Hz, in g; loads and runs.`}
          />
        </div>
        <div className="mt-4 flex flex-wrap gap-6">
          <SelectField
            label="Unit of x, y, z"
            name="units"
            value={units}
            onChange={setUnits}
            hint="Auto reads the header or the size of gravity in the readings."
            options={[
              { value: 'auto', label: 'Detect' },
              { value: 'g', label: 'g' },
              { value: 'm/s2', label: 'm/s²' },
            ]}
            error={errors.units}
          />
          <SelectField
            label="PSD segment length"
            name="segmentLength"
            value={segmentLength}
            onChange={setSegmentLength}
            hint="Longer segments: finer frequency steps, noisier PSD."
            options={[{ value: '', label: 'Automatic' }, ...SEGMENTS.map((s) => ({ value: s, label: `${s} samples` }))]}
            error={errors.segmentLength}
          />
        </div>
        <div className="mt-4">
          <CsvUpload
            label="Upload an accelerometer CSV"
            hint="time, x, y, z with an optional header row (e.g. time_s, x_g, y_g, z_g)."
            maxBytes={VIBRATION_CSV_MAX_BYTES}
            onFile={runFile}
            error={fileError}
          />
          {source.kind === 'file' && (
            <p className="mt-2 text-sm" data-testid="vibration-source">
              Using <strong>{source.name}</strong>.{' '}
              <button type="button" className="text-fold-dark underline" onClick={() => setSource({ kind: 'table' })}>
                Use the typed table instead
              </button>
            </p>
          )}
        </div>
        <details className="mt-4" open={source.kind === 'table'}>
          <summary className="cursor-pointer font-semibold">Type or paste readings</summary>
          <DataTableInput
            caption="Accelerometer readings"
            columns={COLUMNS}
            rows={rows}
            onChange={(next) => {
              setRows(next);
              setSource({ kind: 'table' });
            }}
            errors={source.kind === 'table' ? errors : {}}
            tableError={source.kind === 'table' ? errors.table : undefined}
            maxRows={VIBRATION_MAX_SAMPLES}
          />
        </details>
        <RunBar
          label="Analyse the shaking"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: upload a CSV, paste readings or load the sample data."
        />
      </section>
      {r && mutation.data && <VibrationResults r={r} />}
      {r && mutation.data && <Plot plot={mutation.data.savedResult.plot} />}
      {r && mutation.data && <DownloadResultButton savedResult={mutation.data.savedResult} />}
    </div>
  );
}
