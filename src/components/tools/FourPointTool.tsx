/**
 * Four-point measurement: sensor positions and readings → the field's gradient (reciprocal vectors for four
 * points, least squares for more) and the formation's elongation and planarity; a flat formation is refused
 * with the lesson of three points. Each run sends the formation to the 3D view (formation-event.ts).
 */
import { useEffect, useRef, useState } from 'react';
import { FOUR_POINT_MAX_POINTS, FOUR_POINT_MIN_POINTS, type FourPointResult } from '../../lib/analysis/four-point';
import { formationSend } from '../../lib/preview/formation-event';
import { fourPointSample, type FourPointSampleFormation } from '../../lib/tools/four-point-sample';
import { fourPointTableRequest } from '../../lib/tools/four-point-table';
import { numberFormat } from '../../lib/tools/number-format';
import { tableCellNumber, type TableRow } from '../../lib/tools/table-cells';
import DataTableInput from './DataTableInput';
import DownloadResultButton from './DownloadResultButton';
import FieldShell from './FieldShell';
import Plot from './Plot';
import ResultList from './ResultList';
import RunBar from './RunBar';
import WarningList from './WarningList';
import { useToolRun } from './useToolRun';

const COLUMNS = [
  { key: 'label', label: 'Sensor', kind: 'text' as const },
  { key: 'x', label: 'x', unit: 'cm' },
  { key: 'y', label: 'y', unit: 'cm' },
  { key: 'z', label: 'z', unit: 'cm' },
  { key: 'value', label: 'Reading' },
];
const blank = (): TableRow[] => ['A', 'B', 'C', 'D'].map((label) => ({ label, x: '', y: '', z: '', value: '' }));
const dots = (label: string) => label === 'readings';
const vector = (v: readonly number[]) => `(${v.map((x) => numberFormat(x, 3)).join(', ')})`;

/** The rows that hold three readable coordinates, as points for the 3D view. */
function typedPoints(rows: readonly TableRow[]) {
  return rows.flatMap((row, i) => {
    const p = (['x', 'y', 'z'] as const).map((k) => tableCellNumber(row[k] ?? '').value);
    if (p.some((v) => v === null)) return [];
    return [{ label: row.label?.trim() || `point ${i + 1}`, positionCm: p as [number, number, number] }];
  });
}

/** The four-point tool island. */
export default function FourPointTool() {
  const [rows, setRows] = useState<TableRow[]>(blank);
  const [unit, setUnit] = useState('°C');
  const { mutation, errors, unplaced, run } = useToolRun<FourPointResult>('four-point');
  const r = mutation.data?.result;
  const unitPerCm = `${unit.trim() || 'units'} per cm`;

  const loadSample = (formation: FourPointSampleFormation) => {
    setRows(
      fourPointSample(formation).map((p) => ({
        label: p.label,
        x: String(p.positionCm[0]),
        y: String(p.positionCm[1]),
        z: String(p.positionCm[2]),
        value: String(p.value),
      })),
    );
    setUnit('°C');
  };
  // The points of the last run: the view shows them at once, and the arrow when the answer comes.
  const sent = useRef<{ points: ReturnType<typeof typedPoints>; unit: string }>({ points: [], unit: '' });
  const submit = () => {
    sent.current = { points: typedPoints(rows), unit };
    formationSend({ points: sent.current.points, gradient: null });
    run(fourPointTableRequest(rows, unit), (json) => ({ json }));
  };
  useEffect(() => {
    const answer = mutation.data?.result;
    if (!answer) return;
    formationSend({
      points: sent.current.points,
      gradient: { perCm: answer.gradientPerCm, fromCm: answer.centreCm, unit: sent.current.unit },
    });
  }, [mutation.data]);

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="four-point-input">
        <h2 id="four-point-input" className="text-xl font-bold">
          Your sensors
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          Type at least {FOUR_POINT_MIN_POINTS} sensors (at most {FOUR_POINT_MAX_POINTS}): where each one is, in cm from
          the corner you chose, and what it read at the same moment.
        </p>
        <div className="mt-3 flex flex-wrap items-center gap-3">
          <button type="button" className="btn-secondary" onClick={() => loadSample('tetrahedron')}>
            Load sample: one corner raised
          </button>
          <button type="button" className="btn-secondary" onClick={() => loadSample('flat')}>
            Load sample: all four flat
          </button>
          <span className="text-sm text-ink-soft">
            Sample data: four invented thermometer readings on a 40 cm square warmed by a lamp to one side.
          </span>
        </div>
        <div className="mt-4">
          <FieldShell
            label="Unit of the readings"
            hint="°C for thermometers, µT for a magnetometer."
            error={errors.unit}
          >
            {({ id, describedBy }) => (
              <input
                id={id}
                name="unit"
                className="field-input max-w-32"
                value={unit}
                maxLength={12}
                aria-describedby={describedBy}
                onChange={(e) => setUnit(e.target.value)}
              />
            )}
          </FieldShell>
        </div>
        <div className="mt-4">
          <DataTableInput
            caption="Sensor positions and readings"
            columns={COLUMNS}
            rows={rows}
            onChange={setRows}
            errors={errors}
            tableError={errors.table}
            maxRows={FOUR_POINT_MAX_POINTS}
          />
        </div>
        <RunBar
          label="Find the gradient"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type positions and readings or load a sample, then find the gradient."
        />
      </section>
      {r && mutation.data && (
        <>
          <ResultList
            title="Result"
            items={[
              {
                label: 'Gradient (x, y, z)',
                value: vector(r.gradientPerCm),
                unit: unitPerCm,
                note: 'How much the reading changes for each centimetre you move along x, y and z.',
                testId: 'four-point-gradient',
              },
              {
                label: 'Steepest change',
                value: numberFormat(r.gradientMagnitudePerCm, 3),
                unit: unitPerCm,
                note: r.gradientDirection
                  ? `The reading grows fastest toward ${vector(r.gradientDirection)}: the arrow in the 3D view.`
                  : 'The readings are all the same: no gradient.',
              },
              {
                label: 'Reading at the centre',
                value: numberFormat(r.valueAtCentre, 4),
                unit: unit.trim(),
                note: `The centre of the formation is at ${vector(r.centreCm)} cm.`,
              },
              {
                label: 'Elongation',
                value: r.quality.elongation.toFixed(2),
                note: '0 for a perfect tetrahedron, near 1 for sensors strung along a line.',
                testId: 'four-point-elongation',
              },
              {
                label: 'Planarity',
                value: r.quality.planarity.toFixed(2),
                note: '0 for a perfect tetrahedron, near 1 for sensors lying flat: they cannot see across their plane.',
                testId: 'four-point-planarity',
              },
              {
                label: 'Method',
                value: r.method === 'reciprocal-vectors' ? 'Reciprocal vectors (four sensors)' : 'Least squares',
                note:
                  r.method === 'least-squares'
                    ? `Readings differ from the best-fitting even change by ${numberFormat(r.residualRms, 3)} ${unit.trim()} on average (RMS).`
                    : 'Four sensors fix an evenly changing field exactly.',
              },
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
