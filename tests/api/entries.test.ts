/**
 * Journal entries end to end through the API: who sees an unpublished entry (404 to everyone else), the team entry
 * waiting for its teacher, return with a note, withdraw, the audit trail, and the concurrency promises: two
 * coordinators deciding one entry at once end with one decision, one audit row and one e-mail; 200 entries
 * submitted at once and published in one bulk action are all published exactly once.
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { api, BASE_URL } from './harness';
import {
  accountCreate,
  classCreateDirect,
  classSessionCookie,
  mailWait,
  schoolIdByName,
  userSessionCookie,
  type TestAccount,
} from './auth-helpers';

const CHECKLIST = { noFacesOrNames: true, noPersonalData: true, onTopic: true, respectful: true };

let knex: Knex;
let teacher: TestAccount;
let classId: string;
const cookies: Record<'teacher' | 'other' | 'coordinator' | 'coordinator2' | 'team' | 'otherTeam', string> =
  {} as never;

function call(who: keyof typeof cookies | null, path: string, method = 'GET', body?: unknown) {
  const headers: Record<string, string> = { origin: BASE_URL };
  if (who) headers.cookie = cookies[who];
  if (body !== undefined) headers['content-type'] = 'application/json';
  return api(path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
}

async function created(who: 'teacher' | 'team', body: Record<string, unknown>): Promise<string> {
  const res = await call(who, '/api/entries', 'POST', { ...(who === 'teacher' ? { classId } : {}), ...body });
  expect(res.status, await res.clone().text()).toBe(201);
  return ((await res.json()) as { entry: { id: string } }).entry.id;
}

beforeAll(async () => {
  knex = testKnex();
  const juniper = await schoolIdByName(knex, 'Juniper Flats Middle School');
  teacher = await accountCreate(knex, { role: 'teacher', label: 'journal-teacher', schoolId: juniper });
  const other = await accountCreate(knex, { role: 'teacher', label: 'journal-other', schoolId: juniper });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'journal-coord' });
  const coordinator2 = await accountCreate(knex, { role: 'coordinator', label: 'journal-coord2' });
  classId = (await classCreateDirect(knex, teacher, 'Journal class')).id;
  const otherClass = (await classCreateDirect(knex, other, 'Other journal class')).id;
  cookies.teacher = await userSessionCookie(knex, teacher.id);
  cookies.other = await userSessionCookie(knex, other.id);
  cookies.coordinator = await userSessionCookie(knex, coordinator.id);
  cookies.coordinator2 = await userSessionCookie(knex, coordinator2.id);
  cookies.team = await classSessionCookie(knex, classId);
  cookies.otherTeam = await classSessionCookie(knex, otherClass);
});

afterAll(async () => {
  await knex?.destroy();
});

describe('entries', () => {
  it('keeps an unpublished entry at 404 for everyone but its class, its teacher and coordinators', async () => {
    const id = await created('teacher', { title: 'Drop test', body: 'We **dropped** it. <script>x()</script>' });
    for (const who of [null, 'other', 'otherTeam'] as const)
      expect((await call(who, `/api/entries/${id}`)).status, String(who)).toBe(404);
    for (const who of ['teacher', 'team', 'coordinator'] as const)
      expect((await call(who, `/api/entries/${id}`)).status, who).toBe(200);
    const entry = ((await (await call('teacher', `/api/entries/${id}`)).json()) as { entry: { bodyHtml: string } })
      .entry;
    expect(entry.bodyHtml).toContain('<strong>dropped</strong>');
    expect(entry.bodyHtml).not.toContain('<script');
    // The team may not change the teacher's entry; another teacher does not see it.
    expect((await call('team', `/api/entries/${id}`, 'PATCH', { title: 'Ours' })).status).toBe(404);
    expect((await call('other', `/api/entries/${id}`, 'PATCH', { title: 'Mine' })).status).toBe(404);
  });

  it('publishes a submitted entry, returns another with a note that comes back as an editable draft', async () => {
    const pub = await created('teacher', { title: 'Published one' });
    const ret = await created('teacher', { title: 'Returned one' });
    for (const id of [pub, ret])
      expect((await call('teacher', `/api/entries/${id}/submit`, 'POST', {})).status).toBe(200);
    // Submitted entries cannot change.
    expect((await call('teacher', `/api/entries/${pub}`, 'PATCH', { title: 'Late' })).status).toBe(409);
    // Publishing needs every checklist box.
    const partial = await call('coordinator', `/api/review/${pub}/decision`, 'POST', {
      decision: 'publish',
      checklist: { ...CHECKLIST, respectful: false },
    });
    expect(partial.status).toBe(400);
    expect(
      (await call('coordinator', `/api/review/${pub}/decision`, 'POST', { decision: 'publish', checklist: CHECKLIST }))
        .status,
    ).toBe(200);
    expect((await call(null, `/api/entries/${pub}`)).status).toBe(200);
    await mailWait(teacher.email, /published: Published one/);

    const returned = await call('coordinator', `/api/review/${ret}/decision`, 'POST', {
      decision: 'return',
      note: 'Please add the drop height.',
    });
    expect(returned.status).toBe(200);
    expect((await call(null, `/api/entries/${ret}`)).status).toBe(404);
    const back = (
      (await (await call('teacher', `/api/entries/${ret}`)).json()) as {
        entry: { state: string; reviewNote: string; editable: boolean };
      }
    ).entry;
    expect(back).toMatchObject({ state: 'returned', reviewNote: 'Please add the drop height.', editable: true });
    const mail = await mailWait(teacher.email, /returned for changes: Returned one/);
    expect(mail.text).toContain('Please add the drop height.');
    expect((await call('teacher', `/api/entries/${ret}`, 'PATCH', { body: 'From 2 m.' })).status).toBe(200);

    const audit = (
      (await (await call('teacher', `/api/entries/${ret}/audit`)).json()) as {
        events: { action: string; from: string | null; to: string | null }[];
      }
    ).events;
    expect(audit.map((e) => [e.action, e.from, e.to]).reverse()).toEqual([
      ['entry.created', null, 'draft'],
      ['entry.submit', 'draft', 'submitted'],
      ['entry.return', 'submitted', 'returned'],
    ]);
  });

  it('holds a team entry out of the queue until its teacher approves it', async () => {
    const id = await created('team', { title: 'Team Comet log', teamName: 'Team Comet' });
    expect((await call('team', `/api/entries/${id}/submit`, 'POST', {})).status).toBe(200);
    const inQueue = async () => {
      const res = await call('coordinator', `/api/review/queue?classId=${classId}&pageSize=100`);
      return ((await res.json()) as { entries: { id: string }[] }).entries.some((e) => e.id === id);
    };
    expect(await inQueue()).toBe(false);
    expect(
      (await call('coordinator', `/api/review/${id}/decision`, 'POST', { decision: 'publish', checklist: CHECKLIST }))
        .status,
    ).toBe(409);
    expect((await call('team', `/api/entries/${id}/approve`, 'POST', {})).status).toBe(403);
    expect((await call('other', `/api/entries/${id}/approve`, 'POST', {})).status).toBe(404);
    expect((await call('teacher', `/api/entries/${id}/approve`, 'POST', {})).status).toBe(200);
    expect(await inQueue()).toBe(true);
    // The teacher can still withdraw it: back to a draft the team may edit.
    expect((await call('teacher', `/api/entries/${id}/withdraw`, 'POST')).status).toBe(200);
    expect(await inQueue()).toBe(false);
    expect((await call('team', `/api/entries/${id}`, 'PATCH', { body: 'More notes' })).status).toBe(200);
  });

  it('refuses a team entry without a team name and a fourth saved result', async () => {
    const res = await call('team', '/api/entries', 'POST', { title: 'No team' });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: { fields?: Record<string, string[]> } }).error.fields).toHaveProperty(
      'teamName',
    );
    const result = {
      tool: 'thermal',
      toolVersion: '1.0.0',
      inputsSummary: 'demo',
      result: { k: 1 },
      plot: { kind: 'line', title: 'T', xLabel: 'x', yLabel: 'y', series: [{ label: 'a', points: [[0, 1]] }] },
    };
    const id = await created('teacher', { title: 'Three results', savedResults: [result, result, result] });
    const fourth = await call('teacher', `/api/entries/${id}/results`, 'POST', { savedResult: result });
    expect(fourth.status).toBe(409);
  });
});

describe('concurrent decisions', () => {
  it('two coordinators publishing one entry at once: one decision, one audit row, one e-mail, the other 409', async () => {
    const id = await created('teacher', { title: `Race ${Date.now()}` });
    expect((await call('teacher', `/api/entries/${id}/submit`, 'POST', {})).status).toBe(200);
    const answers = await Promise.all(
      (['coordinator', 'coordinator2'] as const).map((who) =>
        call(who, `/api/review/${id}/decision`, 'POST', { decision: 'publish', checklist: CHECKLIST }),
      ),
    );
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409]);
    const conflict = answers.find((r) => r.status === 409)!;
    expect(((await conflict.json()) as { error: { message: string } }).error.message).toMatch(
      /already decided by Test coordinator/,
    );
    const rows = await knex('audit_events').where({ target_id: id, action: 'entry.publish' });
    expect(rows).toHaveLength(1);
    await mailWait(teacher.email, new RegExp(`published: Race`));
    await new Promise((r) => setTimeout(r, 500));
    const mails = (await (
      await fetch(
        `${process.env.KW_TEST_MAIL_URL ?? 'http://127.0.0.1:2581'}/messages?to=${encodeURIComponent(teacher.email)}`,
      )
    ).json()) as { subject: string }[];
    const title = (await knex('entries').where({ id }).first('title')).title as string;
    expect(mails.filter((m) => m.subject.endsWith(title))).toHaveLength(1);
  });

  it('200 entries submitted concurrently and published in one bulk action: none lost, none published twice', async () => {
    const ids = await Promise.all(Array.from({ length: 200 }, (_, i) => created('teacher', { title: `Bulk ${i}` })));
    const submits = await Promise.all(ids.map((id) => call('teacher', `/api/entries/${id}/submit`, 'POST', {})));
    expect(submits.map((r) => r.status).filter((s) => s !== 200)).toEqual([]);
    // Two bulk publishes of the same rows at once: between them, each entry is published once.
    const [a, b] = await Promise.all(
      ['coordinator', 'coordinator2'].map((who) =>
        call(who as 'coordinator', '/api/review/bulk-publish', 'POST', { entryIds: ids, checklist: CHECKLIST }),
      ),
    );
    const ja = (await a!.json()) as { published: string[]; skipped: string[] };
    const jb = (await b!.json()) as { published: string[]; skipped: string[] };
    expect(ja.published.length + jb.published.length).toBe(200);
    expect(new Set([...ja.published, ...jb.published]).size).toBe(200);
    const states = await knex('entries').whereIn('id', ids).select('state');
    expect(states.filter((s) => s.state === 'published')).toHaveLength(200);
    const audits = await knex('audit_events').whereIn('target_id', ids).where({ action: 'entry.publish' });
    expect(audits).toHaveLength(200);
  });
});
