/**
 * The interference hunt: per device, magnetometer readings against distance (fitted like the magnetic tool)
 * or an AM radio's listening distances → each device's keep-out distance, ranked in a table.
 */
import { useState } from 'react';
import {
  INTERFERENCE_MAX_DEVICES,
  INTERFERENCE_MAX_READINGS_PER_DEVICE,
  type InterferenceReceiver,
  type InterferenceResult,
} from '../../lib/analysis/interference';
import { MAGNETIC_DEFAULT_THRESHOLD_UT } from '../../lib/analysis/magnetic';
import {
  INTERFERENCE_SAMPLE_BACKGROUND_UT,
  INTERFERENCE_SAMPLE_THRESHOLD_UT,
  interferenceSampleListening,
  interferenceSampleReadings,
} from '../../lib/tools/interference-sample';
import { interferenceTableRequest } from '../../lib/tools/interference-table';
import { numberFormat } from '../../lib/tools/number-format';
import type { TableRow } from '../../lib/tools/table-cells';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import NumberField from './NumberField';
import Plot from './Plot';
import RunBar from './RunBar';
import SampleDataButton from './SampleDataButton';
import SelectField from './SelectField';
import WarningList from './WarningList';
import { useToolRun } from './useToolRun';

const DEVICE = { key: 'device', label: 'Device', kind: 'text' as const };
const COLUMNS = {
  magnetometer: [
    DEVICE,
    { key: 'distanceCm', label: 'Distance', unit: 'cm' },
    { key: 'fieldUT', label: 'Field', unit: 'µT' },
  ],
  'am-radio': [DEVICE, { key: 'noiseGoneCm', label: 'Radio quiet from', unit: 'cm' }],
};
const blank = (): TableRow[] =>
  Array.from({ length: 5 }, () => ({ device: '', distanceCm: '', fieldUT: '', noiseGoneCm: '' }));

/** The interference island. */
export default function InterferenceTool() {
  const [receiver, setReceiver] = useState<InterferenceReceiver>('magnetometer');
  const [rows, setRows] = useState<TableRow[]>(blank);
  const [backgroundUT, setBackground] = useState('0');
  const [thresholdUT, setThreshold] = useState(String(MAGNETIC_DEFAULT_THRESHOLD_UT));
  const { mutation, errors, unplaced, run } = useToolRun<InterferenceResult>('interference');
  const r = mutation.data?.result;

  const loadSample = () => {
    if (receiver === 'magnetometer') {
      setRows(
        interferenceSampleReadings().map((x) => ({
          device: x.device,
          distanceCm: String(x.distanceCm),
          fieldUT: String(x.fieldUT),
        })),
      );
      setBackground(String(INTERFERENCE_SAMPLE_BACKGROUND_UT));
      setThreshold(String(INTERFERENCE_SAMPLE_THRESHOLD_UT));
    } else {
      setRows(interferenceSampleListening().map((x) => ({ device: x.device, noiseGoneCm: String(x.noiseGoneCm) })));
    }
  };
  const submit = () =>
    run(interferenceTableRequest(rows, { receiver, backgroundUT, thresholdUT }), (json) => ({ json }));

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="interference-input">
        <h2 id="interference-input" className="text-xl font-bold">
          Your devices
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          Rows with the same device name belong together. With a magnetometer, give each device at least 3 readings at
          different distances (at most {INTERFERENCE_MAX_READINGS_PER_DEVICE}); with an AM radio, the distance where its
          buzz could no longer be heard, one row per try. Up to {INTERFERENCE_MAX_DEVICES} devices.
        </p>
        <div className="mt-4 flex flex-wrap gap-6">
          <SelectField
            name="receiver"
            label="Receiver"
            value={receiver}
            onChange={(v) => setReceiver(v as InterferenceReceiver)}
            options={[
              { value: 'magnetometer', label: 'Magnetometer (phone app, µT)' },
              { value: 'am-radio', label: 'AM radio between stations' },
            ]}
          />
          {receiver === 'magnetometer' && (
            <>
              <NumberField
                name="backgroundUT"
                label="Background field"
                unit="µT"
                hint="Read with every device off; taken off every reading."
                value={backgroundUT}
                onChange={setBackground}
                error={errors.backgroundUT}
              />
              <NumberField
                name="thresholdUT"
                label="The receiver tolerates"
                unit="µT"
                hint="Default: 1 % of Earth's field."
                value={thresholdUT}
                onChange={setThreshold}
                error={errors.thresholdUT}
              />
            </>
          )}
        </div>
        <div className="mt-3">
          <SampleDataButton
            onLoad={loadSample}
            description={
              receiver === 'magnetometer'
                ? 'three invented devices read at 5–60 cm by a phone, over Earth’s field (48 µT).'
                : 'three invented devices, three listening tries each.'
            }
          />
        </div>
        <div className="mt-4">
          <DataTableInput
            caption={receiver === 'magnetometer' ? 'Field readings per device' : 'Listening distances per device'}
            columns={COLUMNS[receiver]}
            rows={rows}
            onChange={setRows}
            errors={errors}
            tableError={errors.table}
            maxRows={INTERFERENCE_MAX_DEVICES * INTERFERENCE_MAX_READINGS_PER_DEVICE}
          />
        </div>
        <RunBar
          label="Rank the devices"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type your readings or load the sample data."
        />
      </section>
      {r && mutation.data && (
        <>
          <section className="card break-inside-avoid" aria-labelledby="interference-ranking">
            <h3 id="interference-ranking" className="text-lg font-bold">
              Ranking: most room needed first
            </h3>
            <p className="mt-1" data-testid="interference-summary">
              {r.summary}
            </p>
            <table className="mt-3 w-full text-left text-sm" data-testid="interference-ranking">
              <thead>
                <tr className="border-b border-ink/20">
                  <th scope="col" className="py-1 pr-3">
                    Rank
                  </th>
                  <th scope="col" className="py-1 pr-3">
                    Device
                  </th>
                  <th scope="col" className="py-1 pr-3">
                    Keep-out distance (cm)
                  </th>
                  {r.receiver === 'magnetometer' && (
                    <th scope="col" className="py-1 pr-3">
                      Falloff exponent n
                    </th>
                  )}
                </tr>
              </thead>
              <tbody>
                {r.ranking.map((d) => (
                  <tr key={d.label} className="border-b border-ink/10">
                    <td className="py-1 pr-3">{d.rank}</td>
                    <th scope="row" className="py-1 pr-3 font-semibold">
                      {d.label}
                    </th>
                    <td className="py-1 pr-3">
                      {d.keepOutCm === null
                        ? '— (no falloff)'
                        : d.keepOutCm === 0
                          ? '0 (no disturbance)'
                          : Math.ceil(d.keepOutCm)}
                    </td>
                    {r.receiver === 'magnetometer' && (
                      <td className="py-1 pr-3">
                        {d.fit
                          ? `${d.fit.exponent.toFixed(2)}${d.fit.exponentStdError === null ? '' : ` ± ${numberFormat(d.fit.exponentStdError, 2)}`}`
                          : '—'}
                      </td>
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
            <p className="mt-2 text-sm text-ink-soft">
              {r.receiver === 'magnetometer'
                ? `Keep-out distance: where the fitted field falls below ${numberFormat(r.thresholdUT)} µT (upper end of its likely range), never closer than a reading that was still above it.`
                : 'Keep-out distance: the farthest distance at which the buzz was still heard.'}
            </p>
          </section>
          <WarningList warnings={r.ranking.flatMap((d) => d.warnings)} />
          <Plot plot={mutation.data.savedResult.plot} />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
