/**
 * The eclipse calculator: for a circular orbit at an altitude, the orbit period and how long each orbit
 * spends in Earth's shadow (cylindrical shadow, Sun in the orbit plane: the longest eclipse).
 */
import { useState } from 'react';
import {
  ORBIT_MAX_ALTITUDE_KM,
  ORBIT_MIN_ALTITUDE_KM,
  type OrbitEclipseResult,
} from '../../lib/analysis/orbit-eclipse';
import { numberFormat } from '../../lib/tools/number-format';
import { formFieldNumber, type CellErrors } from '../../lib/tools/table-cells';
import DownloadResultButton from './DownloadResultButton';
import NumberField from './NumberField';
import Plot from './Plot';
import ResultList from './ResultList';
import RunBar from './RunBar';
import { useToolRun } from './useToolRun';

/** The orbit-eclipse island. */
export default function EclipseCalculator() {
  const [altitudeKm, setAltitude] = useState('400');
  const { mutation, errors, unplaced, run } = useToolRun<OrbitEclipseResult>('orbit-eclipse');
  const r = mutation.data?.result;
  const submit = () => {
    const problems: CellErrors = {};
    const value = formFieldNumber(altitudeKm, 'altitudeKm', problems);
    run(
      {
        input: value === undefined ? null : { altitudeKm: value },
        errors: problems,
        inputOfPath: { altitudeKm: 'altitudeKm' },
      },
      (json) => ({ json }),
    );
  };
  return (
    <div className="grid gap-6">
      <form
        className="card no-print"
        aria-labelledby="eclipse-input"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <h2 id="eclipse-input" className="text-xl font-bold">
          How long is the eclipse?
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          A spacecraft in a low orbit passes through Earth's shadow once an orbit. Give the orbit's height above Earth (
          {ORBIT_MIN_ALTITUDE_KM.toLocaleString('en-US')} to {ORBIT_MAX_ALTITUDE_KM.toLocaleString('en-US')} km) to see
          how long the "sunlight" and "eclipse" parts of your thermal test should last.
        </p>
        <div className="mt-3 flex flex-wrap items-end gap-4">
          <NumberField
            name="altitudeKm"
            label="Altitude"
            unit="km"
            value={altitudeKm}
            onChange={setAltitude}
            error={errors.altitudeKm}
          />
        </div>
        <RunBar
          label="Compute the eclipse"
          mutation={mutation}
          unplaced={unplaced}
          emptyText="Try 400 km, about where a space station flies."
        />
      </form>
      {r && mutation.data && (
        <>
          <ResultList
            title="One orbit"
            items={[
              { label: 'Orbit period', value: numberFormat(r.periodMin, 4), unit: 'min', testId: 'eclipse-period' },
              { label: 'In sunlight', value: numberFormat(r.sunlitMin, 3), unit: 'min' },
              {
                label: 'In eclipse',
                value: numberFormat(r.eclipseMin, 3),
                unit: 'min',
                note: `${numberFormat(r.eclipseFraction * 100, 3)} % of each orbit, with the Sun in the orbit's plane (the longest case).`,
                testId: 'eclipse-minutes',
              },
              { label: 'Orbits a day', value: numberFormat(r.orbitsPerDay, 3) },
            ]}
          />
          <Plot plot={mutation.data.savedResult.plot} heightPx={220} />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
