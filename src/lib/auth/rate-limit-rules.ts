/**
 * Abuse limits (fixed windows, counters in PostgreSQL). Per-account limits stop guessing one password; the
 * per-IP limits are higher because a whole school often shares one address behind its router.
 */
export interface RateLimitRule {
  /** Key prefix, e.g. "signin:account". */
  name: string;
  /** Attempts allowed in one window; the next one answers 429. */
  max: number;
  windowSeconds: number;
}

export const RATE_LIMITS = {
  /** 10 sign-ins a minute per account: the 11th answers 429. NIST SP 800-63B-4 §3.2.2 caps at 100 failures. */
  signInAccount: { name: 'signin:account', max: 10, windowSeconds: 60 },
  signInIp: { name: 'signin:ip', max: 200, windowSeconds: 15 * 60 },
  signUpEmail: { name: 'signup:email', max: 5, windowSeconds: 60 * 60 },
  signUpIp: { name: 'signup:ip', max: 50, windowSeconds: 60 * 60 },
  resetEmail: { name: 'reset:email', max: 5, windowSeconds: 60 * 60 },
  resetIp: { name: 'reset:ip', max: 50, windowSeconds: 60 * 60 },
  /** A class of 30 joining from one school address, with typos, stays well below this. */
  classCodeIp: { name: 'classcode:ip', max: 120, windowSeconds: 10 * 60 },
  /** A leaked code cannot open more than this many sessions an hour. */
  classCodeCode: { name: 'classcode:code', max: 200, windowSeconds: 60 * 60 },
  /** Guessing one-time link tokens (verification, reset, invitation) from one address. */
  tokenIp: { name: 'token:ip', max: 60, windowSeconds: 15 * 60 },
  /** Event registrations without an account from one address: a school's staff signing up stay well below it. */
  eventRegistrationIp: { name: 'eventreg:ip', max: 30, windowSeconds: 60 * 60 },
  /** Confirmation mails one address can be sent an hour, so a form cannot be used to flood someone's inbox. */
  eventRegistrationEmail: { name: 'eventreg:email', max: 5, windowSeconds: 60 * 60 },
} as const satisfies Record<string, RateLimitRule>;
