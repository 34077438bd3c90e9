/**
 * The authorization matrix: every API route under src/pages/api, found on the file system, with every HTTP
 * method its file exports, called by six kinds of visitor; each answer's status must match its row.
 *
 * A route or method without a row FAILS this test, and so does a row whose route is gone. To add a route:
 *   1. add a row to ROWS: `route` is the file path under src/pages as Astro names it ('/api/classes/[id]'),
 *      `method` an exported method (ALL for a catch-all), `path` the URL to call (a function of the fixtures
 *      when it needs an id), `body` a JSON body if the route reads one;
 *   2. give the expected status for each visitor in `expect` (use `who(...)` for the common shapes).
 * Rows send bodies that fail validation where they can (`{}`), so an admitted visitor gets 400 and nothing
 * changes, while a visitor the route does not admit gets 401 (anonymous), 403 (wrong role or a class
 * session) or 404 (someone else's class). Every request gets fresh sessions, so sign-out rows do no harm.
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { api, BASE_URL } from './harness';
import { routesOnDisk } from './routes-on-disk';
import {
  accountCreate,
  classCreateDirect,
  classSessionCookie,
  schoolIdByName,
  userSessionCookie,
  type TestAccount,
} from './auth-helpers';

const VISITORS = ['anonymous', 'classSession', 'teacher', 'otherTeacher', 'coordinator', 'admin'] as const;
type Visitor = (typeof VISITORS)[number];
type Expect = Record<Visitor, number>;

interface Fixtures {
  /** A class of `teacher`; the class session belongs to it. */
  classId: string;
  /** An account an admin could change (the other school's teacher). */
  accountId: string;
}

interface Row {
  route: string;
  method: string;
  path?: string | ((f: Fixtures) => string);
  body?: unknown;
  expect: Expect;
}

/** Same status for everyone. */
const all = (status: number): Expect => Object.fromEntries(VISITORS.map((v) => [v, status])) as Expect;
/** 401 anonymous, 403 class session, then the given statuses for the account kinds. */
const accounts = (teacher: number, otherTeacher: number, coordinator: number, admin: number): Expect => ({
  anonymous: 401,
  classSession: 403,
  teacher,
  otherTeacher,
  coordinator,
  admin,
});
const adminOnly = (status: number) => accounts(403, 403, 403, status);
const staffOnly = (status: number) => accounts(403, 403, status, status);
/** A well-formed id that no row has. */
const MISSING = '00000000-0000-4000-8000-000000000000';

const ROWS: Row[] = [
  // Shell
  { route: '/api/health', method: 'GET', expect: all(200) },
  { route: '/api/test/fail', method: 'GET', expect: all(500) },
  { route: '/api/[...path]', method: 'ALL', path: '/api/no-such-route', expect: all(404) },
  // Accounts: open to anyone; an empty body is invalid input
  { route: '/api/auth/sign-up', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/auth/sign-in', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/auth/sign-out', method: 'POST', expect: all(200) },
  { route: '/api/auth/session', method: 'GET', expect: all(200) },
  { route: '/api/auth/verify-email', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/auth/forgot-password', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/auth/reset-password', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/auth/invitation', method: 'POST', body: {}, expect: all(400) },
  // Accounts: the signed-in account's own
  { route: '/api/auth/password', method: 'POST', body: {}, expect: accounts(400, 400, 400, 400) },
  { route: '/api/auth/sign-out-everywhere', method: 'POST', expect: accounts(200, 200, 200, 200) },
  // Admin
  { route: '/api/admin/accounts', method: 'GET', expect: adminOnly(200) },
  {
    route: '/api/admin/accounts/[id]',
    method: 'PATCH',
    path: (f) => `/api/admin/accounts/${f.accountId}`,
    body: {},
    expect: adminOnly(400),
  },
  { route: '/api/admin/invitations', method: 'GET', expect: adminOnly(200) },
  { route: '/api/admin/invitations', method: 'POST', body: {}, expect: adminOnly(400) },
  { route: '/api/admin/audit', method: 'GET', expect: adminOnly(200) },
  // Schools
  { route: '/api/schools', method: 'GET', expect: all(200) },
  { route: '/api/schools/directory', method: 'GET', expect: staffOnly(200) },
  { route: '/api/schools/directory.csv', method: 'GET', expect: staffOnly(200) },
  { route: '/api/schools/proposals', method: 'GET', expect: staffOnly(200) },
  { route: '/api/schools/[id]', method: 'GET', path: `/api/schools/${MISSING}`, expect: staffOnly(404) },
  { route: '/api/schools/[id]', method: 'PATCH', path: `/api/schools/${MISSING}`, body: {}, expect: staffOnly(400) },
  {
    route: '/api/schools/[id]/merge',
    method: 'POST',
    path: `/api/schools/${MISSING}/merge`,
    body: {},
    expect: staffOnly(400),
  },
  // Reach: coordinators and admins; without a period the query is invalid
  ...['figures', 'figures.csv', 'breakdown', 'breakdown.csv', 'rows', 'rows.csv', 'report.pdf'].map((name): Row => ({
    route: `/api/reach/${name}`,
    method: 'GET',
    expect: staffOnly(400),
  })),
  // Activities: the library, open to anyone
  { route: '/api/activities', method: 'GET', expect: all(200) },
  // Events: the public list for anyone, changes for staff; a missing event is 404 to those admitted
  { route: '/api/events', method: 'GET', expect: all(200) },
  { route: '/api/events', method: 'POST', body: {}, expect: accounts(403, 403, 400, 400) },
  { route: '/api/events/[id]', method: 'GET', path: `/api/events/${MISSING}`, expect: all(404) },
  {
    route: '/api/events/[id]',
    method: 'PATCH',
    path: `/api/events/${MISSING}`,
    body: {},
    expect: accounts(403, 403, 404, 404),
  },
  { route: '/api/events/[id].ics', method: 'GET', path: `/api/events/${MISSING}.ics`, expect: all(404) },
  {
    route: '/api/events/[id]/registrations',
    method: 'GET',
    path: `/api/events/${MISSING}/registrations`,
    expect: accounts(403, 403, 404, 404),
  },
  {
    route: '/api/events/[id]/registrations',
    method: 'POST',
    path: `/api/events/${MISSING}/registrations`,
    body: {},
    // A teacher registers as themselves (no body read): the event is missing; anyone else's {} is invalid
    expect: { anonymous: 400, classSession: 400, teacher: 404, otherTeacher: 404, coordinator: 400, admin: 400 },
  },
  {
    route: '/api/events/[id]/registrations.csv',
    method: 'GET',
    path: `/api/events/${MISSING}/registrations.csv`,
    expect: accounts(403, 403, 404, 404),
  },
  {
    route: '/api/events/[id]/attendance',
    method: 'GET',
    path: `/api/events/${MISSING}/attendance`,
    expect: accounts(403, 403, 404, 404),
  },
  {
    route: '/api/events/[id]/attendance',
    method: 'PUT',
    path: `/api/events/${MISSING}/attendance`,
    body: {},
    expect: accounts(403, 403, 404, 404),
  },
  {
    route: '/api/events/[id]/plan.pdf',
    method: 'GET',
    path: `/api/events/${MISSING}/plan.pdf`,
    expect: accounts(404, 404, 404, 404),
  },
  // Live links: staff only
  { route: '/api/links', method: 'GET', expect: accounts(403, 403, 200, 200) },
  { route: '/api/links', method: 'POST', body: {}, expect: accounts(403, 403, 400, 400) },
  { route: '/api/links/[id]', method: 'GET', path: `/api/links/${MISSING}`, expect: accounts(403, 403, 404, 404) },
  {
    route: '/api/links/[id]',
    method: 'PATCH',
    path: `/api/links/${MISSING}`,
    body: {},
    expect: accounts(403, 403, 404, 404),
  },
  {
    route: '/api/links/[id]/qr',
    method: 'GET',
    path: `/api/links/${MISSING}/qr`,
    expect: accounts(403, 403, 404, 404),
  },
  {
    route: '/api/links/[id]/poster.pdf',
    method: 'GET',
    path: `/api/links/${MISSING}/poster.pdf`,
    expect: accounts(403, 403, 404, 404),
  },
  { route: '/api/events/registrations/confirm', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/events/registrations/cancel', method: 'POST', body: {}, expect: all(400) },
  // Classes
  { route: '/api/classes', method: 'GET', expect: accounts(200, 200, 200, 200) },
  { route: '/api/classes', method: 'POST', body: {}, expect: accounts(400, 400, 403, 403) },
  {
    route: '/api/classes/[id]',
    method: 'GET',
    path: (f) => `/api/classes/${f.classId}`,
    expect: { anonymous: 401, classSession: 200, teacher: 200, otherTeacher: 404, coordinator: 200, admin: 200 },
  },
  {
    route: '/api/classes/[id]',
    method: 'PATCH',
    path: (f) => `/api/classes/${f.classId}`,
    body: {},
    expect: accounts(400, 404, 403, 403),
  },
  {
    route: '/api/classes/[id]/rotate-code',
    method: 'POST',
    path: (f) => `/api/classes/${f.classId}/rotate-code`,
    expect: accounts(200, 404, 403, 403),
  },
  { route: '/api/classes/join', method: 'POST', body: {}, expect: all(400) },
  { route: '/api/classes/leave', method: 'POST', expect: all(200) },
  {
    route: '/api/classes/current',
    method: 'GET',
    expect: { anonymous: 401, classSession: 200, teacher: 403, otherTeacher: 403, coordinator: 403, admin: 403 },
  },
  // Data tools (analysis): open to anyone; an empty body is invalid input
  ...[
    'cleanroom',
    'deployment',
    'equilibrium-temperature',
    'four-point',
    'interference',
    'launch-stack',
    'magnetic',
    'orbit-eclipse',
    'psd-profile',
    'thermal',
    'vibration',
  ].map((tool): Row => ({ route: `/api/analysis/${tool}`, method: 'POST', body: {}, expect: all(400) })),
  // Models, patterns and the scale solver
  { route: '/api/models', method: 'GET', expect: all(200) },
  { route: '/api/models/patterns', method: 'POST', body: {}, expect: { ...all(400), anonymous: 401 } },
  { route: '/api/scale/solve', method: 'POST', body: {}, expect: { ...all(400), anonymous: 401 } },
  // Imported models: class sessions see the shared ones; accounts import and change their own (staff: any)
  { route: '/api/models/imports', method: 'GET', expect: { ...all(200), anonymous: 401 } },
  { route: '/api/models/imports', method: 'POST', body: {}, expect: accounts(400, 400, 400, 400) },
  {
    route: '/api/models/imports/[id]',
    method: 'GET',
    path: `/api/models/imports/${MISSING}`,
    expect: { ...all(404), anonymous: 401 },
  },
  {
    route: '/api/models/imports/[id]',
    method: 'PATCH',
    path: `/api/models/imports/${MISSING}`,
    body: {},
    expect: accounts(400, 400, 400, 400),
  },
  {
    route: '/api/models/imports/[id]',
    method: 'DELETE',
    path: `/api/models/imports/${MISSING}`,
    expect: accounts(404, 404, 404, 404),
  },
  {
    route: '/api/models/imports/[id]/summary',
    method: 'POST',
    path: `/api/models/imports/${MISSING}/summary`,
    body: {},
    expect: { ...all(400), anonymous: 401 },
  },
  // Kits. Rows with [id] use a kit id that does not exist: admitted visitors get 404, the rest 401/403.
  // (Ownership with real kits is tested beside the kit routes.)
  { route: '/api/kits', method: 'GET', expect: { ...all(200), anonymous: 401 } },
  { route: '/api/kits', method: 'POST', body: {}, expect: accounts(400, 400, 403, 403) },
  { route: '/api/kits/preview', method: 'POST', body: {}, expect: accounts(400, 400, 400, 400) },
  { route: '/api/kits/preview-file', method: 'POST', body: {}, expect: accounts(400, 400, 400, 400) },
  { route: '/api/kits/[id]', method: 'GET', path: `/api/kits/${MISSING}`, expect: { ...all(404), anonymous: 401 } },
  {
    route: '/api/kits/[id]',
    method: 'PATCH',
    path: `/api/kits/${MISSING}`,
    body: {},
    expect: accounts(404, 404, 403, 403),
  },
  { route: '/api/kits/[id]', method: 'DELETE', path: `/api/kits/${MISSING}`, expect: accounts(404, 404, 403, 403) },
  ...['json', 'pdf', 'stl', 'svg'].map((ext): Row => ({
    route: `/api/kits/[id].${ext}`,
    method: 'GET',
    path: `/api/kits/${MISSING}.${ext}`,
    expect: { ...all(404), anonymous: 401 },
  })),
  {
    route: '/api/kits/[id]/duplicate',
    method: 'POST',
    path: `/api/kits/${MISSING}/duplicate`,
    expect: accounts(404, 404, 403, 403),
  },
  // Photos. A missing entry or photo id: admitted visitors get 404 (or 400 for an invalid body), the rest 401/403.
  // (Who sees an unpublished entry's photos, with real photos, is tested in tests/api/photos.test.ts.)
  {
    route: '/api/entries/[id]/photos',
    method: 'POST',
    path: `/api/entries/${MISSING}/photos`,
    expect: { ...accounts(404, 404, 403, 403), classSession: 404 },
  },
  { route: '/api/photos/[id]', method: 'GET', path: `/api/photos/${MISSING}`, expect: all(404) },
  {
    route: '/api/photos/[id]',
    method: 'PATCH',
    path: `/api/photos/${MISSING}`,
    body: {},
    expect: { ...accounts(400, 400, 403, 403), classSession: 400 },
  },
  {
    route: '/api/photos/[id]',
    method: 'DELETE',
    path: `/api/photos/${MISSING}`,
    expect: { ...accounts(404, 404, 403, 403), classSession: 404 },
  },
  { route: '/api/photos/[id]/thumbnail', method: 'GET', path: `/api/photos/${MISSING}/thumbnail`, expect: all(404) },
  // Journal entries and review. Rows with [id] use an entry id that does not exist: admitted visitors get 404.
  // (Who sees which real entry is tested in tests/api/entries.test.ts.)
  {
    route: '/api/entries',
    method: 'GET',
    expect: { anonymous: 401, classSession: 200, teacher: 200, otherTeacher: 200, coordinator: 400, admin: 400 },
  },
  { route: '/api/entries', method: 'POST', body: {}, expect: { ...accounts(400, 400, 403, 403), classSession: 400 } },
  {
    route: '/api/entries/booklet.pdf',
    method: 'GET',
    path: (f) => `/api/entries/booklet.pdf?classId=${f.classId}`,
    expect: accounts(200, 404, 200, 200),
  },
  { route: '/api/entries/booklet.pdf', method: 'GET', expect: accounts(400, 400, 400, 400) },
  { route: '/api/entries/[id]', method: 'GET', path: `/api/entries/${MISSING}`, expect: all(404) },
  {
    route: '/api/entries/[id]',
    method: 'PATCH',
    path: `/api/entries/${MISSING}`,
    body: {},
    expect: { ...accounts(400, 400, 403, 403), classSession: 400 },
  },
  {
    route: '/api/entries/[id]',
    method: 'DELETE',
    path: `/api/entries/${MISSING}`,
    expect: { ...accounts(404, 404, 403, 403), classSession: 404 },
  },
  {
    route: '/api/entries/[id]/submit',
    method: 'POST',
    path: `/api/entries/${MISSING}/submit`,
    body: {},
    expect: { ...accounts(404, 404, 403, 403), classSession: 404 },
  },
  {
    route: '/api/entries/[id]/approve',
    method: 'POST',
    path: `/api/entries/${MISSING}/approve`,
    body: {},
    expect: accounts(404, 404, 403, 403),
  },
  {
    route: '/api/entries/[id]/withdraw',
    method: 'POST',
    path: `/api/entries/${MISSING}/withdraw`,
    expect: accounts(404, 404, 403, 403),
  },
  {
    route: '/api/entries/[id]/results',
    method: 'POST',
    path: `/api/entries/${MISSING}/results`,
    body: {},
    expect: { ...accounts(400, 400, 403, 403), classSession: 400 },
  },
  {
    route: '/api/entries/[id]/audit',
    method: 'GET',
    path: `/api/entries/${MISSING}/audit`,
    expect: accounts(404, 404, 404, 404),
  },
  { route: '/api/review/queue', method: 'GET', expect: accounts(403, 403, 200, 200) },
  {
    route: '/api/review/[id]/decision',
    method: 'POST',
    path: `/api/review/${MISSING}/decision`,
    body: {},
    expect: accounts(403, 403, 400, 400),
  },
  { route: '/api/review/bulk-publish', method: 'POST', body: {}, expect: accounts(403, 403, 400, 400) },
];

let knex: Knex;
let fixtures: Fixtures;
const people = {} as Record<Exclude<Visitor, 'anonymous' | 'classSession'>, TestAccount>;

beforeAll(async () => {
  knex = testKnex();
  const juniper = await schoolIdByName(knex, 'Juniper Flats Middle School');
  const larkspur = await schoolIdByName(knex, 'Larkspur Elementary');
  people.teacher = await accountCreate(knex, { role: 'teacher', label: 'matrix-teacher', schoolId: juniper });
  people.otherTeacher = await accountCreate(knex, { role: 'teacher', label: 'matrix-other', schoolId: larkspur });
  people.coordinator = await accountCreate(knex, { role: 'coordinator', label: 'matrix-coordinator' });
  people.admin = await accountCreate(knex, { role: 'admin', label: 'matrix-admin' });
  const klass = await classCreateDirect(knex, people.teacher, 'Matrix class');
  fixtures = { classId: klass.id, accountId: people.otherTeacher.id };
});

afterAll(async () => {
  await knex?.destroy();
});

async function cookieFor(visitor: Visitor): Promise<string | null> {
  if (visitor === 'anonymous') return null;
  if (visitor === 'classSession') return classSessionCookie(knex, fixtures.classId);
  return userSessionCookie(knex, people[visitor].id);
}

describe('authorization matrix', () => {
  it('has a row for every route and method on disk, and no row for a route that is gone', () => {
    const onDisk = routesOnDisk().map((r) => `${r.method} ${r.route}`);
    const inMatrix = ROWS.map((r) => `${r.method} ${r.route}`);
    expect(onDisk.length).toBeGreaterThan(10);
    expect(
      onDisk.filter((k) => !inMatrix.includes(k)),
      'routes without a matrix row',
    ).toEqual([]);
    expect(
      inMatrix.filter((k) => !onDisk.includes(k)),
      'matrix rows without a route',
    ).toEqual([]);
  });

  it('answers every visitor with the status its row expects', async () => {
    const mismatches: string[] = [];
    for (const row of ROWS) {
      const path = typeof row.path === 'function' ? row.path(fixtures) : (row.path ?? row.route);
      const method = row.method === 'ALL' ? 'GET' : row.method;
      for (const visitor of VISITORS) {
        const cookie = await cookieFor(visitor);
        const headers: Record<string, string> = { origin: BASE_URL };
        if (cookie) headers.cookie = cookie;
        if (row.body !== undefined) headers['content-type'] = 'application/json';
        const res = await api(path, {
          method,
          headers,
          body: row.body === undefined ? undefined : JSON.stringify(row.body),
        });
        await res.arrayBuffer();
        if (res.status !== row.expect[visitor]) {
          mismatches.push(`${row.method} ${path} as ${visitor}: ${res.status}, expected ${row.expect[visitor]}`);
        }
      }
    }
    expect(mismatches).toEqual([]);
  });
});
