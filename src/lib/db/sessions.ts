/** Queries on user_sessions beyond what lucia's adapter does itself. */
import type { Knex } from 'knex';
import { db } from './knex';

/** Deletes every session of an account except the one given (null: all of them); returns how many. */
export async function sessionsEndForAccount(userId: string, exceptSessionId: string | null, trx: Knex = db()) {
  const query = trx('user_sessions').where({ user_id: userId });
  if (exceptSessionId) query.whereNot({ id: exceptSessionId });
  return query.delete();
}

/** Number of live sessions of an account (the account page shows it). */
export async function sessionsCountForAccount(userId: string, trx: Knex = db()): Promise<number> {
  const row = await trx('user_sessions')
    .where({ user_id: userId })
    .where('expires_at', '>', trx.fn.now())
    .count<{ count: string }[]>('* as count')
    .first();
  return Number(row?.count ?? 0);
}
