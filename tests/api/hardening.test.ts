/**
 * Issue 16's findings, each reproduced against the running server: bounds that stop work before it starts,
 * text PostgreSQL cannot store, and API errors that are always JSON (405 with Allow, malformed URLs, encoded
 * dot paths). Each answer is checked for its status and the shared error body { error: { code, message } }.
 */
import type { Knex } from 'knex';
import { KIT_SETTINGS } from '../fixtures/kit-settings';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { api, BASE_URL, postJson } from './harness';
import { accountCreate, classCreateDirect, linkIn, mailWait, TEST_PASSWORD, userSessionCookie } from './auth-helpers';

let knex: Knex;
let cookie = '';
let classId = '';

const SETTINGS = KIT_SETTINGS;
const cylinder = (facets: number, name = 'Drum') => ({
  schemaVersion: 1,
  name,
  body: { kind: 'cylinder', diameterM: 1, heightM: 1, facets },
  appendages: [],
});

beforeAll(async () => {
  knex = testKnex();
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'hardening' });
  cookie = await userSessionCookie(knex, teacher.id);
  classId = (await classCreateDirect(knex, teacher, 'Hardening class')).id;
});
afterAll(async () => {
  await knex?.destroy();
});

/** The status and the error body of an answer; fails unless the body is the shared JSON error. */
async function jsonError(res: Response): Promise<{ status: number; code: string; message: string }> {
  expect(res.headers.get('content-type')).toMatch(/^application\/json/);
  const body = (await res.json()) as { error: { code: string; message: string } };
  expect(typeof body.error.code).toBe('string');
  expect(body.error.message.length).toBeGreaterThan(0);
  return { status: res.status, code: body.error.code, message: body.error.message };
}

const send = (method: string, path: string, data: unknown) =>
  api(path, {
    method,
    headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' },
    body: JSON.stringify(data),
  });

describe('finding 1: a bound stops the work before it starts', () => {
  const routes: [string, (facets: number) => unknown][] = [
    ['/api/models/patterns', (f) => ({ model: cylinder(f), scaleDenominator: 20, paperGsm: 160 })],
    ['/api/scale/solve', (f) => ({ ...SETTINGS, model: cylinder(f) })],
    ['/api/kits/preview', (f) => ({ ...SETTINGS, model: cylinder(f) })],
  ];
  for (const [path, bodyOf] of routes) {
    it(`${path}: facets 1e7 and 1e308 answer the 256-facet bound`, async () => {
      for (const facets of [1e7, 1e308]) {
        const e = await jsonError(await send('POST', path, bodyOf(facets)));
        expect(e.status).toBe(400);
        expect(e.message).toMatch(/at most 256 facets/);
      }
    });
  }
});

describe('finding 3: NUL and lone surrogates in text are a 400, not a PostgreSQL 500', () => {
  // JSON text with the escapes written out, so the server's JSON.parse makes the characters.
  const raw = (method: string, path: string, json: string) =>
    api(path, { method, headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' }, body: json });
  let kitId = '';

  beforeAll(async () => {
    const res = await postJson('/api/kits', { classId, inputs: { ...SETTINGS, modelId: 'skein-probe' } }, { cookie });
    expect(res.status).toBe(201);
    kitId = ((await res.json()) as { kit: { id: string } }).kit.id;
  });

  for (const [what, escape] of [
    ['NUL', '\\u0000'],
    ['a lone surrogate', '\\ud800'],
  ]) {
    it(`${what} in a kit title on save, rename and duplicate`, async () => {
      const title = `"Team ${escape} kit"`;
      const inputs = JSON.stringify({ ...SETTINGS, modelId: 'skein-probe' }).replace('{', `{"title":${title},`);
      for (const res of [
        await raw('POST', '/api/kits', `{"classId":"${classId}","inputs":${inputs}}`),
        await raw('PATCH', `/api/kits/${kitId}`, `{"title":${title}}`),
        await raw('POST', `/api/kits/${kitId}/duplicate`, `{"title":${title}}`),
      ]) {
        const e = await jsonError(res);
        expect(e.status).toBe(400);
        expect(e.message).toMatch(/plain text/);
      }
    });

    it(`${what} in a model name`, async () => {
      const model = JSON.stringify(cylinder(24)).replace('"Drum"', `"Drum ${escape}"`);
      const e = await jsonError(
        await raw('POST', '/api/models/patterns', `{"model":${model},"scaleDenominator":20,"paperGsm":160}`),
      );
      expect(e.status).toBe(400);
      expect(e.message).toMatch(/name: .*plain text/);
    });
  }
});

describe('finding 2: /sign-in?next= never leaves the site', () => {
  it('a signed-in visitor sent on by a crafted next lands on their home page, and nothing answers 500', async () => {
    for (const next of ['/%09/evil.example', '/%0A/x', '/%E3%80%82x', '//evil.example', '/\\evil.example']) {
      const res = await api(`/sign-in?next=${next}`, { headers: { cookie } });
      expect(res.status, next).toBe(302);
      expect(res.headers.get('location'), next).toBe('/classes');
    }
    const ok = await api('/sign-in?next=/kits', { headers: { cookie } });
    expect(ok.headers.get('location')).toBe('/kits');
  });
});

describe('finding 4: finite but extreme numbers are a 400 naming the range, never a 500', () => {
  const ramp = Array.from({ length: 512 }, (_, i) => i / 100);
  for (const [path, body, range] of [
    ['/api/analysis/equilibrium-temperature', { absorptivity: 1, emissivity: 5e-324 }, /from 0.01 to 1/],
    [
      '/api/analysis/magnetic',
      { readings: [2, 4, 8].map((d) => ({ distanceCm: d, fieldUT: d === 4 ? 1e308 : 50 })) },
      /µT/,
    ],
    [
      '/api/analysis/vibration',
      { timeS: ramp, x: ramp.map((_, i) => (i % 2 ? 1e308 : -1e308)), y: ramp.map(() => 0), z: ramp.map(() => 1) },
      /from -100000 to 100000/,
    ],
  ] as const) {
    it(path, async () => {
      const e = await jsonError(await postJson(path, body));
      expect(e.status).toBe(400);
      expect(e.message).toMatch(range);
    });
  }
});

describe('finding 5: a password change voids the reset links mailed before it', () => {
  it('a reset link mailed before a change on the account page no longer sets a password', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'hardening-reset' });
    const mine = await userSessionCookie(knex, teacher.id);
    expect((await postJson('/api/auth/forgot-password', { email: teacher.email })).status).toBe(202);
    const token = linkIn(await mailWait(teacher.email, /new Kitwright password/), '/reset-password').searchParams.get(
      'token',
    );
    const changed = await postJson(
      '/api/auth/password',
      { currentPassword: TEST_PASSWORD, newPassword: 'the password I chose today' },
      { cookie: mine },
    );
    expect(changed.status).toBe(200);
    const e = await jsonError(await postJson('/api/auth/reset-password', { token, password: 'an attacker password' }));
    expect(e.status).toBe(400);
    const signIn = await postJson('/api/auth/sign-in', {
      email: teacher.email,
      password: 'the password I chose today',
    });
    expect(signIn.status).toBe(200);
  });
});

describe('finding 8: every API error is JSON', () => {
  it('a wrong method on an existing route is a 405 with Allow', async () => {
    for (const [method, path, allow] of [
      ['GET', '/api/auth/sign-in', 'POST'],
      ['DELETE', '/api/health', 'GET, HEAD'],
      ['PUT', '/api/kits', 'GET, HEAD, POST'],
      ['POST', '/api/kits/00000000-0000-4000-8000-000000000000.pdf', 'GET, HEAD'],
    ] as const) {
      const res = await api(path, { method, headers: { origin: BASE_URL } });
      const e = await jsonError(res);
      expect([e.status, e.code]).toEqual([405, 'method_not_allowed']);
      expect(res.headers.get('allow')).toBe(allow);
    }
  });
});
