/**
 * Random tokens for mailed one-time links and class-session cookies: 32 bytes from the operating system's
 * CSPRNG in base64url; the database keeps only their SHA-256 (hex), so a leaked table opens nothing.
 */
import { createHash, randomBytes } from 'node:crypto';

/** SHA-256 of a token, hex. */
export function tokenHash(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A new token (43 base64url characters) and its hash. */
export function tokenNew(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: tokenHash(token) };
}
