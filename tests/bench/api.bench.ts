/**
 * `npm run bench:api`: the built app (src/server/serve.ts, on the demo database) against a bare node:http + pg
 * server doing the same queries (tests/bench/api-baseline.ts), with autocannon on loopback, 20 connections,
 * the two alternating within each of ROUNDS rounds. Prints min / median / max over the rounds of:
 * GET /api/health and a teacher's GET /api/kits (req/s, app ÷ baseline), GET /api/health p99 while four clients
 * build uncached kit PDFs, and the anonymous GET /tools/scale (req/s). Checks the issue-16 targets without
 * failing: ratios ≥ 0.6, health p99 ≤ 25 ms under builds, /tools/scale ≥ 500 req/s.
 *
 * Builds the app when KW_OUT_DIR (default dist) has no build; run `npm run build` first after changing code.
 * Ports: PORT (app, 4321) and KW_BENCH_BASELINE_PORT (baseline, 4323); the project's PostgreSQL (KW_PG_PORT).
 */
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { PROJECT_ROOT } from '../../scripts/lib/postgres';
import { SKEIN_KIT_INPUTS } from '../fixtures/kit-settings';
import { userSessionCookie } from '../api/auth-helpers';
import { BENCH_HOST as host, BENCH_ROUNDS as ROUNDS, benchAppStart, figure } from './bench-harness';

const SECONDS = Number(process.env.KW_BENCH_SECONDS ?? 5);
const CONNECTIONS = 20;
const BUILDERS = 4;
const baselinePort = Number(process.env.KW_BENCH_BASELINE_PORT ?? 4323);

async function load(url: string, headers: Record<string, string> = {}) {
  const result = await autocannon({ url, connections: CONNECTIONS, duration: SECONDS, headers });
  const bad = result.non2xx + result.errors + result.timeouts;
  if (bad > 0) console.log(`  (${url}: ${bad} answers not 2xx or failed)`);
  return { rps: result.requests.average, p99: result.latency.p99 };
}

/** Four clients each building uncached kit PDFs back to back (own titles defeat the cache) until stopped. */
function buildersRun(base: string, cookie: string) {
  let running = true;
  const counts = { built: 0, busy: 0, other: 0 };
  const client = async (n: number) => {
    for (let i = 0; running; i += 1) {
      const res = await fetch(`${base}/api/kits/preview-file`, {
        method: 'POST',
        headers: { cookie, origin: base, 'content-type': 'application/json' },
        body: JSON.stringify({
          output: 'pdf',
          inputs: { ...SKEIN_KIT_INPUTS, title: `Bench ${n}-${i}-${Date.now()}` },
        }),
      });
      await res.arrayBuffer();
      if (res.status === 200) counts.built += 1;
      else if (res.status === 503) counts.busy += 1;
      else counts.other += 1;
    }
  };
  const done = Promise.all(Array.from({ length: BUILDERS }, (_, n) => client(n)));
  return {
    counts,
    stop: async () => {
      running = false;
      await done;
    },
  };
}

const bench = await benchAppStart({ name: 'api' });
const { app, knex } = bench;
// The demo teacher with the most kits, signed in through a fresh session row.
const teacher = (await knex('kits')
  .join('classes', 'classes.id', 'kits.class_id')
  .groupBy('classes.teacher_id')
  .select('classes.teacher_id')
  .count('* as kits')
  .orderBy('kits', 'desc')
  .first()) as { teacher_id: string; kits: string };
const cookie = await userSessionCookie(knex, teacher.teacher_id);

const baseline = spawn(process.execPath, ['--import', 'tsx', join(PROJECT_ROOT, 'tests/bench/api-baseline.ts')], {
  env: { ...process.env, DATABASE_URL: bench.dbUrl, PORT: String(baselinePort) },
  stdio: ['ignore', 'pipe', 'inherit'],
});
await new Promise<void>((resolve) => baseline.stdout!.once('data', () => resolve()));
const baseUrl = `http://${host}:${baselinePort}`;

try {
  console.log(
    `bench:api — ${ROUNDS} rounds × ${SECONDS} s per figure, ${CONNECTIONS} connections; teacher with ${teacher.kits} kits`,
  );
  // Warm-up: JIT, connection pools, the scale page's cache.
  await load(`${app.url}/api/health`);
  await load(`${baseUrl}/api/health`);
  await load(`${app.url}/tools/scale`);

  const fig = { health: [] as number[], healthApp: [] as number[], healthBase: [] as number[] };
  const kits = { ratio: [] as number[], app: [] as number[], base: [] as number[] };
  const underBuilds = { p99: [] as number[], rps: [] as number[], built: [] as number[], busy: [] as number[] };
  const scale = [] as number[];
  for (let round = 0; round < ROUNDS; round += 1) {
    const a = await load(`${app.url}/api/health`);
    const b = await load(`${baseUrl}/api/health`);
    fig.healthApp.push(a.rps);
    fig.healthBase.push(b.rps);
    fig.health.push(a.rps / b.rps);
    const ka = await load(`${app.url}/api/kits`, { cookie });
    const kb = await load(`${baseUrl}/api/kits`, { cookie });
    kits.app.push(ka.rps);
    kits.base.push(kb.rps);
    kits.ratio.push(ka.rps / kb.rps);
    const builders = buildersRun(app.url, cookie);
    await new Promise((r) => setTimeout(r, 1000));
    const h = await load(`${app.url}/api/health`);
    await builders.stop();
    underBuilds.p99.push(h.p99);
    underBuilds.rps.push(h.rps);
    underBuilds.built.push(builders.counts.built);
    underBuilds.busy.push(builders.counts.busy);
    if (builders.counts.other > 0) console.log(`  (${builders.counts.other} builds failed)`);
    scale.push((await load(`${app.url}/tools/scale`)).rps);
  }
  console.log('');
  figure('GET /api/health app req/s', fig.healthApp, 'req/s');
  figure('GET /api/health baseline req/s', fig.healthBase, 'req/s');
  figure('GET /api/health app ÷ baseline', fig.health, '', { op: '≥', value: 0.6 });
  figure('GET /api/kits (teacher) app req/s', kits.app, 'req/s');
  figure('GET /api/kits (teacher) baseline req/s', kits.base, 'req/s');
  figure('GET /api/kits (teacher) app ÷ baseline', kits.ratio, '', { op: '≥', value: 0.6 });
  figure(`GET /api/health p99 while ${BUILDERS} clients build`, underBuilds.p99, 'ms', { op: '≤', value: 25 });
  figure(`GET /api/health req/s while ${BUILDERS} clients build`, underBuilds.rps, 'req/s');
  figure(`kit PDFs built in those ${SECONDS} s (+1 s lead)`, underBuilds.built, 'PDFs');
  figure('kit builds refused busy (503) meanwhile', underBuilds.busy, '');
  figure('GET /tools/scale (anonymous) req/s', scale, 'req/s', { op: '≥', value: 500 });
} finally {
  baseline.kill('SIGTERM');
  await bench.cleanup();
}
