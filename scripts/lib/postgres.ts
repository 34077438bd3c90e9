/**
 * The project's own PostgreSQL: a cluster from Debian's packages in a project-local folder, listening on
 * 127.0.0.1 only, started as the `postgres` system user when we run as root (the server refuses root).
 * When DATABASE_URL is set nothing here runs: that server is used as it is.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, chownSync, chmodSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { tmpdir } from 'node:os';
import pg from 'pg';
import { aptInstall } from './apt';

export const PROJECT_ROOT = resolve(dirname(new URL(import.meta.url).pathname), '..', '..');
const PG_BIN = process.env.KW_PG_BIN ?? '/usr/lib/postgresql/15/bin';
export const PG_PORT = Number(process.env.KW_PG_PORT ?? 54329);
export const APP_DATABASE = 'kitwright';
export const TEST_DATABASE = process.env.KW_TEST_DATABASE ?? 'kitwright_test';

const isRoot = process.getuid?.() === 0;

/** The cluster folder: .data/pg in the project, or under the temp folder when `postgres` cannot reach it. */
export function clusterDir(): string {
  if (process.env.KW_PG_DATA) return process.env.KW_PG_DATA;
  const local = join(PROJECT_ROOT, '.data', 'pg');
  if (!isRoot || postgresCanTraverse(PROJECT_ROOT)) return local;
  const hash = createHash('sha256').update(PROJECT_ROOT).digest('hex').slice(0, 12);
  return join(tmpdir(), `kitwright-pg-${hash}`);
}

function postgresCanTraverse(folder: string): boolean {
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', folder]).status === 0;
}

function asPostgres(bin: string, args: string[]): string {
  const cmd = join(PG_BIN, bin);
  const [file, argv] = isRoot ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
  const res = spawnSync(file, argv, { encoding: 'utf8' });
  if (res.status !== 0) {
    const log = join(clusterDir(), 'server.log');
    throw new Error(
      `${bin} failed (exit ${res.status}).\n${res.stderr || res.stdout}\nServer log: ${log}${existsSync(log) ? `\n--- last lines ---\n${tail(log)}` : ''}`,
    );
  }
  return res.stdout;
}

function tail(file: string, lines = 15): string {
  try {
    return readFileSync(file, 'utf8').split('\n').slice(-lines).join('\n');
  } catch {
    return '';
  }
}

/** Installs Debian's postgresql package when the server binaries are missing. */
function ensureBinaries(): void {
  if (existsSync(join(PG_BIN, 'postgres'))) return;
  console.log('[db] PostgreSQL server binaries missing: installing Debian package "postgresql"…');
  aptInstall(['postgresql']);
  if (!existsSync(join(PG_BIN, 'postgres')))
    throw new Error(`PostgreSQL installed, but ${PG_BIN}/postgres is still missing; set KW_PG_BIN.`);
}

function isRunning(dir: string): boolean {
  if (!existsSync(join(dir, 'PG_VERSION'))) return false;
  const cmd = join(PG_BIN, 'pg_ctl');
  const [file, argv] = isRoot
    ? ['runuser', ['-u', 'postgres', '--', cmd, '-D', dir, 'status']]
    : [cmd, ['-D', dir, 'status']];
  return spawnSync(file, argv).status === 0;
}

export interface EnsureOptions {
  /** fsync off: only for the throwaway test cluster, never for npm start's data. */
  fast?: boolean;
}

/** Creates (first time) and starts the cluster; a second call finds it up and does nothing. */
export function postgresEnsure(options: EnsureOptions = {}): void {
  if (process.env.DATABASE_URL) return;
  ensureBinaries();
  const dir = clusterDir();
  if (isRunning(dir)) return;
  if (!existsSync(join(dir, 'PG_VERSION'))) {
    console.log(`[db] creating a PostgreSQL cluster in ${dir}`);
    mkdirSync(dir, { recursive: true });
    if (isRoot) {
      const uid = Number(execFileSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).trim());
      const gid = Number(execFileSync('id', ['-g', 'postgres'], { encoding: 'utf8' }).trim());
      chownSync(dir, uid, gid);
    }
    chmodSync(dir, 0o700);
    asPostgres('initdb', ['-D', dir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  }
  const serverOptions = [`-c listen_addresses=127.0.0.1`, `-p ${PG_PORT}`, `-k ${dir}`];
  if (options.fast) serverOptions.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
  console.log(`[db] starting PostgreSQL on 127.0.0.1:${PG_PORT}`);
  asPostgres('pg_ctl', [
    '-D',
    dir,
    '-l',
    join(dir, 'server.log'),
    '-w',
    '-t',
    '60',
    '-o',
    serverOptions.join(' '),
    'start',
  ]);
}

/** True when the project cluster runs (always true with DATABASE_URL: that server is not ours to stop). */
export function postgresRunning(): boolean {
  return Boolean(process.env.DATABASE_URL) || isRunning(clusterDir());
}

/** Stops the cluster if it runs. */
export function postgresStop(): void {
  if (process.env.DATABASE_URL) return;
  const dir = clusterDir();
  if (!isRunning(dir)) {
    console.log('[db] PostgreSQL is not running.');
    return;
  }
  asPostgres('pg_ctl', ['-D', dir, '-m', 'fast', '-w', 'stop']);
  console.log('[db] PostgreSQL stopped.');
}

/**
 * Starts the cluster for one run (`npm test`) and answers how to give it back: the release stops the cluster only
 * when this call started it, so a cluster that `npm start` or another run had up stays up.
 */
export function postgresLease(options: EnsureOptions = {}): () => void {
  const wasRunning = postgresRunning();
  postgresEnsure(options);
  return () => {
    if (!wasRunning) postgresStop();
  };
}

/** Connection URL for a database on the project cluster (or DATABASE_URL's server). */
export function databaseUrl(database: string): string {
  if (process.env.DATABASE_URL) {
    const url = new URL(process.env.DATABASE_URL);
    if (database !== APP_DATABASE) url.pathname = `/${database}`;
    return url.toString();
  }
  return `postgres://postgres@127.0.0.1:${PG_PORT}/${database}`;
}

/** Creates the database when it does not exist. */
export async function databaseEnsure(database: string): Promise<void> {
  const admin = new pg.Client({ connectionString: databaseUrl('postgres') });
  await admin.connect();
  try {
    const { rowCount } = await admin.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (!rowCount) await admin.query(`CREATE DATABASE "${database.replace(/"/g, '')}"`);
  } finally {
    await admin.end();
  }
}

/** Drops and recreates the public schema of a database: a fresh, empty schema. */
export async function databaseReset(database: string): Promise<void> {
  const client = new pg.Client({ connectionString: databaseUrl(database) });
  await client.connect();
  try {
    await client.query('DROP SCHEMA IF EXISTS public CASCADE; CREATE SCHEMA public;');
  } finally {
    await client.end();
  }
}
