/**
 * `npm run bench:links`: GET /go/CODE on the built app (src/server/serve.ts, on the demo database) with autocannon
 * on loopback, 50 connections, ROUNDS runs of about SECONDS s each. Prints min / median / max over the runs of the
 * redirects a second and the p99 latency against the issue-13 targets (≥ 2,000 redirects/s, p99 ≤ 20 ms), without
 * failing, and checks after each run that the scans the database counted for the code equal the 302 answers
 * received. A run is a fixed number of requests (the warm-up's rate × SECONDS), not a fixed time, so no request is
 * cut off in flight: a request cut off would count a scan whose 302 nobody received.
 *
 * The link is made for the run and deleted with its scans at the end. Stops what it started (the app, and the
 * project's PostgreSQL unless it was already running), on Ctrl-C too.
 * Builds the app when KW_OUT_DIR (default dist) has no build; run `npm run build` first after changing code.
 * Ports: PORT (app, 4321); the project's PostgreSQL (KW_PG_PORT).
 */
import autocannon from 'autocannon';
import { linkCodeNew } from '../../src/lib/links/link-code';
import { BENCH_ROUNDS as ROUNDS, benchAppStart, figure } from './bench-harness';

const SECONDS = Number(process.env.KW_BENCH_SECONDS ?? 10);
const WARMUP_SECONDS = 3;
const CONNECTIONS = 50;
const TARGET = { redirectsPerS: 2000, p99Ms: 20 };

const bench = await benchAppStart({ name: 'links' });
const { knex } = bench;
let linkId: string | undefined;
bench.atCleanup(async () => linkId && (await knex('live_links').where({ id: linkId }).delete()));

/** The scans counted for the bench's link so far. */
async function scansCounted(): Promise<number> {
  const row = await knex('live_link_scans').where({ link_id: linkId }).sum({ n: 'count' }).first();
  return Number(row?.n ?? 0);
}

/**
 * The scans once the server has finished: a run stopped by time leaves requests in flight that the server still
 * answers (and counts) after autocannon has gone, so read until two reads 200 ms apart agree.
 */
async function scansSettled(): Promise<number> {
  for (let last = -1; ;) {
    const now = await scansCounted();
    if (now === last) return now;
    last = now;
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** One autocannon run on /go/CODE, by time (warm-up) or by a number of requests. */
async function load(url: string, run: { duration: number } | { amount: number }) {
  // A 50 ms sample interval: a run by number of requests ends at the first sample after its last answer.
  const result = await autocannon({ url, connections: CONNECTIONS, sampleInt: 50, ...run });
  const redirects = result.statusCodeStats?.['302']?.count ?? 0;
  const other = result.requests.total - redirects;
  return { result, redirects, other, seconds: result.duration };
}

try {
  const code = linkCodeNew();
  [{ id: linkId }] = await knex('live_links')
    .insert({ code, title: 'bench:links (deleted after the run)', target_url: '/activities' })
    .returning('id');
  const url = `${bench.app.url}/go/${code}`;

  console.log(
    `bench:links — GET /go/${code}, ${CONNECTIONS} connections, ${ROUNDS} runs of ~${SECONDS} s, autocannon on loopback`,
  );
  // Warm-up: the first for JIT and the connection pool, the second's rate sizes the runs.
  await load(url, { duration: WARMUP_SECONDS });
  const warm = await load(url, { duration: WARMUP_SECONDS });
  const amount = Math.max(CONNECTIONS, Math.round((warm.redirects / warm.seconds) * SECONDS));
  const fig = { rps: [] as number[], p99: [] as number[] };
  let exact = true;
  for (let round = 1; round <= ROUNDS; round += 1) {
    const before = await scansSettled();
    const run = await load(url, { amount });
    const counted = (await scansSettled()) - before;
    fig.rps.push(run.redirects / run.seconds);
    fig.p99.push(run.result.latency.p99);
    exact &&= counted === run.redirects && run.other === 0;
    console.log(
      `  run ${round}: ${run.redirects} redirects in ${run.seconds.toFixed(2)} s, ${run.other} other answers or ` +
        `errors; scans counted ${counted}: ${counted === run.redirects ? 'equal' : 'DIFFERENT'}`,
    );
  }
  console.log('');
  figure('GET /go/CODE redirects/s', fig.rps, 'req/s', { op: '≥', value: TARGET.redirectsPerS });
  figure('GET /go/CODE p99 latency', fig.p99, 'ms', { op: '≤', value: TARGET.p99Ms });
  console.log(`scans counted = 302 answers in every run: ${exact ? 'yes' : 'NO'}`);
  if (!exact) process.exitCode = 1;
} finally {
  await bench.cleanup();
}
