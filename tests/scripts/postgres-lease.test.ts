/**
 * `npm test` leaves the PostgreSQL cluster as it found it (README: "npm test stops everything it started, the
 * PostgreSQL cluster too unless it was already running"): scripts/test.ts holds it through postgresLease, checked
 * here on a scratch cluster of its own (a temporary folder and a free port), asking `pg_ctl status` and a client
 * connection whether it runs.
 */
import { rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

type Postgres = typeof import('../../scripts/lib/postgres');
let postgres: Postgres;
const dir = join(tmpdir(), `kitwright-pg-lease-${process.pid}-${Date.now()}`);

/** A port nothing listens on now. */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

/** True when a client can open a connection to the scratch cluster. */
async function answers(): Promise<boolean> {
  const client = new pg.Client({ connectionString: postgres.databaseUrl('postgres'), connectionTimeoutMillis: 3_000 });
  try {
    await client.connect();
    await client.query('SELECT 1');
    return true;
  } catch {
    return false;
  } finally {
    await client.end().catch(() => undefined);
  }
}

beforeAll(async () => {
  // This file runs in a process of its own (vitest's forks pool): the module reads these when it loads.
  delete process.env.DATABASE_URL;
  process.env.KW_PG_DATA = dir;
  process.env.KW_PG_PORT = String(await freePort());
  postgres = await import('../../scripts/lib/postgres');
}, 60_000);

afterAll(() => {
  postgres?.postgresStop();
  rmSync(dir, { recursive: true, force: true });
});

describe('postgresLease', () => {
  it('stops on release a cluster it started itself', { timeout: 120_000 }, async () => {
    expect(postgres.postgresRunning()).toBe(false);
    const release = postgres.postgresLease({ fast: true });
    expect(postgres.postgresRunning()).toBe(true);
    expect(await answers()).toBe(true);
    release();
    expect(postgres.postgresRunning()).toBe(false);
    expect(await answers()).toBe(false);
  });

  it('leaves running on release a cluster that was already running', { timeout: 120_000 }, async () => {
    postgres.postgresEnsure({ fast: true });
    expect(postgres.postgresRunning()).toBe(true);
    const release = postgres.postgresLease({ fast: true });
    release();
    expect(postgres.postgresRunning()).toBe(true);
    expect(await answers()).toBe(true);
  });
});
