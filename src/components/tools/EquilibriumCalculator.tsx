/**
 * The sunlit equilibrium temperature calculator: the temperature at which a body in sunlight radiates away
 * as much heat as it absorbs, from its absorptivity, emissivity, area ratio and distance from the Sun.
 */
import { useState } from 'react';
import {
  EQUILIBRIUM_MAX_DISTANCE_AU,
  EQUILIBRIUM_MIN_DISTANCE_AU,
  type EquilibriumTemperatureResult,
} from '../../lib/analysis/equilibrium-temperature';
import { numberFormat } from '../../lib/tools/number-format';
import { formFieldNumber, type CellErrors } from '../../lib/tools/table-cells';
import DownloadResultButton from './DownloadResultButton';
import NumberField from './NumberField';
import ResultList from './ResultList';
import RunBar from './RunBar';
import SelectField from './SelectField';
import { useToolRun } from './useToolRun';

const FIELDS = ['absorptivity', 'emissivity', 'areaRatio', 'distanceAu'] as const;
const SHAPES = [
  { value: '0.25', label: 'Sphere (¼)' },
  { value: '0.5', label: 'Flat plate facing the Sun, both faces radiating (½)' },
  { value: '1', label: 'Flat plate, back insulated (1)' },
];

/** The equilibrium-temperature island. */
export default function EquilibriumCalculator() {
  const [v, setV] = useState<Record<(typeof FIELDS)[number], string>>({
    absorptivity: '0.9',
    emissivity: '0.9',
    areaRatio: '0.25',
    distanceAu: '1',
  });
  const { mutation, errors, unplaced, run } = useToolRun<EquilibriumTemperatureResult>('equilibrium-temperature');
  const r = mutation.data?.result;
  const set = (k: (typeof FIELDS)[number]) => (value: string) => setV((old) => ({ ...old, [k]: value }));
  const submit = () => {
    const problems: CellErrors = {};
    const input = Object.fromEntries(FIELDS.map((k) => [k, formFieldNumber(v[k], k, problems)]));
    run(
      {
        input: Object.keys(problems).length ? null : input,
        errors: problems,
        inputOfPath: Object.fromEntries(FIELDS.map((k) => [k, k])),
      },
      (json) => ({ json }),
    );
  };
  return (
    <div className="grid gap-6">
      <form
        className="card no-print"
        aria-labelledby="equilibrium-input"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <h2 id="equilibrium-input" className="text-xl font-bold">
          How warm does it get in sunlight?
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          A surface's <strong>absorptivity</strong> (0–1) says how much sunlight it soaks up; its{' '}
          <strong>emissivity</strong> (0–1) how well it radiates heat away. Shiny foil absorbs little and radiates
          little; white paint absorbs little but radiates well — which is why blankets and paints matter.
        </p>
        <div className="mt-3 flex flex-wrap items-end gap-4">
          <NumberField
            name="absorptivity"
            label="Absorptivity α"
            value={v.absorptivity}
            onChange={set('absorptivity')}
            error={errors.absorptivity}
          />
          <NumberField
            name="emissivity"
            label="Emissivity ε"
            value={v.emissivity}
            onChange={set('emissivity')}
            error={errors.emissivity}
          />
          <SelectField
            name="areaRatio"
            label="Shape (sunlit ÷ radiating area)"
            value={v.areaRatio}
            onChange={set('areaRatio')}
            options={SHAPES}
            error={errors.areaRatio}
          />
          <NumberField
            name="distanceAu"
            label="Distance from the Sun"
            unit="AU"
            hint={`Earth is 1 AU; ${EQUILIBRIUM_MIN_DISTANCE_AU}–${EQUILIBRIUM_MAX_DISTANCE_AU}.`}
            value={v.distanceAu}
            onChange={set('distanceAu')}
            error={errors.distanceAu}
          />
        </div>
        <RunBar
          label="Compute the temperature"
          mutation={mutation}
          unplaced={unplaced}
          emptyText="Try a black sphere (α = ε = 1) at 1 AU first."
        />
      </form>
      {r && mutation.data && (
        <>
          <ResultList
            title="Equilibrium temperature"
            items={[
              {
                label: 'Temperature',
                value: numberFormat(r.temperatureC, 3),
                unit: '°C',
                note: `${numberFormat(r.temperatureK, 4)} K`,
                testId: 'equilibrium-c',
              },
              { label: 'Sunlight there', value: numberFormat(r.irradianceWPerM2, 4), unit: 'W/m²' },
            ]}
          />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
