/**
 * Fixed-window attempt counters in PostgreSQL, so limits hold across app instances. One atomic upsert per
 * attempt: it starts a new window when the old one has ended and otherwise adds one.
 */
import type { Knex } from 'knex';
import { db } from './knex';

export interface RateLimitCount {
  attempts: number;
  /** Seconds until the current window ends. */
  resetInSeconds: number;
}

/** Counts one attempt under the key and returns the attempts so far in the current window. */
export async function rateLimitCount(key: string, windowSeconds: number, trx: Knex = db()): Promise<RateLimitCount> {
  const result = await trx.raw<{ rows: { attempts: number; reset_in: string }[] }>(
    `INSERT INTO rate_limit_counters AS c (key, window_started_at, attempts)
     VALUES (:key, now(), 1)
     ON CONFLICT (key) DO UPDATE SET
       attempts = CASE WHEN c.window_started_at <= now() - make_interval(secs => :window) THEN 1 ELSE c.attempts + 1 END,
       window_started_at = CASE WHEN c.window_started_at <= now() - make_interval(secs => :window)
         THEN now() ELSE c.window_started_at END
     RETURNING attempts,
       EXTRACT(EPOCH FROM (window_started_at + make_interval(secs => :window) - now())) AS reset_in`,
    { key, window: windowSeconds },
  );
  const row = result.rows[0]!;
  return { attempts: row.attempts, resetInSeconds: Math.max(0, Number(row.reset_in)) };
}

/** Forgets the counter of a key (after a successful sign-in the account's count starts again). */
export async function rateLimitClear(key: string, trx: Knex = db()): Promise<void> {
  await trx('rate_limit_counters').where({ key }).delete();
}

/** Deletes counters whose window ended long ago (housekeeping). */
export async function rateLimitPrune(olderThanSeconds: number, trx: Knex = db()): Promise<number> {
  return trx('rate_limit_counters')
    .where('window_started_at', '<', trx.raw(`now() - make_interval(secs => ?)`, [olderThanSeconds]))
    .delete();
}
