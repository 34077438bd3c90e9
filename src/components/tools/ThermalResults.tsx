/** Thermal runs' results: direction and rates, and the Newton's-law τ and T∞ with uncertainties, one row per run. */
import type { ThermalResult } from '../../lib/analysis/thermal';
import { numberFormat } from '../../lib/tools/number-format';

const pm = (v: number, e: number | null | undefined) =>
  `${numberFormat(v)}${e == null ? '' : ` ± ${numberFormat(e, 2)}`}`;

/** A table of every run's results, with the words a class needs beside it. */
export default function ThermalResults({ r }: { r: ThermalResult }) {
  return (
    <section className="card break-inside-avoid" aria-labelledby="thermal-results">
      <h3 id="thermal-results" className="text-lg font-bold">
        Result
      </h3>
      <p className="mt-1 text-sm text-ink-soft">
        The <strong>time constant τ</strong> is how long the model takes to get about two thirds (63 %) of the way to
        its final temperature: a blanket that works makes τ longer. Uncertainties are one standard error.
      </p>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="thermal-results">
          <thead>
            <tr>
              <th scope="col">Run</th>
              <th scope="col">Change</th>
              <th scope="col">Average rate (°C/min)</th>
              <th scope="col">Initial rate (°C/min)</th>
              <th scope="col">τ (min)</th>
              <th scope="col">Final T∞ (°C)</th>
            </tr>
          </thead>
          <tbody>
            {r.runs.map((run) => (
              <tr key={run.label} className="align-top">
                <th scope="row">{run.label}</th>
                <td>
                  {run.direction}: {numberFormat(run.startC)} → {numberFormat(run.endC)} °C
                </td>
                <td>{numberFormat(run.averageRateCPerMin)}</td>
                <td>{pm(run.initialRateCPerMin, run.initialRateStdErrorCPerMin)}</td>
                {run.fit ? (
                  <>
                    <td data-testid="thermal-tau">{pm(run.fit.timeConstantMin, run.fit.timeConstantStdErrorS / 60)}</td>
                    <td>{pm(run.fit.finalTemperature, run.fit.finalTemperatureStdError)}</td>
                  </>
                ) : (
                  <td colSpan={2} className="text-ink-soft">
                    {run.fitMessage}
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
