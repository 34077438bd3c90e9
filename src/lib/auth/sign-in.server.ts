/**
 * Checks an e-mail and password. An unknown e-mail is checked against a dummy argon2id hash with the same
 * parameters, so both failures cost one verification and answer the same (OWASP Authentication Cheat Sheet,
 * "Authentication and Error Messages").
 */
import { randomBytes } from 'node:crypto';
import { accountByEmail, type AccountRow } from '../db/accounts';
import { passwordHash, passwordVerify } from './password';

let dummyHash: Promise<string> | undefined;

/** A hash of a random password nobody knows, computed once per process. */
function dummyHashGet(): Promise<string> {
  dummyHash ??= passwordHash(randomBytes(24).toString('base64url'));
  return dummyHash;
}

export type SignInCheck =
  | { ok: true; account: AccountRow }
  | { ok: false; reason: 'credentials' }
  | { ok: false; reason: 'deactivated' | 'unverified'; account: AccountRow };

/** Verifies the password of the account with this e-mail; the account states come only after a match. */
export async function signInCheck(email: string, password: string): Promise<SignInCheck> {
  const account = await accountByEmail(email);
  const phc = account?.password_hash ?? (await dummyHashGet());
  const matches = await passwordVerify(phc, password);
  if (!account || !account.password_hash || !matches) return { ok: false, reason: 'credentials' };
  if (account.deactivated_at) return { ok: false, reason: 'deactivated', account };
  if (!account.email_verified_at) return { ok: false, reason: 'unverified', account };
  return { ok: true, account };
}

/** Warms the dummy hash so the first unknown-e-mail sign-in is not slower than the rest. */
export function signInWarm(): void {
  void dummyHashGet();
}
