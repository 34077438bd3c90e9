/**
 * One-time link tokens of accounts (e-mail verification, password reset). Only the SHA-256 of a token is
 * stored; a token is used at most once, and only before it expires.
 */
import type { Knex } from 'knex';
import { db } from './knex';

export type AccountTokenPurpose = 'verify_email' | 'reset_password';

/** Stores a token hash for an account, valid for the given number of seconds. */
export async function accountTokenInsert(
  userId: string,
  purpose: AccountTokenPurpose,
  tokenHash: string,
  validSeconds: number,
  trx: Knex = db(),
): Promise<void> {
  await trx('account_tokens').insert({
    user_id: userId,
    purpose,
    token_hash: tokenHash,
    expires_at: trx.raw(`now() + make_interval(secs => ?)`, [validSeconds]),
  });
}

/**
 * Marks the token used and returns its account id — atomically, so two clicks cannot both use it; null for
 * an unknown, used or expired token.
 */
export async function accountTokenConsume(
  purpose: AccountTokenPurpose,
  tokenHash: string,
  trx: Knex = db(),
): Promise<string | null> {
  const rows = await trx('account_tokens')
    .where({ purpose, token_hash: tokenHash })
    .whereNull('used_at')
    .where('expires_at', '>', trx.fn.now())
    .update({ used_at: trx.fn.now() })
    .returning('user_id');
  return (rows[0] as { user_id: string } | undefined)?.user_id ?? null;
}

/** Voids every unused token of an account for a purpose (a new reset link replaces older ones). */
export async function accountTokensVoid(userId: string, purpose: AccountTokenPurpose, trx: Knex = db()) {
  await trx('account_tokens')
    .where({ user_id: userId, purpose })
    .whereNull('used_at')
    .update({ used_at: trx.fn.now() });
}
