/**
 * Reach figures through the API against figures this test computes itself, with plain SQL written here from
 * the definitions' words (not the module's SQL), on the demo seed's rows: every figure, every grouping, two
 * periods (the last whole quarter and the twelve months before the current quarter), the previous period and
 * the monthly series. Both periods end before today, so rows other test files add now never fall in them.
 */
import type { Knex } from 'knex';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REACH_FIGURE_IDS, type ReachFigureId } from '../../src/lib/reach/figures';
import { monthShift, periodPrevious, quarterOf, quarterPeriod, type ReachPeriod } from '../../src/lib/reach/period';
import { REACH_GROUPINGS, type ReachGrouping } from '../../src/lib/reach/reach-query';
import { testKnex } from '../db/database';
import { pdfPageTexts } from '../fixtures/pdf-text';
import { schoolWithMostKits } from '../fixtures/reach-schools';
import { accountCreate, userSessionCookie } from './auth-helpers';
import { api } from './harness';

let knex: Knex;
let cookie: string;

beforeAll(async () => {
  knex = testKnex();
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'reach-coordinator' });
  cookie = await userSessionCookie(knex, coordinator.id);
});
afterAll(async () => {
  await knex?.destroy();
});

const today = new Date().toISOString().slice(0, 10);
const currentQuarter = quarterPeriod(quarterOf(today))!;
const PERIODS: Record<string, ReachPeriod> = {
  'last whole quarter': { from: monthShift(currentQuarter.from, -3), to: currentQuarter.from },
  'twelve months before this quarter': { from: monthShift(currentQuarter.from, -12), to: currentQuarter.from },
};

/** Independent group keys over a schools row `s` (null when the fact has no school). */
const GROUP_KEY: Record<ReachGrouping | 'none', string> = {
  none: "'all'",
  region: "COALESCE(s.region, '')",
  setting: "COALESCE(s.setting::text, '')",
  high_need: "COALESCE(s.high_need::text, '')",
  school: "COALESCE(s.id::text, '')",
};

/** Plain SQL per figure, written from the definitions: rows (g, v) with g the group key. */
function independentSql(figure: ReachFigureId, g: string): string {
  const reached = `
    reached AS (
      SELECT c.id, c.school_id, c.student_count FROM classes c
      WHERE EXISTS (SELECT 1 FROM kits k WHERE k.class_id = c.id AND k.created_at >= :from AND k.created_at < :to)
         OR EXISTS (SELECT 1 FROM entries e WHERE e.class_id = c.id AND e.state = 'published'
                    AND e.published_at >= :from AND e.published_at < :to)),
    held AS (SELECT id, school_id FROM events WHERE state = 'published' AND starts_at >= :from AND starts_at < :to AND starts_at <= now())`;
  switch (figure) {
    case 'schools':
      return `WITH ${reached}
        SELECT ${g} AS g, count(*) AS v FROM schools s
        WHERE s.id IN (SELECT school_id FROM reached)
           OR s.id IN (SELECT a.school_id FROM event_attendance a JOIN held h ON h.id = a.event_id)
        GROUP BY 1`;
    case 'active_teachers':
      return `SELECT ${g} AS g, count(*) AS v FROM users u LEFT JOIN schools s ON s.id = u.school_id
        WHERE u.role = 'teacher' AND (
          EXISTS (SELECT 1 FROM account_sign_in_days d WHERE d.user_id = u.id
                  AND d.day >= CAST(:fromDay AS date) AND d.day < CAST(:toDay AS date))
          OR EXISTS (SELECT 1 FROM kits k WHERE k.teacher_id = u.id AND k.created_at >= :from AND k.created_at < :to))
        GROUP BY 1`;
    case 'classes':
      return `WITH ${reached} SELECT ${g} AS g, count(*) AS v FROM reached r LEFT JOIN schools s ON s.id = r.school_id GROUP BY 1`;
    case 'students':
      return `WITH ${reached} SELECT ${g} AS g, sum(r.student_count) AS v FROM reached r LEFT JOIN schools s ON s.id = r.school_id GROUP BY 1`;
    case 'kits':
      return `SELECT ${g} AS g, count(*) AS v FROM kits k JOIN classes c ON c.id = k.class_id
        LEFT JOIN schools s ON s.id = c.school_id WHERE k.created_at >= :from AND k.created_at < :to GROUP BY 1`;
    case 'activities':
      return `SELECT ${g} AS g, count(*) AS v FROM (
          SELECT class_id, activity_slug FROM kits WHERE created_at >= :from AND created_at < :to
          UNION
          SELECT class_id, activity_slug FROM entries
          WHERE state = 'published' AND published_at >= :from AND published_at < :to
        ) x JOIN classes c ON c.id = x.class_id LEFT JOIN schools s ON s.id = c.school_id
        WHERE x.activity_slug IS NOT NULL GROUP BY 1`;
    case 'entries':
      return `SELECT ${g} AS g, count(*) AS v FROM entries e JOIN classes c ON c.id = e.class_id
        LEFT JOIN schools s ON s.id = c.school_id
        WHERE e.state = 'published' AND e.published_at >= :from AND e.published_at < :to GROUP BY 1`;
    case 'events':
      return `WITH ${reached} SELECT ${g} AS g, count(DISTINCT h.id) AS v FROM held h
        LEFT JOIN event_attendance a ON a.event_id = h.id
        LEFT JOIN schools s ON s.id = COALESCE(a.school_id, h.school_id) GROUP BY 1`;
    case 'attendance':
      return `WITH ${reached} SELECT ${g} AS g, sum(a.attendee_count) AS v FROM held h
        JOIN event_attendance a ON a.event_id = h.id LEFT JOIN schools s ON s.id = a.school_id GROUP BY 1`;
  }
}

/** group key → value, zero values left out. */
async function independent(figure: ReachFigureId, grouping: ReachGrouping | 'none', period: ReachPeriod) {
  const { rows } = await knex.raw(independentSql(figure, GROUP_KEY[grouping]), {
    from: new Date(`${period.from}T00:00:00Z`),
    to: new Date(`${period.to}T00:00:00Z`),
    fromDay: period.from,
    toDay: period.to,
  });
  return Object.fromEntries(
    (rows as { g: string; v: string }[]).filter((r) => Number(r.v) > 0).map((r) => [r.g, Number(r.v)]),
  );
}

async function getJson<T>(path: string): Promise<T> {
  const res = await api(path, { headers: { cookie } });
  expect(res.status, path).toBe(200);
  return (await res.json()) as T;
}

interface Summary {
  figures: { id: ReachFigureId; value: number; previous: number }[];
  buckets: { start: string }[];
  series: Record<ReachFigureId, number[]>;
}
interface Breakdown {
  rows: { groupKey: string; groupLabel: string; values: Record<ReachFigureId, number> }[];
  total: number;
}

const periodQuery = (p: ReachPeriod) => `from=${p.from}&to=${p.to}`;

describe('GET /api/reach/figures', () => {
  for (const [name, period] of Object.entries(PERIODS)) {
    it(`equals plain SQL for every figure over the ${name}, and over the period before it`, async () => {
      const summary = await getJson<Summary>(`/api/reach/figures?${periodQuery(period)}&bucket=month`);
      const previous = periodPrevious(period);
      let nonZero = 0;
      for (const figure of REACH_FIGURE_IDS) {
        const got = summary.figures.find((f) => f.id === figure)!;
        expect(got.value, figure).toBe((await independent(figure, 'none', period)).all ?? 0);
        expect(got.previous, `${figure} previous`).toBe((await independent(figure, 'none', previous)).all ?? 0);
        if (got.value > 0) nonZero += 1;
      }
      // The demo seed spreads its history over the past year: a check on zeros alone would prove little.
      expect(nonZero).toBeGreaterThanOrEqual(6);
    });

    it(`gives each month of the ${name} the value plain SQL gives that month`, async () => {
      const summary = await getJson<Summary>(`/api/reach/figures?${periodQuery(period)}&bucket=month`);
      expect(summary.buckets.map((b) => b.start)[0]).toBe(period.from);
      for (const [i, bucket] of summary.buckets.entries()) {
        const month = { from: bucket.start, to: monthShift(bucket.start, 1) };
        for (const figure of REACH_FIGURE_IDS) {
          expect(summary.series[figure][i], `${figure} in ${bucket.start}`).toBe(
            (await independent(figure, 'none', month)).all ?? 0,
          );
        }
      }
    });
  }
});

describe('GET /api/reach/breakdown', () => {
  for (const [name, period] of Object.entries(PERIODS)) {
    for (const grouping of REACH_GROUPINGS) {
      it(`equals plain SQL for every figure by ${grouping} over the ${name}`, async () => {
        const table = await getJson<Breakdown>(
          `/api/reach/breakdown?${periodQuery(period)}&groupBy=${grouping}&pageSize=200`,
        );
        expect(table.rows.length).toBe(table.total);
        for (const figure of REACH_FIGURE_IDS) {
          const got = Object.fromEntries(
            table.rows.filter((r) => r.values[figure] > 0).map((r) => [r.groupKey, r.values[figure]]),
          );
          expect(got, `${figure} by ${grouping}`).toEqual(await independent(figure, grouping, period));
        }
      });
    }
  }

  it('filters to high-need schools: every row is a high-need school and the sums match plain SQL', async () => {
    const period = PERIODS['twelve months before this quarter']!;
    const table = await getJson<Breakdown>(
      `/api/reach/breakdown?${periodQuery(period)}&groupBy=high_need&highNeed=true&pageSize=200`,
    );
    expect(table.rows.map((r) => r.groupKey)).toEqual(['true']);
    for (const figure of REACH_FIGURE_IDS) {
      if (figure === 'events') continue; // an event counts once per group; the high-need group is checked above
      const byFlag = await independent(figure, 'high_need', period);
      expect(table.rows[0]!.values[figure], figure).toBe(byFlag.true ?? 0);
    }
  });

  it('pages on the server: pages of 2 put together equal the whole table in the same order', async () => {
    const period = PERIODS['twelve months before this quarter']!;
    const q = `${periodQuery(period)}&groupBy=school&sort=students&dir=desc`;
    const whole = await getJson<Breakdown>(`/api/reach/breakdown?${q}&pageSize=200`);
    const pages: Breakdown['rows'] = [];
    for (let page = 1; page <= Math.ceil(whole.total / 2); page++) {
      pages.push(...(await getJson<Breakdown>(`/api/reach/breakdown?${q}&pageSize=2&page=${page}`)).rows);
    }
    expect(whole.total).toBeGreaterThan(2);
    expect(pages).toEqual(whole.rows);
    const students = whole.rows.map((r) => r.values.students);
    expect(students).toEqual([...students].sort((a, b) => b - a));
  });
});

describe('GET /api/reach/rows (drill-down)', () => {
  it('lists exactly the units a figure counts: their amounts add up to the figure', async () => {
    const period = PERIODS['twelve months before this quarter']!;
    const summary = await getJson<Summary>(`/api/reach/figures?${periodQuery(period)}`);
    for (const figure of REACH_FIGURE_IDS) {
      const drill = await getJson<{ rows: { amount: number }[]; total: number }>(
        `/api/reach/rows?${periodQuery(period)}&figure=${figure}&pageSize=200`,
      );
      const sum = drill.rows.reduce((a, r) => a + r.amount, 0);
      expect(sum, figure).toBe(summary.figures.find((f) => f.id === figure)!.value);
      expect(drill.rows.length).toBe(drill.total);
    }
  });
});

/** A new school with one teacher and one class of 12 students, made straight in the database. */
async function schoolWithClass(school: { name: string; city: string; region: string }, className: string) {
  const [row] = await knex('schools').insert(school).returning(['id']);
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'reach-school', schoolId: row.id });
  const [klass] = await knex('classes')
    .insert({
      teacher_id: teacher.id,
      school_id: row.id,
      name: className,
      grade_band: '6-8',
      student_count: 12,
      join_code: `R${Date.now().toString(36).toUpperCase().slice(-5)}${Math.floor(Math.random() * 100)}`,
    })
    .returning(['id']);
  return { schoolId: row.id as string, teacherId: teacher.id, classId: klass.id as string };
}

/** A kit of the class saved at `at`. */
async function kitInsert(c: { teacherId: string; classId: string }, title: string, at: Date): Promise<string> {
  const [kit] = await knex('kits')
    .insert({
      class_id: c.classId,
      teacher_id: c.teacherId,
      title,
      model_id: 'wren-3u',
      inputs: '{}',
      engine_version: 'test',
      content_hash: 'test',
      created_at: at,
    })
    .returning(['id']);
  return kit.id as string;
}

describe('reach figures after a change', () => {
  it('answers the changed figures at once after a kit is saved, a class resized and the kit deleted', async () => {
    const stamp = Date.now().toString(36);
    const made = await schoolWithClass(
      { name: `Fresh Figures School ${stamp}`, city: 'Nowhere', region: `Fresh ${stamp}` },
      'Fresh class',
    );
    // A quarter long past, filtered to this school: no other test's rows can fall in it.
    const path = `/api/reach/figures?from=2018-01-01&to=2018-04-01&schoolId=${made.schoolId}`;
    const figures = async () =>
      Object.fromEntries((await getJson<Summary>(path)).figures.map((f) => [f.id, f.value])) as Record<
        ReachFigureId,
        number
      >;

    expect(await figures()).toMatchObject({ kits: 0, classes: 0, students: 0 });
    const kitId = await kitInsert(made, 'Fresh kit', new Date('2018-02-03T10:00:00Z'));
    // By the definitions: one kit, its class once, the class's 12 students, the school reached.
    expect(await figures()).toMatchObject({ kits: 1, classes: 1, students: 12, schools: 1 });
    await knex('classes').where({ id: made.classId }).update({ student_count: 20 });
    expect(await figures()).toMatchObject({ kits: 1, classes: 1, students: 20 });
    await knex('kits').where({ id: kitId }).delete();
    expect(await figures()).toMatchObject({ kits: 0, classes: 0, students: 0, schools: 0 });
  });
});

describe('reach CSV exports', () => {
  it('parse back with papaparse into the table the API shows, row for row, under the same filters', async () => {
    const period = PERIODS['twelve months before this quarter']!;
    const q = `${periodQuery(period)}&groupBy=school&sort=kits&dir=asc&region=North%20County`;
    const table = await getJson<Breakdown>(`/api/reach/breakdown?${q}&pageSize=200`);
    const res = await api(`/api/reach/breakdown.csv?${q}&pageSize=1`, { headers: { cookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^text\/csv; charset=utf-8/);
    const parsed = Papa.parse<string[]>(await res.text(), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header![0]).toBe('School');
    expect(rows.length).toBeGreaterThan(0);
    expect(rows).toEqual(table.rows.map((r) => [r.groupLabel, ...REACH_FIGURE_IDS.map((f) => String(r.values[f]))]));
  });

  it('parse back the figures over time (the school page table) into the series the API answers, row for row', async () => {
    const period = PERIODS['twelve months before this quarter']!;
    const schoolId = await schoolWithMostKits(knex, period);
    const q = `${periodQuery(period)}&bucket=quarter&schoolId=${schoolId}`;
    const summary = await getJson<{
      figures: { id: ReachFigureId; label: string }[];
      buckets: { label: string }[];
      series: Record<ReachFigureId, number[]>;
    }>(`/api/reach/figures?${q}`);
    const res = await api(`/api/reach/figures.csv?${q}`, { headers: { cookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^text\/csv; charset=utf-8/);
    const parsed = Papa.parse<string[]>((await res.text()).replace(/^\uFEFF/, ''), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual(['Quarter', ...summary.figures.map((f) => f.label)]);
    expect(rows).toEqual(
      summary.buckets.map((b, i) => [b.label, ...summary.figures.map((f) => String(summary.series[f.id][i]))]),
    );
    expect(
      rows
        .flat()
        .slice(1)
        .some((v) => Number(v) > 0),
    ).toBe(true);
  });

  it('exports a school named =HYPERLINK("x") as text, prefixed so no spreadsheet runs it', async () => {
    const made = await schoolWithClass(
      { name: '=HYPERLINK("x")', city: `Csv ${Date.now()}`, region: 'Csv Test Region' },
      '+Class',
    );
    await kitInsert(made, '@Kit', new Date('2019-02-03T10:00:00Z'));
    const q = 'from=2019-01-01&to=2019-04-01&region=Csv%20Test%20Region';
    const breakdown = Papa.parse<string[]>(
      await (await api(`/api/reach/breakdown.csv?${q}&groupBy=school`, { headers: { cookie } })).text(),
    ).data;
    expect(breakdown[1]![0]).toBe(`'=HYPERLINK("x")`);
    const drill = Papa.parse<string[]>(
      await (await api(`/api/reach/rows.csv?${q}&figure=kits`, { headers: { cookie } })).text(),
    ).data;
    expect(drill[1]!.slice(1, 3)).toEqual([`'@Kit · +Class`, `'=HYPERLINK("x")`]);
  });
});

describe('reach query validation', () => {
  it('answers a bad period with 400 and the field at fault, never a 500', async () => {
    for (const q of ['from=2026-02-30&to=2026-03-01', 'from=2026-05-01&to=2026-04-01', 'quarter=2026-Q5', '']) {
      const res = await api(`/api/reach/figures?${q}`, { headers: { cookie } });
      expect(res.status, q).toBe(400);
      const body = (await res.json()) as { error: { code: string; fields?: object } };
      expect(body.error.code).toBe('invalid_input');
    }
  });
});

describe('GET /api/reach/report.pdf', () => {
  it('reads back with pdf.js: its pages say "Page n of m" and page 1 states the dashboard figures', async () => {
    const quarter = quarterOf(PERIODS['last whole quarter']!.from);
    const res = await api(`/api/reach/report.pdf?quarter=${quarter}`, { headers: { cookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const pages = await pdfPageTexts(new Uint8Array(await res.arrayBuffer()));
    expect(pages.length).toBeGreaterThanOrEqual(1);
    pages.forEach((text, i) => expect(text).toContain(`Page ${i + 1} of ${pages.length}`));
    const summary = await getJson<Summary & { figures: { label: string }[] }>(`/api/reach/figures?quarter=${quarter}`);
    const page1 = pages[0]!.replace(/\n/g, ' ');
    for (const f of summary.figures) expect(page1, f.label).toContain(`${f.label}: ${f.value.toLocaleString('en-US')}`);
  });

  it('answers a malformed quarter with 400', async () => {
    expect((await api('/api/reach/report.pdf?quarter=2026-Q9', { headers: { cookie } })).status).toBe(400);
  });
});
