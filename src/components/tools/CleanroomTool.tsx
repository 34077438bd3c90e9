/**
 * The clean-room build: particle counts per sampling location → concentration per m³ at each size, the
 * ISO 14644-1 class the room or box meets, and whether enough locations were sampled for its floor area.
 */
import { useCallback, useMemo, useState } from 'react';
import {
  CLEANROOM_MAX_LOCATIONS,
  CLEANROOM_MAX_SAMPLES_PER_LOCATION,
  type CleanroomResult,
} from '../../lib/analysis/cleanroom';
import { ISO_14644_SIZES_UM } from '../../lib/analysis/iso-14644';
import { cleanroomPlot } from '../../lib/tools/cleanroom-plot';
import { CLEANROOM_SAMPLE_AREA_M2, CLEANROOM_SAMPLE_SIZES_UM, cleanroomSample } from '../../lib/tools/cleanroom-sample';
import { cleanroomCountKey, cleanroomTableRequest, type CleanroomFields } from '../../lib/tools/cleanroom-table';
import type { TableRow } from '../../lib/tools/table-cells';
import CleanroomResults from './CleanroomResults';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import NumberField from './NumberField';
import Plot from './Plot';
import RunBar from './RunBar';
import SampleDataButton from './SampleDataButton';
import SelectField from './SelectField';
import SizeChoice from './SizeChoice';
import { useToolRun } from './useToolRun';

const blank = (): TableRow[] => Array.from({ length: 3 }, () => ({ location: '', volume: '' }));

/** The clean-room island. */
export default function CleanroomTool() {
  const [rows, setRows] = useState<TableRow[]>(blank);
  const [floorAreaM2, setArea] = useState('');
  const [sizesUm, setSizes] = useState<number[]>([0.5, 1, 5]);
  const [countsAre, setCountsAre] = useState<CleanroomFields['countsAre']>('cumulative');
  const [volumeUnit, setVolumeUnit] = useState<CleanroomFields['volumeUnit']>('L');
  const { mutation, errors, unplaced, run } = useToolRun<CleanroomResult>('cleanroom');
  const r = mutation.data?.result;
  const plot = useMemo(() => (r ? cleanroomPlot(r) : null), [r]);
  const dots = useCallback((label: string) => label === 'worst location', []);
  const columns = [
    { key: 'location', label: 'Location', kind: 'text' as const },
    { key: 'volume', label: 'Sampled volume', unit: volumeUnit === 'L' ? 'L' : 'm³' },
    ...sizesUm.map((s) => ({ key: cleanroomCountKey(s), label: `Count ≥ ${s} µm` })),
  ];
  const loadSample = () => {
    setArea(String(CLEANROOM_SAMPLE_AREA_M2));
    setSizes([...CLEANROOM_SAMPLE_SIZES_UM]);
    setCountsAre('cumulative');
    setVolumeUnit('L');
    setRows(
      cleanroomSample().map((s) => ({
        location: s.location,
        volume: String(s.volumeL),
        ...Object.fromEntries(
          CLEANROOM_SAMPLE_SIZES_UM.map((size, i) => [cleanroomCountKey(size), String(s.counts[i])]),
        ),
      })),
    );
  };
  const submit = () =>
    run(cleanroomTableRequest(rows, { floorAreaM2, sizesUm, countsAre, volumeUnit }), (json) => ({ json }));

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="cleanroom-input">
        <h2 id="cleanroom-input" className="text-xl font-bold">
          Your particle counts
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          One row per sample: where it was taken, how much air the counter drew, and its counts. Rows with the same
          location are averaged. Up to {CLEANROOM_MAX_LOCATIONS} locations of {CLEANROOM_MAX_SAMPLES_PER_LOCATION}{' '}
          samples.
        </p>
        <div className="mt-3">
          <SampleDataButton
            onLoad={loadSample}
            description="invented counts from a classroom clean box (0.5 m²) at three spots, two one-cubic-foot samples each."
          />
        </div>
        <div className="mt-4 flex flex-wrap gap-6">
          <NumberField
            name="floorAreaM2"
            label="Floor area"
            unit="m²"
            value={floorAreaM2}
            onChange={setArea}
            hint="Sets how many locations ISO 14644-1 asks for."
            error={errors.floorAreaM2}
          />
          <SelectField
            name="countsAre"
            label="The counter reports"
            value={countsAre}
            onChange={(v) => setCountsAre(v as CleanroomFields['countsAre'])}
            options={[
              { value: 'cumulative', label: 'Cumulative (≥ each size)' },
              { value: 'differential', label: 'Differential (between sizes)' },
            ]}
          />
          <SelectField
            name="volumeUnit"
            label="Volume unit"
            value={volumeUnit}
            onChange={(v) => setVolumeUnit(v as CleanroomFields['volumeUnit'])}
            options={[
              { value: 'L', label: 'litres' },
              { value: 'm3', label: 'cubic metres' },
            ]}
          />
        </div>
        <SizeChoice sizes={ISO_14644_SIZES_UM} chosen={sizesUm} onChange={setSizes} error={errors.sizesUm} />
        <div className="mt-4">
          <DataTableInput
            caption="Particle counts per sample"
            columns={columns}
            rows={rows}
            onChange={setRows}
            errors={errors}
            tableError={errors.table}
            maxRows={CLEANROOM_MAX_LOCATIONS * CLEANROOM_MAX_SAMPLES_PER_LOCATION}
          />
        </div>
        <RunBar
          label="Classify the air"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type counts or load the sample data."
        />
      </section>
      {r && <CleanroomResults r={r} />}
      {plot && <Plot plot={plot} pointsOnly={dots} />}
      {mutation.data && <DownloadResultButton savedResult={mutation.data.savedResult} />}
    </div>
  );
}
