/** Enforces the abuse limits of rate-limit-rules.ts with the PostgreSQL counters. */
import { RateLimitError } from '../errors';
import { rateLimitClear, rateLimitCount } from '../db/rate-limits';
import type { RateLimitRule } from './rate-limit-rules';

/** Counts one attempt of the subject (an address, e-mail or code) and throws a 429 when over the limit. */
export async function rateLimitEnforce(rule: RateLimitRule, subject: string): Promise<void> {
  const { attempts, resetInSeconds } = await rateLimitCount(`${rule.name}:${subject}`, rule.windowSeconds);
  if (attempts > rule.max) {
    const wait = Math.max(1, Math.ceil(resetInSeconds));
    throw new RateLimitError(
      `Too many attempts. Wait ${wait < 120 ? `${wait} seconds` : `${Math.ceil(wait / 60)} minutes`} and try again.`,
      wait,
    );
  }
}

/** Starts the subject's count again (after a successful sign-in). */
export function rateLimitReset(rule: RateLimitRule, subject: string): Promise<void> {
  return rateLimitClear(`${rule.name}:${subject}`);
}
