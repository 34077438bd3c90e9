/** Classes, class codes and class sessions against the test server and PostgreSQL. */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CLASS_CODE_ALPHABET } from '../../src/lib/auth/class-code';
import { CLASS_SESSION_COOKIE } from '../../src/lib/auth/cookies';
import type { ErrorBody } from '../../src/lib/http/respond';
import { testKnex } from '../db/database';
import { api, BASE_URL, postJson } from './harness';
import {
  accountCreate,
  classCreateDirect,
  classSessionCookie,
  cookiesFrom,
  schoolIdByName,
  userSessionCookie,
  type TestAccount,
} from './auth-helpers';

let knex: Knex;
let teacher: TestAccount;
let teacherCookie: string;
beforeAll(async () => {
  knex = testKnex();
  teacher = await accountCreate(knex, {
    role: 'teacher',
    label: 'classes',
    schoolId: await schoolIdByName(knex, 'Quarry Hill Middle School'),
  });
  teacherCookie = await userSessionCookie(knex, teacher.id);
});
afterAll(async () => {
  await knex?.destroy();
});

interface ClassBody {
  class: { id: string; name: string; joinCode?: string; studentCount: number; schoolName: string | null };
}

describe('POST /api/classes', () => {
  it('creates a class with a name, grade band and count only, and an 8-character look-alike-free code', async () => {
    const res = await postJson(
      '/api/classes',
      { name: 'Robotics Elective', gradeBand: '6-8', studentCount: 18 },
      { cookie: teacherCookie },
    );
    expect(res.status).toBe(201);
    const body = (await res.json()) as ClassBody;
    expect(body.class).toMatchObject({
      name: 'Robotics Elective',
      studentCount: 18,
      schoolName: 'Quarry Hill Middle School',
    });
    expect(body.class.joinCode).toMatch(new RegExp(`^[${CLASS_CODE_ALPHABET}]{8}$`));
    expect(body.class.joinCode).not.toMatch(/[01OIL]/);
  });

  it('refuses student names or any field beyond the three', async () => {
    const res = await postJson(
      '/api/classes',
      { name: 'Period 1', gradeBand: '6-8', studentCount: 2, students: ['Ann', 'Bo'] },
      { cookie: teacherCookie },
    );
    expect(res.status).toBe(400);
    const { error } = (await res.json()) as ErrorBody;
    expect(error.code).toBe('invalid_input');
    // The strict schema refuses the extra key on the object itself (path ""), naming it; the three allowed
    // fields were valid, so no error is filed under them.
    expect(error.fields?.['']).toEqual([expect.stringContaining("'students'")]);
    expect(Object.keys(error.fields ?? {})).toEqual(['']);
    expect(error.message).toContain("'students'");
    // Nothing was stored under the refused request.
    expect(await knex('classes').where({ name: 'Period 1', teacher_id: teacher.id }).first()).toBeUndefined();
  });
});

describe('class visibility', () => {
  it("answers 404 to another teacher for someone else's class, and lists only their own", async () => {
    const klass = await classCreateDirect(knex, teacher, 'Private class');
    const other = await accountCreate(knex, { role: 'teacher', label: 'other' });
    const otherCookie = await userSessionCookie(knex, other.id);
    expect((await api(`/api/classes/${klass.id}`, { headers: { cookie: otherCookie } })).status).toBe(404);
    expect((await api(`/classes/${klass.id}`, { headers: { cookie: otherCookie } })).status).toBe(404);
    const list = (await (await api('/api/classes', { headers: { cookie: otherCookie } })).json()) as {
      classes: { id: string }[];
    };
    expect(list.classes.map((c) => c.id)).not.toContain(klass.id);
    expect((await api(`/classes/${klass.id}`, { headers: { cookie: teacherCookie } })).status).toBe(200);
  });

  it('shows coordinators every class of every school, without join codes', async () => {
    const klass = await classCreateDirect(knex, teacher, 'Seen by staff');
    const coordinator = await accountCreate(knex, { role: 'coordinator' });
    const res = await api('/api/classes', { headers: { cookie: await userSessionCookie(knex, coordinator.id) } });
    const list = (await res.json()) as { classes: { id: string; joinCode?: string; schoolName: string | null }[] };
    const schools = new Set(list.classes.map((c) => c.schoolName));
    expect(schools.size).toBeGreaterThanOrEqual(3);
    expect(list.classes.find((c) => c.id === klass.id)).toBeDefined();
    expect(list.classes.every((c) => c.joinCode === undefined)).toBe(true);
  });

  it('lets a class session see its own class only', async () => {
    const mine = await classCreateDirect(knex, teacher, 'Mine');
    const theirs = await classCreateDirect(knex, teacher, 'Theirs');
    const cookie = await classSessionCookie(knex, mine.id);
    expect((await api(`/api/classes/${mine.id}`, { headers: { cookie } })).status).toBe(200);
    expect((await api(`/api/classes/${theirs.id}`, { headers: { cookie } })).status).toBe(404);
    expect((await api('/api/classes', { headers: { cookie } })).status).toBe(403);
    const current = (await (await api('/api/classes/current', { headers: { cookie } })).json()) as ClassBody;
    expect(current.class.id).toBe(mine.id);
    expect(current.class.joinCode).toBeUndefined();
  });
});

describe('POST /api/classes/join', () => {
  it('opens an 8-hour class session from a code typed in lower case with a hyphen', async () => {
    const klass = await classCreateDirect(knex, teacher, 'Join me');
    const typed = `${klass.code.slice(0, 4)}-${klass.code.slice(4)}`.toLowerCase();
    const res = await postJson('/api/classes/join', { code: typed });
    expect(res.status).toBe(200);
    const setCookie = res.headers.getSetCookie().find((c) => c.startsWith(`${CLASS_SESSION_COOKIE}=`))!;
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    expect(setCookie).toMatch(/Max-Age=28800/);
    const token = setCookie.split(';')[0]!.split('=')[1]!;
    const rows = await knex('class_sessions')
      .where({ class_id: klass.id })
      .select('id', knex.raw('EXTRACT(EPOCH FROM (expires_at - created_at)) AS seconds'));
    expect(rows).toHaveLength(1);
    expect(rows[0].id).not.toBe(token);
    expect(Number(rows[0].seconds)).toBeCloseTo(8 * 3600, -1);
    const session = (await (await api('/api/auth/session', { headers: { cookie: cookiesFrom(res) } })).json()) as {
      actor: { kind: string; classId: string };
    };
    expect(session.actor).toEqual({ kind: 'class', classId: klass.id });
  });

  it('answers a wrong code with 400 and a field error', async () => {
    const res = await postJson('/api/classes/join', { code: 'ZZZZZZZZ' });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: { fields: Record<string, string[]> } }).error.fields.code).toHaveLength(1);
  });

  it('ends the class session when the device leaves', async () => {
    const klass = await classCreateDirect(knex, teacher, 'Leave me');
    const cookie = await classSessionCookie(knex, klass.id);
    const res = await api('/api/classes/leave', {
      method: 'POST',
      headers: { cookie, origin: BASE_URL, 'content-type': 'application/x-www-form-urlencoded' },
      body: '',
    });
    expect(res.status).toBe(303);
    expect(await knex('class_sessions').where({ class_id: klass.id })).toHaveLength(0);
  });
});

describe('POST /api/classes/:id/rotate-code', () => {
  it('gives a new code, ends every class session, and the old code stops working', async () => {
    const klass = await classCreateDirect(knex, teacher, 'Rotate me');
    const student = await classSessionCookie(knex, klass.id);
    await classSessionCookie(knex, klass.id);
    const res = await api(`/api/classes/${klass.id}/rotate-code`, {
      method: 'POST',
      headers: { cookie: teacherCookie, origin: BASE_URL },
    });
    expect(res.status).toBe(200);
    const body = (await res.json()) as { joinCode: string; sessionsEnded: number };
    expect(body.sessionsEnded).toBe(2);
    expect(body.joinCode).not.toBe(klass.code);
    expect((await api('/api/classes/current', { headers: { cookie: student } })).status).toBe(401);
    expect((await postJson('/api/classes/join', { code: klass.code })).status).toBe(400);
    expect((await postJson('/api/classes/join', { code: body.joinCode })).status).toBe(200);
    const event = await knex('audit_events').where({ target_id: klass.id, action: 'class.code_rotated' }).first();
    expect(event.actor_id).toBe(teacher.id);
  });
});
