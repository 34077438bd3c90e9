/**
 * The cross-site request check, against OWASP's Cross-Site Request Forgery Prevention Cheat Sheet: sections
 * "Verifying Origin With Standard Headers" (compare the Origin header with the target origin; `Origin: null` is
 * not trustworthy) and "Fetch Metadata headers" (Sec-Fetch-Site: allow same-origin and none, refuse cross-site),
 * and the Fetch Standard's list of Sec-Fetch-Site values (same-origin, same-site, cross-site, none).
 */
import { describe, expect, it } from 'vitest';
import {
  ORIGIN_LOOPBACK_HOSTNAMES,
  originAllowed,
  originAllowedHostnames,
  originVerdict,
} from '../../../src/lib/http/origin-check';

const OWN = new URL('http://127.0.0.1:4342/api/classes');
const HOSTNAMES = originAllowedHostnames('https://kits.example.org');

function req(method: string, headers: Record<string, string> = {}, url = OWN) {
  return { method, url, headers: new Headers(headers) };
}

describe('originAllowedHostnames', () => {
  it('trusts only the hostname of a deployment’s SITE_URL, not loopback', () => {
    expect(originAllowedHostnames('https://kits.example.org:8443/base')).toEqual(['kits.example.org']);
  });

  it('trusts the loopback names on a local run (loopback SITE_URL)', () => {
    expect(originAllowedHostnames('http://localhost:4321')).toEqual([...ORIGIN_LOOPBACK_HOSTNAMES]);
  });

  it('adds nothing for a missing or empty SITE_URL, as site-url.ts ignores an empty one', () => {
    expect(originAllowedHostnames(undefined)).toEqual([...ORIGIN_LOOPBACK_HOSTNAMES]);
    expect(originAllowedHostnames('')).toEqual([...ORIGIN_LOOPBACK_HOSTNAMES]);
  });

  it('does not repeat a loopback SITE_URL', () => {
    expect(originAllowedHostnames('http://127.0.0.1:4321')).toEqual(['127.0.0.1', 'localhost']);
  });

  it('says what is wrong with a SITE_URL that is not a URL', () => {
    expect(() => originAllowedHostnames('kits.example.org')).toThrow(
      /SITE_URL "kits.example.org" is not an absolute URL/,
    );
  });
});

describe('originVerdict', () => {
  it('lets safe methods through whatever their headers say', () => {
    // OWASP CSRF cheat sheet: safe methods must not change state, so they need no check.
    for (const method of ['GET', 'HEAD', 'OPTIONS', 'get']) {
      expect(originAllowed(req(method, { origin: 'https://evil.example', cookie: 'a=1' }), HOSTNAMES)).toBe(true);
    }
  });

  it('allows an unsafe request whose Origin is the request’s own host', () => {
    for (const method of ['POST', 'PUT', 'PATCH', 'DELETE']) {
      expect(originVerdict(req(method, { origin: 'http://127.0.0.1:4342', cookie: 'a=1' }), HOSTNAMES)).toEqual({
        allowed: true,
      });
    }
  });

  it('compares host and port but not the scheme, so a TLS-ending proxy keeps same-site posts working', () => {
    const own = new URL('http://app.internal.example:8080/api/x');
    expect(originAllowed(req('POST', { origin: 'https://app.internal.example:8080' }, own), [])).toBe(true);
    expect(originAllowed(req('POST', { origin: 'http://app.internal.example:8081' }, own), [])).toBe(false);
  });

  it('allows an Origin whose hostname is SITE_URL’s host, on any port', () => {
    const own = new URL('http://127.0.0.1:4321/api/x');
    expect(originAllowed(req('POST', { origin: 'https://kits.example.org' }, own), HOSTNAMES)).toBe(true);
    expect(originAllowed(req('POST', { origin: 'https://KITS.example.org:8443' }, own), HOSTNAMES)).toBe(true);
  });

  it('allows loopback Origins on any port on a local run only', () => {
    const own = new URL('http://127.0.0.1:4321/api/x');
    const local = originAllowedHostnames('http://127.0.0.1:4321');
    expect(originAllowed(req('POST', { origin: 'http://localhost:4321' }, own), local)).toBe(true);
    expect(originAllowed(req('POST', { origin: 'http://127.0.0.1:5173' }, own), local)).toBe(true);
    // A deployment: another local port of the server's machine is another site.
    expect(originAllowed(req('POST', { origin: 'http://localhost:4321' }, own), HOSTNAMES)).toBe(false);
    expect(originAllowed(req('POST', { origin: 'http://127.0.0.1:5173' }, own), HOSTNAMES)).toBe(false);
  });

  it('refuses a foreign Origin even when Sec-Fetch-Site claims same-origin', () => {
    // OWASP "Verifying Origin With Standard Headers": the Origin header decides when it is present.
    const verdict = originVerdict(
      req('POST', { origin: 'https://evil.example', 'sec-fetch-site': 'same-origin' }),
      HOSTNAMES,
    );
    expect(verdict).toEqual({ allowed: false, received: 'Origin: https://evil.example' });
  });

  it('refuses look-alike hosts that only start or end like an allowed one', () => {
    for (const origin of [
      'https://kits.example.org.evil.example',
      'https://evil-kits.example.org',
      'http://127.0.0.1.evil.example',
    ]) {
      expect(originAllowed(req('POST', { origin }), HOSTNAMES)).toBe(false);
    }
  });

  it('refuses Origin: null, an empty Origin, a non-web scheme and a malformed one', () => {
    // OWASP CSRF cheat sheet: an opaque ("null") origin cannot be matched to the target origin.
    for (const origin of ['null', '', 'file://', 'chrome-extension://abc', 'not a url']) {
      expect(originAllowed(req('POST', { origin }), HOSTNAMES)).toBe(false);
    }
    expect(originVerdict(req('POST', { origin: '' }), HOSTNAMES)).toEqual({
      allowed: false,
      received: 'Origin: (empty)',
    });
  });

  it('falls back to Sec-Fetch-Site without Origin: same-origin and none pass, same-site and cross-site do not', () => {
    // OWASP CSRF cheat sheet, "Fetch Metadata headers"; values from the Fetch Metadata Request Headers spec.
    const verdict = (site: string) => originVerdict(req('POST', { 'sec-fetch-site': site, cookie: 'a=1' }), HOSTNAMES);
    expect(verdict('same-origin').allowed).toBe(true);
    expect(verdict('none').allowed).toBe(true);
    expect(verdict('Same-Origin').allowed).toBe(true);
    expect(verdict('same-site')).toEqual({ allowed: false, received: 'Sec-Fetch-Site: same-site' });
    expect(verdict('cross-site')).toEqual({ allowed: false, received: 'Sec-Fetch-Site: cross-site' });
    expect(verdict('something-new').allowed).toBe(false);
  });

  it('allows a request with neither header only when it carries no cookie', () => {
    // A forged request rides on the victim's cookies (OWASP CSRF cheat sheet, introduction); without cookies
    // there is no session to abuse. from memory: Go 1.25's net/http CrossOriginProtection allows every request
    // with neither header; this check is stricter for cookie-bearing ones.
    expect(originVerdict(req('POST', { 'content-type': 'application/json' }), HOSTNAMES)).toEqual({ allowed: true });
    expect(originVerdict(req('DELETE', { cookie: 'kw_session=abc' }), HOSTNAMES)).toEqual({
      allowed: false,
      received: 'cookies without an Origin or Sec-Fetch-Site header',
    });
  });

  it('treats an unknown unsafe method like POST', () => {
    expect(originAllowed(req('PROPFIND', { origin: 'https://evil.example' }), HOSTNAMES)).toBe(false);
  });
});
