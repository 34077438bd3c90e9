/**
 * Every reach figure by bucket as a table (one row per bucket, one column per figure, its definition on the
 * heading): the rows /api/reach/figures.csv exports for the same query, on the dashboard and the school page.
 */
import { REACH_BUCKET_HEADINGS } from '../../lib/reach/period';
import type { ReachSummary } from '../../lib/reach/reach-data.server';

interface Props {
  summary: Pick<ReachSummary, 'bucket' | 'buckets' | 'figures' | 'series'>;
  testId: string;
  /** True while newer figures are on their way: the table says so to assistive technology (aria-busy). */
  busy?: boolean;
}

export default function ReachSeriesTable({ summary, testId, busy = false }: Props) {
  return (
    <div className="mt-3 overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid={testId} aria-busy={busy}>
        <thead>
          <tr className="border-b border-ink/20">
            <th className="py-2 pr-3">{REACH_BUCKET_HEADINGS[summary.bucket]}</th>
            {summary.figures.map((f) => (
              <th className="py-2 pr-3" title={f.definition}>
                {f.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {summary.buckets.map((b, i) => (
            <tr className="border-b border-ink/10">
              <td className="py-1 pr-3">{b.label}</td>
              {summary.figures.map((f) => (
                <td className="py-1 pr-3">{summary.series[f.id][i]}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
