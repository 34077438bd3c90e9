import { describe, expect, it } from 'vitest';
import { routeMethodsAllowed, routeModulePaths, routeUrlMalformed } from '../../../src/lib/http/route-methods';

describe('routeMethodsAllowed', () => {
  it('lists the exported methods in a fixed order, with HEAD wherever GET is (RFC 9110 §9.3.2)', () => {
    expect(routeMethodsAllowed(['POST', 'GET', 'prerender'])).toEqual(['GET', 'HEAD', 'POST']);
    expect(routeMethodsAllowed(['DELETE', 'PATCH'])).toEqual(['PATCH', 'DELETE']);
    expect(routeMethodsAllowed([])).toEqual([]);
  });
});

describe('routeModulePaths', () => {
  it('maps an Astro route pattern to its two possible files', () => {
    expect(routeModulePaths('/api/kits/[id]')).toEqual(['./pages/api/kits/[id].ts', './pages/api/kits/[id]/index.ts']);
  });
});

describe('routeUrlMalformed', () => {
  // RFC 3986 §2.1: "%" must be followed by two hex digits; decodeURIComponent also needs valid UTF-8.
  it.each(['/api/health?%', '/api/health?a=%ZZ', '/api/kits?%E0%A4%A', '/api/%E0', '/api/%FF/x', '/api/x?a=1&b=%'])(
    'finds %s malformed',
    (path) => expect(routeUrlMalformed(new URL(path, 'http://127.0.0.1'))).toBe(true),
  );
  it.each(['/api/health', '/api/kits?classId=a%20b&x=%E2%82%AC', '/api/x?a+b=c+d', '/api/%2e%2e/health', '/api/a?=&&'])(
    'finds %s well formed',
    (path) => expect(routeUrlMalformed(new URL(path, 'http://127.0.0.1'))).toBe(false),
  );
});
