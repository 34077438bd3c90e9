/**
 * `npm run bench:reach`: the issue-12 performance figures on a bench seed (tests/bench/reach-seed.ts: 2,000
 * schools, 10,000 classes, 100,000 entries, 30,000 kits, 500 events) in a database of its own
 * (KW_BENCH_REACH_DATABASE, default kitwright_bench_reach), rebuilt on every run and timed (target < 60 s).
 * Then, on the built app over loopback, for the last whole quarter:
 *   1. the three calls the dashboard makes (figures by month, the breakdown by school, a figure's drill-down),
 *      each with autocannon at 20 connections for ROUNDS runs of about SECONDS s (a number of requests): the 95th
 *      percentile of the response times (from every response, not autocannon's fixed percentiles) against the
 *      target ≤ 100 ms, on the app's cached answers (the data does not change during a run);
 *   2. the quarterly report PDF, PDF_RUNS downloads one after another, against ≤ 2 s;
 *   3. each dashboard call alone right after a change to the data (the app's cached answer out of date);
 * printed as min / median / max over the runs, without failing on a missed target. Last, the SQL behind those
 * calls run in this process: the EXPLAIN (ANALYZE, BUFFERS) plans of the three slowest queries, and the indexes
 * on the tables the figures read.
 * Builds the app when KW_OUT_DIR (default dist) has no build; run `npm run build` first after changing code.
 * Ports: PORT (app, 4321); the project's PostgreSQL (KW_PG_PORT).
 */
import type { Knex } from 'knex';
import pg from 'pg';
import { dateIso, monthShift, quarterOf, quarterPeriod } from '../../src/lib/reach/period';
import { accountCreate, userSessionCookie } from '../api/auth-helpers';
import {
  BENCH_ROUNDS as ROUNDS,
  benchAppStart,
  figure,
  latenciesUnderLoad,
  median,
  percentile,
  reachDataChange,
} from './bench-harness';
import { REACH_SEED_SIZES, REACH_TABLES, reachSeed, reachSeedClear } from './reach-seed';

const SECONDS = Number(process.env.KW_BENCH_SECONDS ?? 5);
const PDF_RUNS = Math.max(ROUNDS, 5);
const CONNECTIONS = 20;
const TARGET = { seedS: 60, p95Ms: 100, pdfS: 2 };
const DATABASE = process.env.KW_BENCH_REACH_DATABASE ?? 'kitwright_bench_reach';
const quarter = quarterOf(monthShift(quarterPeriod(quarterOf(dateIso(new Date())))!.from, -3));
const DASHBOARD_CALLS = {
  'GET /api/reach/figures': `/api/reach/figures?quarter=${quarter}&bucket=month`,
  'GET /api/reach/breakdown': `/api/reach/breakdown?quarter=${quarter}&groupBy=school&sort=students&dir=desc`,
  'GET /api/reach/rows': `/api/reach/rows?quarter=${quarter}&figure=students`,
};

/**
 * One run on a dashboard call as the coordinator, of a number of requests (not a time, so slow answers are not
 * cut off in flight), with a long timeout: a slow answer is a figure to report, not an error to drop.
 */
const load = (url: string, cookie: string, amount: number) =>
  latenciesUnderLoad(url, { connections: CONNECTIONS, amount, headers: { cookie }, timeoutS: 120 });

/**
 * A change that touches no row but, like any statement on a table the figures read, raises the reach data version
 * (migration 20261205130000): the next reach query runs instead of coming from the app's memory.
 */

/**
 * The SQL the reach routes run for the quarter, timed in this process, uncached (a change before each of 3 runs):
 * text, bindings and median ms.
 */
async function reachQueriesTimed(dbUrl: string, knex: Knex) {
  process.env.DATABASE_URL = dbUrl;
  const { db, dbClose } = await import('../../src/lib/db/knex');
  const data = await import('../../src/lib/reach/reach-data.server');
  const query = await import('../../src/lib/reach/reach-query');
  const seen = new Map<string, { sql: string; bindings: unknown[]; ms: number[] }>();
  const started = new Map<string, { at: number; key: string }>();
  type Query = { __knexQueryUid: string; sql: string; bindings: unknown[] };
  db().on('query', (q: Query) => {
    const key = `${q.sql}\n${JSON.stringify(q.bindings)}`;
    if (!seen.has(key)) seen.set(key, { sql: q.sql, bindings: q.bindings, ms: [] });
    started.set(q.__knexQueryUid, { at: performance.now(), key });
  });
  db().on('query-response', (_rows: unknown, q: Query) => {
    const s = started.get(q.__knexQueryUid)!;
    seen.get(s.key)!.ms.push(performance.now() - s.at);
  });
  const period = quarterPeriod(quarter)!;
  for (let i = 0; i < 3; i++) {
    await reachDataChange(knex, 'kits');
    await data.reachSummary(period, 'month', {});
    await data.reachBreakdownPage(query.ReachBreakdownQuerySchema.parse({ quarter }));
    await data.reachRowsPage(query.ReachRowsQuerySchema.parse({ quarter, figure: 'students' }));
  }
  await dbClose();
  return [...seen.values()].map((q) => ({ ...q, median: median(q.ms) })).sort((a, b) => b.median - a.median);
}

const seeding = { seedS: 0, analyzeS: 0, counts: {} as Record<string, number> };
const bench = await benchAppStart({
  name: 'reach',
  database: DATABASE,
  seed: async (knex) => {
    await reachSeedClear(knex);
    const seedStart = performance.now();
    seeding.counts = await reachSeed(knex);
    seeding.seedS = (performance.now() - seedStart) / 1000;
    const analyzeStart = performance.now();
    await knex.raw('ANALYZE');
    seeding.analyzeS = (performance.now() - analyzeStart) / 1000;
  },
});
try {
  const { app, knex, dbUrl } = bench;
  const { counts, seedS, analyzeS } = seeding;
  console.log(`bench:reach — database ${DATABASE}, quarter ${quarter}, ${CONNECTIONS} connections, machine load as is`);
  console.log(
    `seed: ${Object.entries(counts)
      .map(([t, n]) => `${n} ${t}`)
      .join(', ')}`,
  );
  console.log(
    `seed built in ${seedS.toFixed(1)} s (target < ${TARGET.seedS} s: ${seedS < TARGET.seedS ? 'met' : 'MISSED'}), ` +
      `ANALYZE ${analyzeS.toFixed(1)} s`,
  );
  for (const [table, size] of Object.entries(REACH_SEED_SIZES)) {
    const n = table === 'teachers' ? counts.users : counts[table];
    if (n !== size) throw new Error(`the seed made ${n} ${table}, not ${size}`);
  }

  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'bench-reach' });
  const cookie = await userSessionCookie(knex, coordinator.id);

  console.log('');
  // The floor on this machine now: the app's health check (one trivial query, no session) under the same load.
  const floor: number[] = [];
  for (let round = 0; round < ROUNDS; round += 1) {
    floor.push(percentile((await load(`${app.url}/api/health`, '', 10 * CONNECTIONS)).latencies, 95));
  }
  figure('GET /api/health p95 latency (the floor)', floor, 'ms');
  for (const [name, path] of Object.entries(DASHBOARD_CALLS)) {
    // Warm-up (JIT, pools); its rate sizes the runs to about SECONDS s each.
    const warmStart = performance.now();
    const warm = await load(`${app.url}${path}`, cookie, CONNECTIONS);
    const rate = warm.latencies.length / ((performance.now() - warmStart) / 1000);
    const amount = Math.max(2 * CONNECTIONS, Math.round(rate * SECONDS));
    const p95: number[] = [];
    const rps: number[] = [];
    for (let round = 0; round < ROUNDS; round += 1) {
      const runStart = performance.now();
      const run = await load(`${app.url}${path}`, cookie, amount);
      rps.push(run.latencies.length / ((performance.now() - runStart) / 1000));
      if (run.other > 0) console.log(`  (${name}: ${run.other} answers not 200 or failed)`);
      p95.push(percentile(run.latencies, 95));
    }
    // One request right after a change: what a coordinator waits for when the cached answer is out of date.
    const fresh: number[] = [];
    for (let round = 0; round < ROUNDS; round += 1) {
      await reachDataChange(knex, 'kits');
      const started = performance.now();
      const res = await fetch(`${app.url}${path}`, { headers: { cookie } });
      await res.arrayBuffer();
      fresh.push(performance.now() - started);
    }
    figure(`${name} p95 latency`, p95, 'ms', { op: '≤', value: TARGET.p95Ms });
    figure(`${name} req/s`, rps, 'req/s');
    figure(`${name} alone, right after a change`, fresh, 'ms');
  }

  const pdfS: number[] = [];
  for (let run = 0; run < PDF_RUNS; run += 1) {
    const started = performance.now();
    const res = await fetch(`${app.url}/api/reach/report.pdf?quarter=${quarter}`, { headers: { cookie } });
    const bytes = await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`the report answered ${res.status}`);
    pdfS.push((performance.now() - started) / 1000);
    if (run === 0) console.log(`  (report PDF: ${(bytes.byteLength / 1024).toFixed(0)} KB)`);
  }
  figure(`GET /api/reach/report.pdf (${PDF_RUNS} downloads)`, pdfS, 's', { op: '≤', value: TARGET.pdfS });

  const queries = await reachQueriesTimed(dbUrl, knex);
  console.log(`\nthe ${queries.length} queries behind the dashboard's calls, median ms of 3 runs in this process:`);
  for (const q of queries)
    console.log(`  ${q.median.toFixed(1).padStart(8)} ms  ${q.sql.replace(/\s+/g, ' ').slice(0, 90)}…`);
  const client = new pg.Client({ connectionString: dbUrl });
  await client.connect();
  try {
    for (const [i, q] of queries.slice(0, 3).entries()) {
      console.log(`\n— slowest query ${i + 1} (${q.median.toFixed(1)} ms), bindings ${JSON.stringify(q.bindings)}:`);
      console.log(q.sql.trim());
      const plan = await client.query(`EXPLAIN (ANALYZE, BUFFERS) ${q.sql}`, q.bindings);
      console.log(plan.rows.map((r) => r['QUERY PLAN']).join('\n'));
    }
    const indexes = await client.query(
      `SELECT tablename, indexname, indexdef FROM pg_indexes
       WHERE schemaname = 'public' AND tablename = ANY($1) ORDER BY tablename, indexname`,
      [REACH_TABLES],
    );
    console.log('\nindexes on the tables the figures read:');
    for (const r of indexes.rows) console.log(`  ${r.indexdef}`);
  } finally {
    await client.end();
  }
} finally {
  await bench.cleanup();
}
