/**
 * What the server benchmarks share: figures printed as min / median / max against a target, the app's resident
 * memory read from /proc, and one start-up for the built app on a database (the project's PostgreSQL leased,
 * migrated, seeded, a build made when there is none), with a cleanup that runs once however the run ends (Ctrl-C
 * too). Ports: PORT (app, 4321); the project's PostgreSQL (KW_PG_PORT).
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import autocannon from 'autocannon';
import knexFactory, { type Knex } from 'knex';
import { appEnv } from '../../scripts/lib/app-env';
import { appBuild } from '../../scripts/lib/build';
import { migrateLatest, seedDemoIfEmpty } from '../../scripts/lib/migrate';
import {
  APP_DATABASE,
  PROJECT_ROOT,
  TEST_DATABASE,
  databaseEnsure,
  databaseUrl,
  postgresLease,
} from '../../scripts/lib/postgres';
import { serverStart, type RunningServer } from '../../scripts/lib/server';

export const BENCH_ROUNDS = Number(process.env.KW_BENCH_ROUNDS ?? 3);
export const BENCH_HOST = '127.0.0.1';
export const BENCH_PORT = Number(process.env.PORT ?? 4321);

/** The middle value (the mean of the two middle ones for an even count); NaN for none. */
export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  if (s.length === 0) return NaN;
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2;
}

/** The p-th percentile (0–100) of the values by the nearest-rank method; NaN for none. */
export function percentile(xs: readonly number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  if (s.length === 0) return NaN;
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))]!;
}

/**
 * A change to a reach source table that changes no row: its statement trigger still raises the reach data version,
 * so the app's cached answers over those tables are out of date (src/lib/db/reach-cache.ts).
 */
export function reachDataChange(knex: Knex, table: 'kits' | 'entries'): Promise<unknown> {
  return knex.raw('UPDATE ?? SET id = id WHERE false', [table]);
}

export interface BenchTarget {
  op: '≥' | '≤';
  value: number;
}

/** Prints one figure's min / median / max over the rounds, and whether the median meets the target. */
export function figure(name: string, xs: readonly number[], unit: string, target?: BenchTarget): void {
  const f = (x: number) => (x >= 100 ? x.toFixed(0) : x.toFixed(2)).padStart(8);
  const m = median(xs);
  const met = target && (target.op === '≥' ? m >= target.value : m <= target.value);
  console.log(
    `${name.padEnd(52)} min ${f(Math.min(...xs))}  median ${f(m)}  max ${f(Math.max(...xs))} ${unit.padEnd(6)}` +
      (target ? `  target ${target.op} ${target.value}: ${met ? 'met' : 'MISSED'}` : ''),
  );
}

/**
 * One autocannon run on a URL, for `duration` s or until `amount` requests are answered: every answer's latency
 * (ms, from autocannon's per-response event, so any percentile can be taken), the requests a second, and the
 * answers that were not 200 or failed.
 */
export async function latenciesUnderLoad(
  url: string,
  o: { connections: number; headers?: Record<string, string>; timeoutS?: number } & (
    { duration: number } | { amount: number }
  ),
) {
  const latencies: number[] = [];
  let other = 0;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const run = autocannon({ ...o, url, headers: o.headers ?? {}, timeout: o.timeoutS ?? 10 }, (err, res) =>
      err ? reject(err) : resolve(res),
    );
    run.on('response', (_client, status, _bytes, ms) => {
      latencies.push(ms);
      if (status !== 200) other += 1;
    });
  });
  return { latencies, other: other + result.errors + result.timeouts, rps: result.requests.average };
}

/** Resident memory of a process, MB (VmRSS in /proc/PID/status). */
export function rssMb(pid: number): number {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8').match(/VmRSS:\s+(\d+) kB/);
  return line ? Number(line[1]) / 1024 : NaN;
}

/** Samples the process's memory every 20 ms while `work` runs; the peak, MB. */
export async function peakRssDuring(pid: number, work: () => Promise<unknown>): Promise<number> {
  let peak = rssMb(pid);
  const timer = setInterval(() => (peak = Math.max(peak, rssMb(pid))), 20);
  try {
    await work();
  } finally {
    clearInterval(timer);
  }
  return Math.max(peak, rssMb(pid));
}

export interface BenchAppOptions {
  /** Names the server's log file, .data/bench-NAME-PORT.log. */
  name: string;
  /** The database the app runs on (default: the app database with the demo seed). */
  database?: string;
  /** Fills the database before the app starts (default: the demo seed when it has no accounts). */
  seed?: (knex: Knex) => Promise<void>;
  /** Extra environment for the app process. */
  env?: Record<string, string>;
}

export interface BenchApp {
  app: RunningServer;
  /** A small pool on the bench's database for setup and checks. */
  knex: Knex;
  dbUrl: string;
  /** Adds work for the cleanup to do first, while the pool is still open (e.g. deleting rows the bench made). */
  atCleanup(work: () => Promise<unknown>): void;
  /** Runs the added work, then stops what the start-up started (the app, the pool, the cluster when this run
   * started it), once. */
  cleanup(): Promise<void>;
}

/**
 * Leases the project's PostgreSQL, migrates and seeds the database, builds the app when KW_OUT_DIR (default dist)
 * has no build, and starts it on BENCH_HOST:BENCH_PORT. Ctrl-C or SIGTERM runs the cleanup, then exits.
 */
export async function benchAppStart(o: BenchAppOptions): Promise<BenchApp> {
  const clusterRelease = postgresLease();
  const database = o.database ?? APP_DATABASE;
  await databaseEnsure(database);
  if (database === APP_DATABASE) await databaseEnsure(TEST_DATABASE);
  const dbUrl = databaseUrl(database);
  const knex = knexFactory({ client: 'pg', connection: dbUrl, pool: { min: 0, max: 2 } });
  let app: RunningServer | undefined;
  let cleaned: Promise<void> | undefined;
  const first: (() => Promise<unknown>)[] = [];
  const cleanup = () => {
    cleaned ??= (async () => {
      for (const work of first) await work().catch((err: unknown) => console.error('bench cleanup:', err));
      await app?.stop();
      await knex.destroy();
      clusterRelease();
    })();
    return cleaned;
  };
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => {
      console.log(`\n${signal}: stopping what the bench started`);
      void cleanup().finally(() => process.exit(130));
    });
  }
  try {
    await migrateLatest(dbUrl);
    if (o.seed) await o.seed(knex);
    else await seedDemoIfEmpty(dbUrl);
    if (!existsSync(join(PROJECT_ROOT, process.env.KW_OUT_DIR ?? 'dist', 'server', 'entry.mjs'))) appBuild();
    const env = {
      ...appEnv({ databaseUrl: dbUrl, host: BENCH_HOST, port: BENCH_PORT, smtpPort: 0, mailHttpPort: 0 }),
      ...o.env,
    };
    app = await serverStart(env, { logFile: join(PROJECT_ROOT, '.data', `bench-${o.name}-${BENCH_PORT}.log`) });
    return { app, knex, dbUrl, cleanup, atCleanup: (work) => first.push(work) };
  } catch (err) {
    await cleanup();
    throw err;
  }
}
