import { describe, expect, it } from 'vitest';
import {
  CSP_DIRECTIVES,
  CSP_SCRIPT_SOURCES,
  cspStyleHashesDropped,
  pageSecurityHeaders,
} from '../../../src/lib/http/security-headers';

// OWASP HTTP Headers Cheat Sheet and Clickjacking Defense Cheat Sheet; RFC 6797 (HSTS only over https).
describe('pageSecurityHeaders', () => {
  it('denies framing, sniffing and cross-site referrers', () => {
    expect(pageSecurityHeaders('http://127.0.0.1:4321')).toEqual({
      'x-frame-options': 'DENY',
      'x-content-type-options': 'nosniff',
      'referrer-policy': 'same-origin',
    });
  });

  it('adds HSTS only when SITE_URL is https', () => {
    expect(pageSecurityHeaders('https://kits.example.org')['strict-transport-security']).toMatch(/^max-age=31536000/);
    expect(pageSecurityHeaders(undefined)).not.toHaveProperty('strict-transport-security');
  });
});

describe('the policy', () => {
  it('never lets inline script run by keyword and forbids every frame ancestor', () => {
    expect(CSP_SCRIPT_SOURCES).not.toContain("'unsafe-inline'");
    expect(CSP_SCRIPT_SOURCES).not.toContain("'unsafe-eval'");
    expect(CSP_DIRECTIVES).toContain("frame-ancestors 'none'");
    expect(CSP_DIRECTIVES).toContain("object-src 'none'");
  });

  it('drops style hashes so unsafe-inline applies to style attributes, and keeps script hashes', () => {
    const astro =
      "default-src 'self'; script-src 'self' 'sha256-AAA='; style-src 'self' 'unsafe-inline' 'sha256-BBB=' 'sha384-CCC=';";
    expect(cspStyleHashesDropped(astro)).toBe(
      "default-src 'self'; script-src 'self' 'sha256-AAA='; style-src 'self' 'unsafe-inline';",
    );
  });
});
