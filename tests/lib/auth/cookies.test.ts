import { describe, expect, it } from 'vitest';
import { cookieSecure } from '../../../src/lib/auth/cookies';

describe('cookieSecure', () => {
  it('leaves Secure off only for plain http on loopback', () => {
    expect(cookieSecure('http://127.0.0.1:4321')).toBe(false);
    expect(cookieSecure('http://localhost:4321')).toBe(false);
    expect(cookieSecure('https://127.0.0.1')).toBe(true);
    expect(cookieSecure('http://kitwright.example')).toBe(true);
    expect(cookieSecure('https://kitwright.example')).toBe(true);
  });

  it('defaults to Secure when SITE_URL is missing or malformed', () => {
    expect(cookieSecure(undefined)).toBe(true);
    expect(cookieSecure('not a url')).toBe(true);
  });
});
