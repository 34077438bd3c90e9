/**
 * The escalating per-account sign-in lockout: after SIGN_IN_FREE_FAILURES wrong passwords in a row, every
 * further wrong one locks the account's sign-in for twice as long as the last, from one minute up to a day.
 * That leaves about 20 guesses a day per account instead of the 14,400 a flat 10-a-minute limit allows, while a
 * teacher who mistypes a few times never meets it. A correct sign-in or a completed reset-by-mail ends it
 * (the mailed link proves the owner, so it is the way out of a lock). Keyed by the lower-cased e-mail address
 * whether or not an account has it, so the lock reveals nothing about which addresses exist.
 * NIST SP 800-63B-4 §3.2.2 (rate limiting): at most 100 consecutive failed attempts on one account; the lock
 * durations here are common practice, no source.
 */

/** Wrong passwords in a row before the first lock. */
export const SIGN_IN_FREE_FAILURES = 10;
/** The first lock, seconds; each further failure doubles it. */
export const SIGN_IN_FIRST_LOCK_SECONDS = 60;
/** The longest lock, seconds (a day): a reset-by-mail ends it at once. */
export const SIGN_IN_LONGEST_LOCK_SECONDS = 24 * 60 * 60;

/**
 * A row with no wrong password for this long, and no lock still running, is forgotten by housekeeping: the table
 * keeps only addresses guessed at lately. A week is seven times the longest lock. // common practice, no source
 */
export const SIGN_IN_LOCKOUT_FORGET_SECONDS = 7 * 24 * 60 * 60;

/** How long sign-in stays locked after the given count of consecutive failures (0: not locked). */
export function signInLockSeconds(failures: number): number {
  if (failures < SIGN_IN_FREE_FAILURES) return 0;
  const doublings = failures - SIGN_IN_FREE_FAILURES;
  // 2^doublings overflows nothing here: the cap is reached after 11 doublings.
  return Math.min(SIGN_IN_LONGEST_LOCK_SECONDS, SIGN_IN_FIRST_LOCK_SECONDS * 2 ** Math.min(doublings, 30));
}

/** The message of a 429 for a locked account, with the wait in words. */
export function signInLockMessage(waitSeconds: number): string {
  const wait =
    waitSeconds < 120
      ? `${waitSeconds} seconds`
      : waitSeconds < 2 * 3600
        ? `${Math.ceil(waitSeconds / 60)} minutes`
        : `${Math.ceil(waitSeconds / 3600)} hours`;
  return (
    `Sign-in for this address is paused for ${wait} after too many wrong passwords. ` +
    'Reset your password by e-mail to sign in now.'
  );
}
