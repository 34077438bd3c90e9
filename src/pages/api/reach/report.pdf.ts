import { STAFF } from '../../../lib/auth/actor';
import { reachBreakdown } from '../../../lib/db/reach';
import { endpoint } from '../../../lib/http/endpoint';
import { kitFonts } from '../../../lib/kit/fonts.server';
import { quarterLabel, quarterPeriod } from '../../../lib/reach/period';
import { reachReportPdf } from '../../../lib/reach/reach-report-pdf';
import { reachSummary } from '../../../lib/reach/reach-data.server';
import { queryObject, ReachReportQuerySchema } from '../../../lib/reach/reach-query';
import { parseInput } from '../../../lib/validation';
import { serverConfig } from '../../../lib/server-config';

/** The office's name on the report (REACH_OFFICE_NAME), or a plain default. */
const OFFICE_NAME = serverConfig('REACH_OFFICE_NAME');
const TOP_SCHOOLS = 10;

/** The quarterly reach report PDF: the same figures as the dashboard for that quarter. */
export const GET = endpoint({ access: STAFF }, async ({ url }) => {
  const { quarter } = parseInput(ReachReportQuerySchema, queryObject(url.searchParams), 'report query');
  const period = quarterPeriod(quarter)!;
  const [summary, byFlag, top, fonts] = await Promise.all([
    reachSummary(period, 'month', {}),
    reachBreakdown(period, {}, { grouping: 'high_need', sort: 'group', dir: 'asc', page: null }),
    reachBreakdown(
      period,
      {},
      { grouping: 'school', sort: 'students', dir: 'desc', page: { offset: 0, limit: TOP_SCHOOLS } },
    ),
    kitFonts(),
  ]);
  const schools = (key: string) => byFlag.rows.find((r) => r.groupKey === key)?.values.schools ?? 0;
  const bytes = reachReportPdf(
    {
      officeName: OFFICE_NAME,
      quarterLabel: quarterLabel(quarter),
      periodText: `${period.from} to ${period.to} (the day after the quarter), dates in UTC.`,
      figures: summary.figures,
      months: summary.buckets.map((b) => b.label),
      series: summary.series,
      highNeed: { schools: schools('true'), of: summary.figures.find((f) => f.id === 'schools')!.value },
      topSchools: top.rows
        .filter((r) => r.groupKey !== '')
        .map((r) => ({
          name: r.groupLabel,
          students: r.values.students,
          kits: r.values.kits,
          entries: r.values.entries,
        })),
    },
    fonts,
  );
  return new Response(bytes, {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="reach-report-${quarter}.pdf"`,
      'cache-control': 'no-store',
    },
  });
});
