import { describe, expect, it } from 'vitest';
import {
  SIGN_IN_FREE_FAILURES,
  SIGN_IN_LONGEST_LOCK_SECONDS,
  signInLockMessage,
  signInLockSeconds,
} from '../../../src/lib/auth/sign-in-lockout';

describe('signInLockSeconds', () => {
  it('locks nothing before the free failures are used up', () => {
    for (let f = 0; f < SIGN_IN_FREE_FAILURES; f += 1) expect(signInLockSeconds(f)).toBe(0);
  });

  it('doubles from one minute with each further failure, up to a day', () => {
    expect([10, 11, 12, 13, 20].map(signInLockSeconds)).toEqual([60, 120, 240, 480, 61_440]);
    expect(signInLockSeconds(21)).toBe(SIGN_IN_LONGEST_LOCK_SECONDS);
    expect(signInLockSeconds(1e9)).toBe(SIGN_IN_LONGEST_LOCK_SECONDS);
  });

  it('allows far fewer than NIST SP 800-63B-4’s 100 consecutive failures in a day', () => {
    // Guesses in 24 h for an attacker who tries again the moment each lock ends.
    let failures = 0;
    for (let t = 0; t < 86_400; failures += 1) t += signInLockSeconds(failures + 1);
    expect(failures).toBeLessThanOrEqual(25);
    expect(failures).toBeGreaterThan(SIGN_IN_FREE_FAILURES);
  });
});

describe('signInLockMessage', () => {
  it('says how long and names the way out', () => {
    expect(signInLockMessage(60)).toMatch(/paused for 60 seconds.*Reset your password by e-mail/);
    expect(signInLockMessage(480)).toMatch(/8 minutes/);
    expect(signInLockMessage(86_400)).toMatch(/24 hours/);
  });
});
