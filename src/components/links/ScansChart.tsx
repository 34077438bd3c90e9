/**
 * A live link's scans by day: the last SCAN_CHART_DAYS UTC days as bars (the tools' uPlot Plot), the days
 * without scans at zero, loaded from GET /api/links/ID when the chart opens.
 */
import { useEffect, useState } from 'react';
import { api, ApiError } from '../../lib/http/client';
import { linkScanDays, scanDayFromNumber, scanDayNumber, type ScanDay } from '../../lib/links/link-scans';
import Plot from '../tools/Plot';

/** Days the chart shows, ending today (UTC). */
export const SCAN_CHART_DAYS = 30;

/** "Mar 9" for a whole day number, nothing between days. */
const dayLabel = (x: number) => {
  if (!Number.isInteger(x)) return '';
  const date = new Date(`${scanDayFromNumber(x)}T00:00:00Z`);
  return date.toLocaleDateString('en-US', { month: 'short', day: 'numeric', timeZone: 'UTC' });
};

interface Props {
  linkId: string;
  code: string;
}

export default function ScansChart({ linkId, code }: Props) {
  const [days, setDays] = useState<ScanDay[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    const abort = new AbortController();
    setDays(null);
    setError(null);
    api<{ scansByDay: ScanDay[] }>(`/api/links/${linkId}`, { signal: abort.signal }).then(
      (data) => setDays(linkScanDays(data.scansByDay, new Date().toISOString().slice(0, 10), SCAN_CHART_DAYS)),
      (err: unknown) => {
        if (err instanceof ApiError) setError(err.message);
      },
    );
    return () => abort.abort();
  }, [linkId]);
  if (error) return <p role="alert">We could not load the scans: {error}</p>;
  if (!days) return <p role="status">Loading the scans of {code}…</p>;
  const total = days.reduce((n, d) => n + d.count, 0);
  return (
    <div className="space-y-2">
      <p>
        {total === 0
          ? `No scans of ${code} in the last ${SCAN_CHART_DAYS} days.`
          : `${total} ${total === 1 ? 'scan' : 'scans'} of ${code} in the last ${SCAN_CHART_DAYS} days (days in UTC).`}
      </p>
      <Plot
        heightPx={220}
        xFormat={dayLabel}
        plot={{
          kind: 'bar',
          title: `Scans of ${code} by day`,
          xLabel: 'Day (UTC)',
          yLabel: 'Scans',
          series: [{ label: 'Scans', points: days.map((d) => [scanDayNumber(d.day), d.count]) }],
        }}
      />
    </div>
  );
}
