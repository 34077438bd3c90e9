import { describe, expect, it } from 'vitest';
import {
  clientErrorAnswer,
  rawTargetAnswer,
  rawTargetLeavesApi,
  rawTargetOriginForm,
  rawTargetUnusable,
} from '../../../src/lib/http/raw-target';

describe('rawTargetLeavesApi', () => {
  // WHATWG URL standard, path state: "%2e%2e" (any case) and ".%2e" are double-dot segments, "%2e" a single dot.
  it.each(['/api/%2e%2e/health', '/api/%2E%2E/x', '/api/.%2e/health', '/api/../tools/scale', '/api/x/../../health'])(
    '%s climbs out of /api/',
    (target) => expect(rawTargetLeavesApi(target)).toBe(true),
  );

  it.each(['/api/health', '/api/%2e/health', '/api/kits/../health', '/api/health?x=..', '/tools/scale', '/api/%ZZ'])(
    '%s stays in /api/ or is not an API target',
    (target) => expect(rawTargetLeavesApi(target)).toBe(false),
  );
});

describe('the answers before Astro', () => {
  it('a climbing target is a JSON 404 naming the target', () => {
    const { status, body } = rawTargetAnswer('/api/%2e%2e/health', 'abc123');
    expect(status).toBe(404);
    const parsed = JSON.parse(body) as { error: { code: string; message: string } };
    expect(parsed.error.code).toBe('not_found');
    expect(parsed.error.message).toContain('/api/%2e%2e/health');
  });

  it('an unparsable request is a whole HTTP/1.1 answer with a JSON body of the stated length', () => {
    for (const [code, status] of [
      ['HPE_HEADER_OVERFLOW', 431],
      ['HPE_INVALID_METHOD', 400],
      [undefined, 400],
    ] as const) {
      const raw = clientErrorAnswer(code, 'abc123');
      const [head, body] = raw.split('\r\n\r\n') as [string, string];
      expect(head.split('\r\n')[0]).toMatch(new RegExp(`^HTTP/1\\.1 ${status} `));
      expect(head).toContain(`content-length: ${Buffer.byteLength(body)}`);
      expect((JSON.parse(body) as { error: { message: string } }).error.message.length).toBeGreaterThan(10);
    }
  });
});

describe('rawTargetOriginForm', () => {
  // RFC 9112 §3.2.2: absolute-form; the target's authority replaces the Host header.
  it('turns an absolute-form target into its path and host', () => {
    expect(rawTargetOriginForm('http://example.test:8080/api/health?x=1')).toEqual({
      path: '/api/health?x=1',
      host: 'example.test:8080',
    });
  });

  it.each(['/api/health', '*', 'example.test:443', 'ftp://example.test/x'])('leaves %s alone', (target) =>
    expect(rawTargetOriginForm(target)).toBeNull(),
  );

  it('answers a target that is no path with a JSON 400', () => {
    const { status, body } = rawTargetUnusable('*', 'abc123');
    expect(status).toBe(400);
    expect((JSON.parse(body) as { error: { code: string } }).error.code).toBe('invalid_input');
  });
});
