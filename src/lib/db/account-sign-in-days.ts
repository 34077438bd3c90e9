/** The days each account signed in (UTC dates), for the "active teachers" reach figure. */
import type { Knex } from 'knex';
import { db } from './knex';

/** Notes that the account signed in today (UTC); a second sign-in the same day changes nothing. */
export async function accountSignInDayRecord(userId: string, trx: Knex = db()): Promise<void> {
  await trx.raw(
    `INSERT INTO account_sign_in_days (user_id, day) VALUES (?, (now() AT TIME ZONE 'UTC')::date)
     ON CONFLICT DO NOTHING`,
    [userId],
  );
}
