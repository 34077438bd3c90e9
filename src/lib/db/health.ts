/**
 * A real database round trip for the health check: one constant query, sent by the driver on a connection of the
 * app's pool. Monitors call the check often, also when the server is busy, so it skips knex's query builder and
 * runner, which cost about as much as the round trip itself.
 */
import type { PoolClient } from 'pg';
import { db } from './knex';

export interface DatabaseHealth {
  ok: boolean;
  latencyMs: number;
  serverVersion?: string;
  error?: string;
}

/** Runs one query and times it; never throws. */
export async function databaseHealth(): Promise<DatabaseHealth> {
  const started = performance.now();
  try {
    const pool = db().client;
    const connection = (await pool.acquireConnection()) as PoolClient;
    let result;
    try {
      result = await connection.query<{ version: string }>("SELECT current_setting('server_version') AS version");
    } finally {
      await pool.releaseConnection(connection);
    }
    return {
      ok: true,
      latencyMs: Math.round((performance.now() - started) * 10) / 10,
      serverVersion: result.rows[0]?.version,
    };
  } catch (err) {
    return {
      ok: false,
      latencyMs: Math.round(performance.now() - started),
      error: err instanceof Error ? err.message : String(err),
    };
  }
}
