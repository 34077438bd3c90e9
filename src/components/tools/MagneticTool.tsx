/**
 * Keep it non-magnetic: field readings against distance → the power-law exponent (−3 for a small magnet, a
 * dipole) with its uncertainty, and the distance where the field drops below a threshold.
 */
import { useCallback, useState } from 'react';
import {
  MAGNETIC_DEFAULT_THRESHOLD_UT,
  MAGNETIC_MAX_READINGS,
  MAGNETIC_MIN_READINGS,
  type MagneticResult,
} from '../../lib/analysis/magnetic';
import { magneticSample, MAGNETIC_SAMPLE_BACKGROUND_UT } from '../../lib/tools/magnetic-sample';
import { magneticTableRequest } from '../../lib/tools/magnetic-table';
import { numberFormat } from '../../lib/tools/number-format';
import type { TableRow } from '../../lib/tools/table-cells';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import NumberField from './NumberField';
import Plot from './Plot';
import RunBar from './RunBar';
import ResultList from './ResultList';
import SampleDataButton from './SampleDataButton';
import WarningList from './WarningList';
import { useToolRun } from './useToolRun';

const COLUMNS = [
  { key: 'distanceCm', label: 'Distance', unit: 'cm' },
  { key: 'fieldUT', label: 'Field', unit: 'µT' },
];
const blank = (): TableRow[] => Array.from({ length: 5 }, () => ({ distanceCm: '', fieldUT: '' }));

/** The magnetic tool island. */
export default function MagneticTool() {
  const [rows, setRows] = useState<TableRow[]>(blank);
  const [backgroundUT, setBackground] = useState('0');
  const [thresholdUT, setThreshold] = useState(String(MAGNETIC_DEFAULT_THRESHOLD_UT));
  const { mutation, errors, unplaced, run } = useToolRun<MagneticResult>('magnetic');
  const r = mutation.data?.result;
  const dots = useCallback((label: string) => label === 'readings', []);

  const loadSample = () => {
    setRows(magneticSample().map((x) => ({ distanceCm: String(x.distanceCm), fieldUT: String(x.fieldUT) })));
    setBackground(String(MAGNETIC_SAMPLE_BACKGROUND_UT));
  };
  const submit = () => run(magneticTableRequest(rows, { backgroundUT, thresholdUT }), (json) => ({ json }));

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="magnetic-input">
        <h2 id="magnetic-input" className="text-xl font-bold">
          Your readings
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          Type at least {MAGNETIC_MIN_READINGS} readings (at most {MAGNETIC_MAX_READINGS}): the distance from the
          magnet's centre and the field your phone or sensor shows there.
        </p>
        <div className="mt-3">
          <SampleDataButton
            onLoad={loadSample}
            description="an invented small magnet read at 4–20 cm by a phone, with Earth's field (48 µT) as background."
          />
        </div>
        <div className="mt-4 flex flex-wrap gap-6">
          <NumberField
            name="backgroundUT"
            label="Background field"
            unit="µT"
            hint="Read with the magnet far away; it is taken off every reading."
            value={backgroundUT}
            onChange={setBackground}
            error={errors.backgroundUT}
          />
          <NumberField
            name="thresholdUT"
            label="Stay below"
            unit="µT"
            hint="Default: 1 % of Earth's field."
            value={thresholdUT}
            onChange={setThreshold}
            error={errors.thresholdUT}
          />
        </div>
        <div className="mt-4">
          <DataTableInput
            caption="Field readings against distance"
            columns={COLUMNS}
            rows={rows}
            onChange={setRows}
            errors={errors}
            tableError={errors.table}
            maxRows={MAGNETIC_MAX_READINGS}
          />
        </div>
        <RunBar
          label="Fit the power law"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type readings or load the sample data, then fit."
        />
      </section>
      {r && mutation.data && (
        <>
          <ResultList
            title="Result"
            items={[
              {
                label: 'Exponent n in B = k·rⁿ',
                value: `${r.exponent.toFixed(2)}${r.exponentStdError === null ? '' : ` ± ${numberFormat(r.exponentStdError, 2)}`}`,
                note: 'A small magnet far away is a dipole: its field falls as 1/r³, so n is close to −3.',
                testId: 'magnetic-exponent',
              },
              { label: 'Field at 1 cm (k)', value: numberFormat(r.fieldAt1CmUT), unit: 'µT' },
              { label: 'Fit quality R²', value: r.rSquared.toFixed(4) },
              {
                label: `Field below ${thresholdUT || MAGNETIC_DEFAULT_THRESHOLD_UT} µT from`,
                value: numberFormat(r.thresholdDistanceCm),
                unit: 'cm',
                note: r.thresholdDistanceRangeCm
                  ? `likely between ${numberFormat(r.thresholdDistanceRangeCm[0])} and ${numberFormat(r.thresholdDistanceRangeCm[1])} cm (1σ)`
                  : undefined,
              },
              { label: 'Readings used', value: String(r.usedReadings) },
            ]}
          />
          <WarningList warnings={r.warnings} />
          <Plot plot={mutation.data.savedResult.plot} pointsOnly={dots} />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
