import { describe, expect, it } from 'vitest';
import pkg from '../../package.json' with { type: 'json' };
import { api, BASE_URL } from './harness';

describe('GET /api/health', () => {
  it('answers the app version and a real database round trip', async () => {
    const res = await api('/api/health');
    expect(res.status).toBe(200);
    const body = (await res.json()) as { version: string; database: { ok: boolean; serverVersion: string } };
    expect(body.version).toBe(pkg.version);
    expect(body.database.ok).toBe(true);
    expect(body.database.serverVersion).toMatch(/^15\./);
  });
});

describe('unknown API routes', () => {
  it('answer a JSON 404 for any method, never an HTML page', async () => {
    for (const method of ['GET', 'POST', 'DELETE']) {
      // A JSON body, as API clients send: Astro's origin check answers bodiless or form posts itself.
      const res = await api('/api/no-such-route/here', {
        method,
        headers: { origin: BASE_URL, 'content-type': 'application/json' },
        ...(method === 'GET' ? {} : { body: '{}' }),
      });
      expect(res.status).toBe(404);
      expect(res.headers.get('content-type')).toContain('application/json');
      const body = (await res.json()) as { error: { code: string; message: string } };
      expect(body.error.code).toBe('not_found');
      expect(body.error.message).toContain('/api/no-such-route/here');
    }
  });
});

describe('unexpected errors', () => {
  it('answer JSON 500 with a request id that is also in the server log', async () => {
    const res = await api('/api/test/fail');
    expect(res.status).toBe(500);
    const body = (await res.json()) as { error: { code: string; message: string; requestId: string } };
    expect(body.error.code).toBe('internal');
    expect(body.error.requestId).toMatch(/^[0-9a-f]{12}$/);
    expect(body.error.message).not.toContain('deliberate failure');
    expect(res.headers.get('x-request-id')).toBe(body.error.requestId);
    const { readFileSync } = await import('node:fs');
    const log = readFileSync(process.env.KW_TEST_SERVER_LOG ?? '', 'utf8');
    expect(log).toContain(`[${body.error.requestId}] unexpected error`);
  });
});
