/** The sign_in_lockouts rows: consecutive wrong passwords per address and the lock they earned. */
import type { Knex } from 'knex';
import { db } from './knex';

/** Seconds until the address may try again; 0 when it is not locked. */
export async function signInLockRemainingSeconds(email: string, trx: Knex = db()): Promise<number> {
  const row = await trx('sign_in_lockouts')
    .where({ email })
    .andWhere('locked_until', '>', trx.fn.now())
    .first(trx.raw('EXTRACT(EPOCH FROM (locked_until - now())) AS remaining'));
  return row ? Math.max(1, Math.ceil(Number(row.remaining))) : 0;
}

/**
 * Counts one more wrong password for the address and locks it for lockSeconds(failures) from now (nothing when
 * that is 0); returns the failures so far. One atomic upsert, so parallel guesses all count.
 */
export async function signInFailureRecord(
  email: string,
  lockSeconds: (failures: number) => number,
  trx: Knex = db(),
): Promise<number> {
  const result = await trx.raw<{ rows: { failures: number }[] }>(
    `INSERT INTO sign_in_lockouts AS l (email, failures, updated_at) VALUES (:email, 1, now())
     ON CONFLICT (email) DO UPDATE SET failures = l.failures + 1, updated_at = now()
     RETURNING failures`,
    { email },
  );
  const failures = result.rows[0]!.failures;
  const seconds = lockSeconds(failures);
  if (seconds > 0) {
    await trx('sign_in_lockouts')
      .where({ email })
      .update({ locked_until: trx.raw('now() + make_interval(secs => ?)', [seconds]) });
  }
  return failures;
}

/** Ends the address's failures and lock (a correct sign-in, a completed reset-by-mail). */
export async function signInLockoutClear(email: string, trx: Knex = db()): Promise<void> {
  await trx('sign_in_lockouts').where({ email }).delete();
}

/** Deletes rows idle longer than idleSeconds whose lock (if any) has ended; returns how many went. */
export async function signInLockoutPrune(idleSeconds: number, trx: Knex = db()): Promise<number> {
  return trx('sign_in_lockouts')
    .where('updated_at', '<', trx.raw('now() - make_interval(secs => ?)', [idleSeconds]))
    .andWhere((q) => q.whereNull('locked_until').orWhere('locked_until', '<=', trx.fn.now()))
    .delete();
}
