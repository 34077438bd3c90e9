/**
 * Applies the escalating sign-in lockout of sign-in-lockout.ts with the sign_in_lockouts rows, to every check of
 * an account's password (passwordCheckLocked): sign-in, and the current password of a password change, which a
 * stolen or forgotten-open session could otherwise use to guess at the flat rate the lockout exists to end.
 */
import { signInFailureRecord, signInLockoutClear, signInLockRemainingSeconds } from '../db/sign-in-lockouts';
import { RateLimitError } from '../errors';
import { signInLockMessage, signInLockSeconds } from './sign-in-lockout';
import { signInCheck, type SignInCheck } from './sign-in.server';

/** Throws a 429 with Retry-After while the address is locked; checked before the password is. */
async function signInLockEnforce(email: string): Promise<void> {
  const seconds = await signInLockRemainingSeconds(email);
  if (seconds > 0) throw new RateLimitError(signInLockMessage(seconds), seconds);
}

/** Counts a wrong password for the address, locking it once the free failures are used up. */
async function signInFailureCount(email: string): Promise<void> {
  await signInFailureRecord(email, signInLockSeconds);
}

/** Ends the address's lock and failure count: a correct sign-in or a completed reset-by-mail. */
export const signInLockEnd = signInLockoutClear;

/**
 * Checks an e-mail and password under the lockout: 429 while the address is locked (before any hashing), a wrong
 * password counted toward the next lock, a correct one for an account that may sign in ending the count.
 */
export async function passwordCheckLocked(email: string, password: string): Promise<SignInCheck> {
  await signInLockEnforce(email);
  const check = await signInCheck(email, password);
  if (!check.ok && check.reason === 'credentials') await signInFailureCount(email);
  if (check.ok) await signInLockEnd(email);
  return check;
}
