/**
 * The reach dashboard: a quarter and school filters, headline figures with the change from the quarter
 * before and their definitions, the drill-down of a figure's rows, each figure over the last eight quarters
 * (a chart each, uPlot through the tools' Plot, and a table with its CSV), the breakdown table and the quarterly
 * report. Every number comes from /api/reach/*.
 */
import { useEffect, useMemo, useState } from 'react';
import { api } from '../../lib/http/client';
import type { ReachFigureId } from '../../lib/reach/figures';
import { quartersEnding, REACH_TREND_QUARTERS } from '../../lib/reach/period';
import type { ReachSummary } from '../../lib/reach/reach-data.server';
import Plot from '../tools/Plot';
import ReachBreakdownTable from './ReachBreakdownTable';
import ReachSeriesTable from './ReachSeriesTable';

interface Props {
  initial: ReachSummary;
  /** Every figure by quarter over the REACH_TREND_QUARTERS quarters ending with `quarter`. */
  initialTrend: ReachSummary;
  quarter: string;
  /** Quarters offered, newest first ('YYYY-Qn' and its label). */
  quarters: { value: string; label: string }[];
}

interface Drill {
  figure: ReachFigureId;
  label: string;
  amountLabel: string | null;
  rows: { at: string; item: string; amount: number; schoolName: string | null }[];
  total: number;
}

const numberText = (n: number) => n.toLocaleString('en-US');

function change(value: number, previous: number): string {
  if (previous === 0) return value === 0 ? 'no change' : `up from 0`;
  const pct = Math.round(((value - previous) / previous) * 100);
  return `${pct >= 0 ? '+' : ''}${pct}% on the quarter before (${numberText(previous)})`;
}

export default function ReachDashboard({ initial, initialTrend, quarter: initialQuarter, quarters }: Props) {
  const [quarter, setQuarter] = useState(initialQuarter);
  const [highNeed, setHighNeed] = useState('');
  const [summary, setSummary] = useState(initial);
  const [trend, setTrend] = useState(initialTrend);
  const [trendBusy, setTrendBusy] = useState(false);
  const [drill, setDrill] = useState<Drill | null>(null);
  const [error, setError] = useState<string | null>(null);
  const query = useMemo<Record<string, string>>(
    () => ({ quarter, ...(highNeed ? { highNeed } : {}) }),
    [quarter, highNeed],
  );
  const trendQuery = useMemo<Record<string, string>>(
    () => ({ ...quartersEnding(quarter, REACH_TREND_QUARTERS)!, bucket: 'quarter', ...(highNeed ? { highNeed } : {}) }),
    [quarter, highNeed],
  );

  useEffect(() => {
    const abort = new AbortController();
    api<ReachSummary>('/api/reach/figures', { query: { ...query, bucket: 'month' }, signal: abort.signal })
      .then((s) => (setSummary(s), setError(null), setDrill(null)))
      .catch((e: Error) => abort.signal.aborted || setError(e.message));
    return () => abort.abort();
  }, [query]);

  useEffect(() => {
    const abort = new AbortController();
    setTrendBusy(true);
    api<ReachSummary>('/api/reach/figures', { query: trendQuery, signal: abort.signal })
      .then(setTrend)
      .catch((e: Error) => abort.signal.aborted || setError(e.message))
      .finally(() => abort.signal.aborted || setTrendBusy(false));
    return () => abort.abort();
  }, [trendQuery]);

  async function drillDown(figure: ReachFigureId) {
    const body = await api<{
      figure: { label: string; amountLabel: string | null };
      rows: Drill['rows'];
      total: number;
    }>('/api/reach/rows', { query: { ...query, figure, pageSize: 200 } });
    setDrill({
      figure,
      label: body.figure.label,
      amountLabel: body.figure.amountLabel,
      rows: body.rows,
      total: body.total,
    });
  }

  return (
    <div className="space-y-8">
      <form className="flex flex-wrap items-end gap-4" onSubmit={(e) => e.preventDefault()}>
        <label className="text-sm">
          Quarter
          <select
            className="ml-2 rounded border border-ink/30 px-2 py-1"
            value={quarter}
            onChange={(e) => setQuarter((e.target as HTMLSelectElement).value)}
          >
            {quarters.map((q) => (
              <option value={q.value}>{q.label}</option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          Schools
          <select
            className="ml-2 rounded border border-ink/30 px-2 py-1"
            value={highNeed}
            name="highNeed"
            onChange={(e) => setHighNeed((e.target as HTMLSelectElement).value)}
          >
            <option value="">All schools</option>
            <option value="true">High-need schools only</option>
            <option value="false">Other schools only</option>
          </select>
        </label>
        <a className="btn-secondary text-sm" href={`/api/reach/report.pdf?quarter=${quarter}`} data-testid="report-pdf">
          Quarterly report (PDF)
        </a>
      </form>
      {error && (
        <p role="alert" className="text-danger">
          {error}
        </p>
      )}

      <section aria-labelledby="headline-heading">
        <h2 id="headline-heading" className="text-xl font-bold">
          Headline figures
        </h2>
        <ul className="mt-3 grid gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="headline-figures">
          {summary.figures.map((f) => (
            <li className="card" data-figure={f.id}>
              <p className="text-sm font-semibold">{f.label}</p>
              <p className="text-3xl font-bold" data-value={f.value}>
                {numberText(f.value)}
              </p>
              <p className="text-sm text-ink-soft">{change(f.value, f.previous)}</p>
              <p className="mt-2 text-sm">{f.definition}</p>
              <button type="button" className="mt-2 text-sm underline" onClick={() => void drillDown(f.id)}>
                Show what this counts
              </button>
            </li>
          ))}
        </ul>
      </section>

      {drill && (
        <section aria-labelledby="drill-heading" data-testid="drill-down">
          <h2 id="drill-heading" className="text-xl font-bold">
            {drill.label}: {drill.total} rows
          </h2>
          <a
            className="btn-secondary mt-2 inline-block text-sm"
            href={`/api/reach/rows.csv?${new URLSearchParams({ ...query, figure: drill.figure })}`}
            download
          >
            Download CSV
          </a>
          <table className="mt-3 w-full text-left text-sm">
            <thead>
              <tr className="border-b border-ink/20">
                <th className="py-2 pr-3">Date (UTC)</th>
                <th className="py-2 pr-3">What</th>
                <th className="py-2 pr-3">School</th>
                {drill.amountLabel && <th className="py-2">{drill.amountLabel}</th>}
              </tr>
            </thead>
            <tbody>
              {drill.rows.map((r) => (
                <tr className="border-b border-ink/10">
                  <td className="py-1 pr-3">{r.at.slice(0, 10)}</td>
                  <td className="py-1 pr-3">{r.item}</td>
                  <td className="py-1 pr-3">{r.schoolName ?? '—'}</td>
                  {drill.amountLabel && <td className="py-1">{r.amount}</td>}
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}

      <section aria-labelledby="trend-heading">
        <h2 id="trend-heading" className="text-xl font-bold">
          The last {REACH_TREND_QUARTERS} quarters
        </h2>
        <a
          className="btn-secondary mt-2 inline-block text-sm"
          href={`/api/reach/figures.csv?${new URLSearchParams(trendQuery)}`}
          data-testid="trend-csv"
          download
        >
          Download CSV
        </a>
        <div className="mt-3 grid gap-6 lg:grid-cols-3">
          {trend.figures.map((f) => (
            <Plot
              heightPx={180}
              xFormat={(x) => trend.buckets[x - 1]?.label ?? ''}
              plot={{
                kind: 'bar',
                title: f.label,
                xLabel: 'Quarter',
                yLabel: f.label,
                series: [{ label: f.label, points: trend.series[f.id].map((v, i) => [i + 1, v]) }],
              }}
            />
          ))}
        </div>
        <ReachSeriesTable summary={trend} testId="trend-table" busy={trendBusy} />
      </section>

      <section aria-labelledby="breakdown-heading">
        <h2 id="breakdown-heading" className="text-xl font-bold">
          Breakdown
        </h2>
        <ReachBreakdownTable query={query} figures={summary.figures} />
      </section>
    </div>
  );
}
