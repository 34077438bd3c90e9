/** The shake test's numbers: the headline Grms, the per-axis statistics and the band Grms, as lists and tables. */
import type { AxisStats, VibrationResult } from '../../lib/analysis/vibration';
import { numberFormat } from '../../lib/tools/number-format';
import ResultList from './ResultList';
import WarningList from './WarningList';

const UNIT_SOURCE = {
  stated: 'as you chose',
  header: 'from the header',
  gravity: 'from the size of gravity',
  assumed: 'assumed',
};

/** The results of one vibration analysis. */
export default function VibrationResults({ r }: { r: VibrationResult }) {
  const axes: [string, AxisStats | Omit<AxisStats, 'meanG'>][] = [
    ['x', r.axes.x],
    ['y', r.axes.y],
    ['z', r.axes.z],
    ['combined', r.combined],
  ];
  return (
    <>
      <ResultList
        title="Result"
        items={[
          {
            label: 'Overall Grms',
            value: numberFormat(r.combined.rmsG),
            unit: 'g',
            note: 'The root-mean-square shaking of all three axes together, gravity removed: the one number test levels are quoted in.',
            testId: 'vibration-grms',
          },
          { label: 'Peak', value: numberFormat(r.combined.peakG), unit: 'g' },
          {
            label: 'Strongest frequencies',
            value:
              r.dominant
                .slice(0, 3)
                .map((d) => `${numberFormat(d.frequencyHz)} Hz`)
                .join(', ') || '—',
            note: 'Peaks of the PSD: where the shaking puts its energy.',
          },
          {
            label: 'Record',
            value: `${r.sampleCount} readings at ${numberFormat(r.sampleRateHz, 4)} Hz over ${numberFormat(r.durationS)} s`,
          },
          { label: 'Input unit', value: r.units.input === 'm/s2' ? 'm/s²' : 'g', note: UNIT_SOURCE[r.units.source] },
          {
            label: 'PSD',
            value: `Welch, Hann window, ${r.psd.segmentCount} segments of ${r.psd.segmentLength}`,
            note: `frequency step ${numberFormat(r.psd.resolutionHz)} Hz`,
          },
        ]}
      />
      <WarningList warnings={r.warnings} />
      <div className="grid gap-6 md:grid-cols-2">
        <section className="card break-inside-avoid" aria-labelledby="vibration-axes">
          <h3 id="vibration-axes" className="text-lg font-bold">
            Per axis (g)
          </h3>
          <table className="mt-2 w-full text-left text-sm">
            <thead>
              <tr>
                <th scope="col">Axis</th>
                <th scope="col">RMS</th>
                <th scope="col">Peak</th>
                <th scope="col">Crest factor</th>
              </tr>
            </thead>
            <tbody>
              {axes.map(([name, s]) => (
                <tr key={name}>
                  <th scope="row">{name}</th>
                  <td>{numberFormat(s.rmsG)}</td>
                  <td>{numberFormat(s.peakG)}</td>
                  <td>{numberFormat(s.crestFactor)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
        <section className="card break-inside-avoid" aria-labelledby="vibration-bands">
          <h3 id="vibration-bands" className="text-lg font-bold">
            Grms in frequency bands (g)
          </h3>
          <table className="mt-2 w-full text-left text-sm">
            <thead>
              <tr>
                <th scope="col">Band (Hz)</th>
                <th scope="col">x</th>
                <th scope="col">y</th>
                <th scope="col">z</th>
                <th scope="col">combined</th>
              </tr>
            </thead>
            <tbody>
              {r.bands.map((b) => (
                <tr key={`${b.lowHz}-${b.highHz}`}>
                  <th scope="row">
                    {numberFormat(b.lowHz)}–{numberFormat(b.highHz)}
                  </th>
                  <td>{numberFormat(b.grmsX)}</td>
                  <td>{numberFormat(b.grmsY)}</td>
                  <td>{numberFormat(b.grmsZ)}</td>
                  <td>{numberFormat(b.grmsCombined)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      </div>
    </>
  );
}
