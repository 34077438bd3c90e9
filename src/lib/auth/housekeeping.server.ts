/**
 * Deletes expired account sessions, class sessions, old rate-limit counters and long-idle sign-in lockout rows
 * (sign-in-lockout.ts) now and then, so the tables
 * stay small without a scheduler: about one sign-in or join in HOUSEKEEPING_EVERY runs it, in the background.
 */
import { db } from '../db/knex';
import { rateLimitPrune } from '../db/rate-limits';
import { signInLockoutPrune } from '../db/sign-in-lockouts';
import { SIGN_IN_LOCKOUT_FORGET_SECONDS } from './sign-in-lockout';
import { lucia } from './lucia.server';

const HOUSEKEEPING_EVERY = 200;
/** Counters older than a day are past every window of rate-limit-rules.ts. */
const COUNTER_MAX_AGE_SECONDS = 86_400;

/**
 * Runs the clean-up with probability 1/HOUSEKEEPING_EVERY without delaying the caller (which ignores the
 * returned promise; tests await it). Never rejects; null when it did not run.
 */
export function housekeepingMaybe(requestId: string, random: () => number = Math.random): Promise<void> | null {
  if (random() * HOUSEKEEPING_EVERY >= 1) return null;
  return (async () => {
    await lucia().deleteExpiredSessions();
    await db()('class_sessions').where('expires_at', '<=', db().fn.now()).delete();
    await rateLimitPrune(COUNTER_MAX_AGE_SECONDS);
    await signInLockoutPrune(SIGN_IN_LOCKOUT_FORGET_SECONDS);
  })().catch((err: unknown) => console.error(`[${requestId}] housekeeping failed`, err));
}
