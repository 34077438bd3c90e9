/**
 * Password hashing with argon2id at the OWASP Password Storage Cheat Sheet parameters: 19 MiB memory,
 * 2 iterations, 1 lane. Length rules follow NIST SP 800-63B-4 for a password used alone: at least 15
 * characters, at least 64 accepted, no composition rules.
 */
import { hash, verify } from '@node-rs/argon2';

/** @node-rs/argon2's Algorithm.Argon2id (a const enum, which isolated modules cannot import). */
const ARGON2ID = 2;

export { PASSWORD_MIN_LENGTH, PASSWORD_MAX_LENGTH } from './password-rules';

const ARGON2_OPTIONS = { algorithm: ARGON2ID, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

/** An argon2id PHC string for the password. */
export function passwordHash(password: string): Promise<string> {
  return hash(password, ARGON2_OPTIONS);
}

/** True when the password matches the PHC string; false for a malformed hash. */
export async function passwordVerify(phc: string, password: string): Promise<boolean> {
  try {
    return await verify(phc, password);
  } catch {
    return false;
  }
}
