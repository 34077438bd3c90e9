/** Applies the escalating sign-in lockout of sign-in-lockout.ts with the sign_in_lockouts rows. */
import { signInFailureRecord, signInLockoutClear, signInLockRemainingSeconds } from '../db/sign-in-lockouts';
import { RateLimitError } from '../errors';
import { signInLockMessage, signInLockSeconds } from './sign-in-lockout';

/** Throws a 429 with Retry-After while the address is locked; checked before the password is. */
export async function signInLockEnforce(email: string): Promise<void> {
  const seconds = await signInLockRemainingSeconds(email);
  if (seconds > 0) throw new RateLimitError(signInLockMessage(seconds), seconds);
}

/** Counts a wrong password for the address, locking it once the free failures are used up. */
export async function signInFailureCount(email: string): Promise<void> {
  await signInFailureRecord(email, signInLockSeconds);
}

/** Ends the address's lock and failure count: a correct sign-in or a completed reset-by-mail. */
export const signInLockEnd = signInLockoutClear;
