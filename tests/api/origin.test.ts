/**
 * Cross-site request refusal against the running server (src/middleware.ts with src/lib/http/origin-check.ts),
 * after OWASP's Cross-Site Request Forgery Prevention Cheat Sheet, "Verifying Origin With Standard Headers" and
 * "Fetch Metadata headers": a state-changing request from another origin is refused before the route runs, with
 * the shared JSON error on /api/* and a short plain page elsewhere; same-site requests still work.
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { accountCreate, userSessionCookie, TEST_PASSWORD } from './auth-helpers';
import { api, BASE_URL, postJson } from './harness';

const FOREIGN = 'https://evil.example';
let knex: Knex;
beforeAll(() => {
  knex = testKnex();
});
afterAll(async () => {
  await knex?.destroy();
});

async function whoAmI(cookie: string): Promise<string> {
  const res = await api('/api/auth/session', { headers: { cookie } });
  return ((await res.json()) as { actor: { kind: string } }).actor.kind;
}

async function expectCrossSite(res: Response, received: string): Promise<void> {
  expect(res.status).toBe(403);
  expect(res.headers.get('content-type')).toContain('application/json');
  const body = (await res.json()) as { error: { code: string; message: string } };
  expect(body.error.code).toBe('cross_site');
  // The message says what was received and what would work: a request from this site's own origin.
  expect(body.error.message).toContain(received);
  expect(body.error.message).toContain(new URL(BASE_URL).origin);
  expect(res.headers.get('x-request-id')).toMatch(/^[0-9a-f]{12}$/);
}

describe('cross-site requests to the API', () => {
  it('refuses a JSON sign-in from a foreign Origin with 403 cross_site before the route runs', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'origin' });
    const res = await postJson(
      '/api/auth/sign-in',
      { email: teacher.email, password: TEST_PASSWORD },
      { origin: FOREIGN },
    );
    await expectCrossSite(res, `Origin: ${FOREIGN}`);
    expect(res.headers.get('set-cookie')).toBeNull();
  });

  it('refuses every unsafe method and body type, not only form posts, and leaves the session alone', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'origin' });
    const cookie = await userSessionCookie(knex, teacher.id);
    const sent: RequestInit[] = [
      { method: 'POST', headers: { cookie, origin: FOREIGN } },
      { method: 'POST', headers: { cookie, origin: FOREIGN, 'content-type': 'text/csv' }, body: 'a,b\n1,2' },
      { method: 'DELETE', headers: { cookie, origin: FOREIGN } },
      { method: 'PATCH', headers: { cookie, origin: 'null', 'content-type': 'application/json' }, body: '{}' },
    ];
    for (const init of sent) {
      const res = await api('/api/auth/sign-out-everywhere', init);
      expect(res.status, `${init.method} ${JSON.stringify(init.headers)}`).toBe(403);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe('cross_site');
    }
    expect(await whoAmI(cookie)).toBe('user');
  });

  it('refuses Sec-Fetch-Site: cross-site when a browser sent no Origin', async () => {
    const res = await api('/api/classes/join', {
      method: 'POST',
      headers: { 'sec-fetch-site': 'cross-site', 'content-type': 'application/json' },
      body: JSON.stringify({ code: 'ZZZZ-ZZZZ' }),
    });
    await expectCrossSite(res, 'Sec-Fetch-Site: cross-site');
  });

  it('refuses a cookie-bearing request with neither Origin nor Sec-Fetch-Site', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'origin' });
    const cookie = await userSessionCookie(knex, teacher.id);
    const res = await api('/api/auth/sign-out-everywhere', { method: 'POST', headers: { cookie } });
    await expectCrossSite(res, 'cookies without an Origin or Sec-Fetch-Site header');
    expect(await whoAmI(cookie)).toBe('user');
  });
});

describe('same-site requests to the API', () => {
  it('signs in with the test server’s own origin', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'origin' });
    const res = await postJson('/api/auth/sign-in', { email: teacher.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.headers.get('set-cookie')).toMatch(/=/);
  });

  it('accepts the loopback alias of the server and Sec-Fetch-Site: same-origin', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'origin' });
    const cookie = await userSessionCookie(knex, teacher.id);
    const alias = `http://localhost:${new URL(BASE_URL).port}`;
    const viaAlias = await api('/api/auth/sign-out', { method: 'POST', headers: { cookie, origin: alias } });
    expect(viaAlias.status).toBe(200);
    const second = await userSessionCookie(knex, teacher.id);
    const viaFetchSite = await api('/api/auth/sign-out', {
      method: 'POST',
      headers: { cookie: second, 'sec-fetch-site': 'same-origin' },
    });
    expect(viaFetchSite.status).toBe(200);
    expect(await whoAmI(second)).toBe('anonymous');
  });

  it('lets a script without cookies or Origin reach the route, which answers for itself', async () => {
    // The route's own 400 for an empty body shows the request got past the origin check.
    const res = await api('/api/auth/sign-in', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: '{}',
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: { code: string } }).error.code).not.toBe('cross_site');
  });
});

describe('cross-site form posts to pages', () => {
  it('refuses a foreign form post to a page route with a plain 403 page', async () => {
    const res = await api('/sign-in', {
      method: 'POST',
      headers: { origin: FOREIGN, 'content-type': 'application/x-www-form-urlencoded' },
      body: 'email=a%40example.org&password=x',
    });
    expect(res.status).toBe(403);
    expect(res.headers.get('content-type')).toContain('text/plain');
    const text = await res.text();
    expect(text).toContain(`received Origin: ${FOREIGN}`);
    expect(text).toContain(new URL(BASE_URL).origin);
  });

  it('renders the page for the same form post from this site', async () => {
    const res = await api('/sign-in', {
      method: 'POST',
      headers: { origin: BASE_URL, 'content-type': 'application/x-www-form-urlencoded' },
      body: 'email=a%40example.org&password=x',
    });
    expect(res.status).not.toBe(403);
    expect(res.headers.get('content-type')).toContain('text/html');
  });
});
