import { describe, expect, it } from 'vitest';
import { passwordHash, passwordVerify } from '../../../src/lib/auth/password';

describe('passwordHash', () => {
  it('writes an argon2id PHC string at 19 MiB, 2 iterations, 1 lane', async () => {
    // OWASP Password Storage Cheat Sheet, argon2id: m = 19456 KiB (19 MiB), t = 2, p = 1.
    // PHC string format (P-H-C/phc-string-format): $argon2id$v=19$m=…,t=…,p=…$salt$hash.
    const phc = await passwordHash('a long enough passphrase');
    expect(phc).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$[A-Za-z0-9+/]+\$[A-Za-z0-9+/]+$/);
  });

  it('salts each hash, so the same password hashes differently', async () => {
    expect(await passwordHash('same password twice')).not.toBe(await passwordHash('same password twice'));
  });
});

describe('passwordVerify', () => {
  it('accepts the right password, refuses a wrong one, and returns false for a malformed hash', async () => {
    const phc = await passwordHash('the right password');
    expect(await passwordVerify(phc, 'the right password')).toBe(true);
    expect(await passwordVerify(phc, 'the wrong password')).toBe(false);
    expect(await passwordVerify('not a hash', 'anything')).toBe(false);
  });
});
