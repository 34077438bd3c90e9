/**
 * The PSD profile calculator: a random-vibration test level given as breakpoints (levels in g²/Hz, or
 * slopes in dB/octave) joined by straight lines on log-log axes → its overall Grms.
 */
import { useState } from 'react';
import { PSD_PROFILE_MAX_BREAKPOINTS, type PsdProfileResult } from '../../lib/analysis/psd-profile';
import { numberFormat } from '../../lib/tools/number-format';
import { PSD_PROFILE_SAMPLE, PSD_PROFILE_SAMPLE_GRMS } from '../../lib/tools/psd-profile-sample';
import { psdProfileTableRequest } from '../../lib/tools/psd-profile-table';
import type { TableRow } from '../../lib/tools/table-cells';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import Plot from './Plot';
import ResultList from './ResultList';
import RunBar from './RunBar';
import SampleDataButton from './SampleDataButton';
import { useToolRun } from './useToolRun';

const COLUMNS = [
  { key: 'frequencyHz', label: 'Frequency', unit: 'Hz' },
  { key: 'psdG2PerHz', label: 'Level', unit: 'g²/Hz' },
  { key: 'slopeDbPerOctave', label: 'Slope from previous', unit: 'dB/oct' },
];
const blank = (): TableRow[] =>
  Array.from({ length: 3 }, () => ({ frequencyHz: '', psdG2PerHz: '', slopeDbPerOctave: '' }));

/** The PSD-profile island. */
export default function PsdProfileCalculator() {
  const [rows, setRows] = useState<TableRow[]>(blank);
  const { mutation, errors, unplaced, run } = useToolRun<PsdProfileResult>('psd-profile');
  const r = mutation.data?.result;
  const loadSample = () =>
    setRows(
      PSD_PROFILE_SAMPLE.map((p) => ({
        frequencyHz: String(p.frequencyHz),
        psdG2PerHz: 'psdG2PerHz' in p ? String(p.psdG2PerHz) : '',
        slopeDbPerOctave: 'slopeDbPerOctave' in p ? String(p.slopeDbPerOctave) : '',
      })),
    );
  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="psd-input">
        <h2 id="psd-input" className="text-xl font-bold">
          Grms of a test profile
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          A test specification gives a random-vibration level as breakpoints: a level in g²/Hz at some frequencies and
          slopes in dB per octave between them (+6 dB/oct doubles the frequency and quadruples the level). Leave a level
          blank where a slope gives it. At most {PSD_PROFILE_MAX_BREAKPOINTS} breakpoints.
        </p>
        <div className="mt-3">
          <SampleDataButton
            onLoad={loadSample}
            description={`the component qualification profile of the NASA GEVS standard (GSFC-STD-7000A, Table 2.4-3), which prints ${PSD_PROFILE_SAMPLE_GRMS} Grms.`}
          />
        </div>
        <div className="mt-4">
          <DataTableInput
            caption="PSD profile breakpoints"
            columns={COLUMNS}
            rows={rows}
            onChange={setRows}
            errors={errors}
            tableError={errors.table}
            maxRows={PSD_PROFILE_MAX_BREAKPOINTS}
          />
        </div>
        <RunBar
          label="Compute the Grms"
          onRun={() => run(psdProfileTableRequest(rows), (json) => ({ json }))}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type breakpoints or load the sample profile."
        />
      </section>
      {r && mutation.data && (
        <>
          <ResultList
            title="Profile result"
            items={[
              {
                label: 'Overall Grms',
                value: numberFormat(r.grms),
                unit: 'g',
                note: 'The square root of the area under the profile.',
                testId: 'psd-profile-grms',
              },
              ...r.segments.map((s) => ({
                label: `${numberFormat(s.lowHz)}–${numberFormat(s.highHz)} Hz`,
                value: `${numberFormat(s.slopeDbPerOctave, 2)} dB/oct`,
                note: `area ${numberFormat(s.areaG2)} g²`,
              })),
            ]}
          />
          <Plot plot={mutation.data.savedResult.plot} />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
