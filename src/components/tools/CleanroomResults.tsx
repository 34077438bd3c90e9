/** A clean-room result: the ISO class, the sampling check, and per size the worst location against the class limit. */
import type { CleanroomResult } from '../../lib/analysis/cleanroom';
import { numberFormat } from '../../lib/tools/number-format';
import ResultList from './ResultList';
import WarningList from './WarningList';

/** The lists and tables of one clean-room classification. */
export default function CleanroomResults({ r }: { r: CleanroomResult }) {
  return (
    <>
      <ResultList
        title="Result"
        items={[
          {
            label: 'ISO 14644-1 class',
            value: r.isoClass === null ? 'above Class 9' : `ISO Class ${r.isoClass}`,
            note: 'Lower is cleaner: each class allows ten times the particles of the one below. Class 9 is about ordinary room air; Class 5 is a spacecraft clean room.',
            testId: 'cleanroom-class',
          },
          {
            label: 'Sampling locations',
            value: `${r.locationsSampled} sampled, ${r.locationsRequired} needed`,
            note: 'The smallest number ISO 14644-1 asks for at this floor area.',
          },
        ]}
      />
      <WarningList warnings={r.warnings} />
      <section className="card break-inside-avoid" aria-labelledby="cleanroom-sizes">
        <h3 id="cleanroom-sizes" className="text-lg font-bold">
          Per particle size (particles per m³)
        </h3>
        <div className="overflow-x-auto">
          <table className="mt-2 w-full text-left text-sm">
            <thead>
              <tr>
                <th scope="col">Size</th>
                <th scope="col">Worst location mean</th>
                <th scope="col">Class limit</th>
                <th scope="col">Cleanest class met at this size</th>
                {r.locations.map((l) => (
                  <th scope="col" key={l.label}>
                    {l.label}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {r.perSize.map((s, i) => (
                <tr key={s.sizeUm}>
                  <th scope="row">≥ {s.sizeUm} µm</th>
                  <td>{numberFormat(s.maxLocationMeanPerM3)}</td>
                  <td>{numberFormat(r.classLimitsPerM3?.[i] ?? null)}</td>
                  <td>{s.lowestClassMet ?? '—'}</td>
                  {r.locations.map((l) => (
                    <td key={l.label}>{numberFormat(l.concentrationPerM3[i] ?? null)}</td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </>
  );
}
