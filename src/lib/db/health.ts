/** A real database round trip for the health check. */
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
    const result = await db().raw<{ rows: { version: string }[] }>(
      "SELECT current_setting('server_version') AS version",
    );
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
