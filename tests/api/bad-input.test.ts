/**
 * Bad input never crashes a route: malformed JSON, a 2 MB body, wrong types, unknown fields, and SQL or HTML
 * in text fields answer 400 with field errors (413 for the body that is too large), never 500. The first
 * block covers the account and class routes field by field; the last one sweeps every body-taking route on
 * disk (other helpers' routes included) with malformed and oversized bodies.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { api, BASE_URL } from './harness';
import { accountCreate, classCreateDirect, schoolIdByName, userSessionCookie } from './auth-helpers';

let knex: Knex;
const cookies = { teacher: '', admin: '' };
let classId = '';
let accountId = '';
let schoolId = '';

beforeAll(async () => {
  knex = testKnex();
  schoolId = await schoolIdByName(knex, 'Bright Creek High School');
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'badinput', schoolId });
  const admin = await accountCreate(knex, { role: 'admin', label: 'badinput-admin' });
  cookies.teacher = await userSessionCookie(knex, teacher.id);
  cookies.admin = await userSessionCookie(knex, admin.id);
  classId = (await classCreateDirect(knex, teacher, 'Bad input class')).id;
  accountId = teacher.id;
});
afterAll(async () => {
  await knex?.destroy();
});

interface Target {
  method: string;
  path: () => string;
  as?: keyof typeof cookies;
  /** A body that passes validation, to vary field by field. */
  valid: () => Record<string, unknown>;
  /** Text fields where SQL and markup must be refused or stored inert. */
  textFields: string[];
}

const TARGETS: Target[] = [
  {
    method: 'POST',
    path: () => '/api/auth/sign-in',
    valid: () => ({ email: 'someone@example.org', password: 'a password of some length' }),
    textFields: ['email'],
  },
  {
    method: 'POST',
    path: () => '/api/auth/sign-up',
    valid: () => ({
      email: 'bad-input-signup@example.org',
      displayName: 'Valid Name',
      password: 'a valid long password',
      schoolChoice: 'existing',
      schoolId,
    }),
    textFields: ['email', 'displayName'],
  },
  {
    method: 'POST',
    path: () => '/api/auth/forgot-password',
    valid: () => ({ email: 'x@example.org' }),
    textFields: ['email'],
  },
  {
    method: 'POST',
    path: () => '/api/auth/reset-password',
    valid: () => ({ token: 'A'.repeat(43), password: 'a valid long password' }),
    textFields: ['token'],
  },
  {
    method: 'POST',
    path: () => '/api/auth/verify-email',
    valid: () => ({ token: 'A'.repeat(43) }),
    textFields: ['token'],
  },
  {
    method: 'POST',
    path: () => '/api/auth/invitation',
    valid: () => ({ token: 'A'.repeat(43), displayName: 'Valid Name', password: 'a valid long password' }),
    textFields: ['token', 'displayName'],
  },
  { method: 'POST', path: () => '/api/classes/join', valid: () => ({ code: 'ZZZZ-ZZZZ' }), textFields: ['code'] },
  {
    method: 'POST',
    path: () => '/api/classes',
    as: 'teacher',
    valid: () => ({ name: 'Valid class', gradeBand: '6-8', studentCount: 10 }),
    textFields: ['name'],
  },
  {
    method: 'PATCH',
    path: () => `/api/classes/${classId}`,
    as: 'teacher',
    valid: () => ({ name: 'Renamed class' }),
    textFields: ['name'],
  },
  {
    method: 'POST',
    path: () => '/api/admin/invitations',
    as: 'admin',
    valid: () => ({ email: 'invite-bad-input@example.org', role: 'coordinator' }),
    textFields: ['email'],
  },
  {
    method: 'PATCH',
    path: () => `/api/admin/accounts/${accountId}`,
    as: 'admin',
    valid: () => ({ role: 'teacher' }),
    textFields: ['role'],
  },
  {
    method: 'POST',
    path: () => '/api/auth/password',
    as: 'teacher',
    valid: () => ({ currentPassword: 'whatever it is now', newPassword: 'a valid long password' }),
    textFields: [],
  },
];

const SQL = "x'); DROP TABLE users; --";
const HTML = '<script>alert(1)</script>';

function send(t: Target, body: string, contentType = 'application/json') {
  const headers: Record<string, string> = { origin: BASE_URL, 'content-type': contentType };
  if (t.as) headers.cookie = cookies[t.as];
  return api(t.path(), { method: t.method, headers, body });
}

async function errorOf(res: Response) {
  return ((await res.json()) as { error: { code: string; message: string; fields?: Record<string, string[]> } }).error;
}

describe.each(TARGETS)('$method $path', (t) => {
  it('answers malformed JSON and a wrong content type with 400', async () => {
    const malformed = await send(t, '{"email": "a@b.org",');
    expect(malformed.status).toBe(400);
    expect((await errorOf(malformed)).message).toMatch(/not valid JSON/);
    expect((await send(t, 'email=a@b.org', 'text/plain')).status).toBe(400);
    expect((await send(t, '[]')).status).toBe(400);
    expect((await send(t, 'null')).status).toBe(400);
  });

  it('answers a 2 MB body with 413', async () => {
    const huge = JSON.stringify({ ...t.valid(), padding: 'x'.repeat(2_000_000) });
    const res = await send(t, huge);
    expect(res.status).toBe(413);
    expect((await errorOf(res)).code).toBe('too_large');
  });

  it('answers wrong types with 400 and an error on each field', async () => {
    const valid = t.valid();
    const wrong = Object.fromEntries(Object.keys(valid).map((k) => [k, typeof valid[k] === 'number' ? 'ten' : 12345]));
    const res = await send(t, JSON.stringify(wrong));
    expect(res.status).toBe(400);
    const error = await errorOf(res);
    for (const key of Object.keys(valid)) expect(Object.keys(error.fields ?? {}), key).toContain(key);
  });

  it('answers an unknown field with 400 naming it', async () => {
    const res = await send(t, JSON.stringify({ ...t.valid(), isAdmin: true }));
    expect(res.status).toBe(400);
    expect(JSON.stringify((await errorOf(res)).fields)).toContain('isAdmin');
  });

  it('answers SQL and HTML in text fields with 400 and a field error, never 500', async () => {
    for (const field of t.textFields) {
      for (const attack of [SQL, HTML]) {
        const res = await send(t, JSON.stringify({ ...t.valid(), [field]: attack }));
        expect(res.status, `${field} = ${attack}`).toBe(400);
        expect(Object.keys((await errorOf(res)).fields ?? {})).toContain(field);
      }
    }
    expect(await knex.schema.hasTable('users')).toBe(true);
  });
});

describe('every body-taking API route on disk', () => {
  const apiDir = join(process.cwd(), 'src', 'pages', 'api');
  const routes: { path: string; method: string }[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      // Astro leaves files and folders whose name starts with "_" out of routing.
      if (entry.name.startsWith('_')) continue;
      const full = join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name.endsWith('.ts')) {
        const path = ('/api/' + relative(apiDir, full).replace(/\\/g, '/'))
          .replace(/\.ts$/, '')
          .replace(/\/index$/, '')
          .replace(/\[\.\.\.[^\]]+\]/g, 'anything')
          .replace(/\[[^\]]+\]/g, '00000000-0000-4000-8000-000000000000');
        for (const m of readFileSync(full, 'utf8').matchAll(
          /export\s+(?:const|async\s+function|function)\s+(POST|PUT|PATCH)\b/g,
        )) {
          routes.push({ path, method: m[1]! });
        }
      }
    }
  };
  walk(apiDir);

  it('never answers malformed or oversized bodies with 500, for any visitor', async () => {
    const failures: string[] = [];
    for (const r of routes) {
      for (const cookie of ['', cookies.teacher, cookies.admin]) {
        for (const body of ['{"oops":', JSON.stringify({ padding: 'x'.repeat(2_000_000) }), '"just a string"']) {
          const res = await api(r.path, {
            method: r.method,
            headers: { origin: BASE_URL, 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
            body,
          });
          await res.arrayBuffer();
          if (res.status >= 500) failures.push(`${r.method} ${r.path}: ${res.status}`);
        }
      }
    }
    expect(routes.length).toBeGreaterThan(5);
    expect(failures).toEqual([]);
  });
});
