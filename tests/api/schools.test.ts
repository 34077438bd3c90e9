/**
 * The schools directory: edits and acceptance, near-duplicate flags (pg_trgm), and merging two schools in
 * one transaction — every teacher, class, kit and event kept, attendance summed, and the reach figures of the
 * kept school after the merge equal the two schools' figures before it. The merge fixtures live in 2019 so
 * no other test's rows fall in their period.
 */
import type { Knex } from 'knex';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REACH_FIGURE_IDS, type ReachFigureId } from '../../src/lib/reach/figures';
import { testKnex } from '../db/database';
import { accountCreate, userSessionCookie } from './auth-helpers';
import { api, BASE_URL } from './harness';

let knex: Knex;
let cookie: string;
let coordinatorId: string;
const tag = Date.now().toString(36);

beforeAll(async () => {
  knex = testKnex();
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'schools-coordinator' });
  coordinatorId = coordinator.id;
  cookie = await userSessionCookie(knex, coordinator.id);
});
afterAll(async () => {
  await knex?.destroy();
});

function send(method: string, path: string, body: unknown): Promise<Response> {
  return api(path, {
    method,
    headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
}

async function schoolInsert(name: string, status: 'approved' | 'proposed' = 'approved'): Promise<string> {
  const [row] = await knex('schools')
    .insert({ name, city: `Town ${tag}`, region: `Merge Region ${tag}`, status })
    .returning(['id']);
  return row.id;
}

/** A teacher, a class, a kit and a published entry at the school, dated in 2019. */
async function schoolActivity(schoolId: string, label: string, students: number) {
  const teacher = await accountCreate(knex, { role: 'teacher', label, schoolId });
  const [klass] = await knex('classes')
    .insert({
      teacher_id: teacher.id,
      school_id: schoolId,
      name: `${label} class`,
      grade_band: '3-5',
      student_count: students,
      join_code: `M${label.slice(0, 2).toUpperCase()}${tag.toUpperCase()}`.slice(0, 8).padEnd(8, 'Z'),
    })
    .returning(['id']);
  const at = new Date('2019-05-06T12:00:00Z');
  const [kit] = await knex('kits')
    .insert({
      class_id: klass.id,
      teacher_id: teacher.id,
      title: `${label} kit`,
      model_id: 'wren-3u',
      activity_slug: 'shake-test',
      inputs: '{}',
      engine_version: 'test',
      content_hash: 'test',
      created_at: at,
    })
    .returning(['id']);
  await knex('entries').insert({
    class_id: klass.id,
    author_kind: 'teacher',
    title: `${label} entry`,
    state: 'published',
    published_at: at,
    activity_slug: 'shake-test',
  });
  return { teacherId: teacher.id, classId: klass.id as string, kitId: kit.id as string };
}

async function figuresOf(schoolId: string): Promise<Record<ReachFigureId, number>> {
  const res = await api(`/api/reach/figures?from=2019-04-01&to=2019-07-01&schoolId=${schoolId}`, {
    headers: { cookie },
  });
  expect(res.status).toBe(200);
  const body = (await res.json()) as { figures: { id: ReachFigureId; value: number }[] };
  return Object.fromEntries(body.figures.map((f) => [f.id, f.value])) as Record<ReachFigureId, number>;
}

describe('POST /api/schools/[id]/merge', () => {
  it('moves every teacher, class, kit and event to the kept school, and the figures add up', async () => {
    const keep = await schoolInsert(`Cedar Hollow Middle School ${tag}`);
    const merge = await schoolInsert(`Cedar Hollow Middle ${tag}`, 'proposed');
    const a = await schoolActivity(keep, 'keepside', 21);
    const b = await schoolActivity(merge, 'mergeside', 17);
    const [event] = await knex('events')
      .insert({
        title: `Merge fair ${tag}`,
        kind: 'workshop',
        state: 'published',
        school_id: merge,
        starts_at: new Date('2019-05-10T15:00:00Z'),
      })
      .returning(['id']);
    await knex('event_attendance').insert([
      { event_id: event.id, school_id: keep, attendee_count: 10 },
      { event_id: event.id, school_id: merge, attendee_count: 7 },
    ]);

    const before = { keep: await figuresOf(keep), merge: await figuresOf(merge) };
    expect(before.merge.students).toBe(17);
    const res = await send('POST', `/api/schools/${merge}/merge`, { intoId: keep });
    expect(res.status).toBe(200);
    const after = await figuresOf(keep);

    // Additive figures: the kept school's value after = the sum of both before.
    const countedOnce: ReachFigureId[] = ['schools', 'events'];
    for (const figure of REACH_FIGURE_IDS.filter((f) => !countedOnce.includes(f))) {
      expect(after[figure], figure).toBe(before.keep[figure] + before.merge[figure]);
    }
    // Counted once per school or event: both schools had it, the merged one has it once.
    expect(after.schools).toBe(1);
    expect(after.events).toBe(1);

    expect(await knex('schools').where({ id: merge }).first()).toBeUndefined();
    expect((await knex('users').where({ id: b.teacherId }).first('school_id')).school_id).toBe(keep);
    expect((await knex('classes').where({ id: b.classId }).first('school_id')).school_id).toBe(keep);
    expect(await knex('kits').whereIn('id', [a.kitId, b.kitId]).count('* as n').first()).toEqual({ n: '2' });
    expect((await knex('events').where({ id: event.id }).first('school_id')).school_id).toBe(keep);
    expect(await knex('event_attendance').where({ event_id: event.id }).select('school_id', 'attendee_count')).toEqual([
      { school_id: keep, attendee_count: 17 },
    ]);
    const audit = await knex('audit_events').where({ action: 'school.merged', target_id: keep }).first();
    expect(audit.actor_id).toBe(coordinatorId);
    expect(audit.details.mergedId).toBe(merge);
    expect(audit.details.moved).toMatchObject({ 'users.school_id': 1, 'classes.school_id': 1, 'events.school_id': 1 });
  });

  it('refuses to merge a school into itself (400) or into one that does not exist (404), changing nothing', async () => {
    const id = await schoolInsert(`Solo School ${tag}`);
    expect((await send('POST', `/api/schools/${id}/merge`, { intoId: id })).status).toBe(400);
    const missing = await send('POST', `/api/schools/${id}/merge`, { intoId: '00000000-0000-4000-8000-000000000000' });
    expect(missing.status).toBe(404);
    expect(((await missing.json()) as { error: { code: string } }).error.code).toBe('not_found');
    expect(await knex('schools').where({ id }).first('id')).toEqual({ id });
  });
});

describe('GET /api/schools/proposals', () => {
  it('flags an existing school with a near-duplicate name (trigram similarity), and not an unrelated one', async () => {
    const existing = await schoolInsert(`Willowmere Academy ${tag}`);
    const proposed = await schoolInsert(`Willowmere Acadamy ${tag}`, 'proposed');
    const lone = await schoolInsert(`Zzyzx Observatory Charter ${tag}`, 'proposed');
    const res = await api('/api/schools/proposals', { headers: { cookie } });
    expect(res.status).toBe(200);
    const { proposals } = (await res.json()) as {
      proposals: { school: { id: string }; similar: { id: string; similarity: number }[] }[];
    };
    const flagged = proposals.find((p) => p.school.id === proposed)!;
    expect(flagged.similar[0]!.id).toBe(existing);
    // pg_trgm's similarity of these two lower-cased names, computed by PostgreSQL itself as the reference.
    const { rows } = await knex.raw('SELECT similarity(lower(?), lower(?)) AS s', [
      `Willowmere Academy ${tag}`,
      `Willowmere Acadamy ${tag}`,
    ]);
    expect(flagged.similar[0]!.similarity).toBeCloseTo(Number(rows[0].s), 3);
    expect(proposals.find((p) => p.school.id === lone)!.similar.map((s) => s.id)).not.toContain(existing);
  });

  it('gives each proposal every directory field, so a coordinator can edit it where it waits', async () => {
    const id = await schoolInsert(`Osprey Landing School ${tag}`, 'proposed');
    await knex('schools').where({ id }).update({ district: 'Osprey District', high_need_year: 2024 });
    const { proposals } = (await (await api('/api/schools/proposals', { headers: { cookie } })).json()) as {
      proposals: { school: Record<string, unknown> }[];
    };
    expect(proposals.find((p) => p.school.id === id)!.school).toMatchObject({
      name: `Osprey Landing School ${tag}`,
      district: 'Osprey District',
      region: `Merge Region ${tag}`,
      highNeedYear: 2024,
      status: 'proposed',
      teacherCount: 0,
      classCount: 0,
    });
  });
});

describe('GET /api/schools/directory.csv', () => {
  it('parses back with papaparse into the directory under the same filters, every page, row for row', async () => {
    const names = ['Alder Point School', 'Birch Run School', 'Cobble Ford School', '=SUM(1+1) School'];
    for (const [i, name] of names.entries()) {
      const id = await schoolInsert(`${name} ${tag}`);
      await knex('schools')
        .where({ id })
        .update({ high_need: i !== 1, high_need_basis: i !== 1 ? '70% free or reduced-price meals' : '' });
    }
    const filters = `q=${tag}&highNeed=true&status=approved`;
    const pages: Record<string, unknown>[] = [];
    for (let page = 1; page <= 2; page++) {
      const res = await api(`/api/schools/directory?${filters}&pageSize=2&page=${page}`, { headers: { cookie } });
      pages.push(...((await res.json()) as { schools: Record<string, unknown>[] }).schools);
    }
    expect(pages.length).toBe(3);
    const res = await api(`/api/schools/directory.csv?${filters}&pageSize=2`, { headers: { cookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    // papaparse, an independent CSV reader, reads the file back (it keeps the byte-order mark out of the cells).
    const parsed = Papa.parse<string[]>((await res.text()).replace(/^\uFEFF/, ''), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual([
      'School',
      'City',
      'District',
      'Region',
      'Country',
      'Setting',
      'Grade bands',
      'High-need',
      'High-need basis',
      'Basis year',
      'Status',
      'Teachers',
      'Classes',
    ]);
    // OWASP "CSV Injection": a cell starting with = is prefixed with ' so a spreadsheet reads it as text.
    const cell = (name: unknown) => (String(name).startsWith('=') ? `'${name}` : String(name));
    expect(rows.map((r) => [r[0], r[3], r[7], r[10]])).toEqual(
      pages.map((s) => [cell(s.name), s.region, 'yes', 'approved']),
    );
  });

  it('answers a bad filter with 400 and the field at fault', async () => {
    const res = await api('/api/schools/directory.csv?setting=lunar', { headers: { cookie } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: { fields: object } }).error.fields).toHaveProperty('setting');
  });
});

describe('PATCH /api/schools/[id]', () => {
  it('accepts a proposed school with its directory fields and writes the audit log', async () => {
    const id = await schoolInsert(`Heron Bay Primary ${tag}`, 'proposed');
    const res = await send('PATCH', `/api/schools/${id}`, {
      status: 'approved',
      district: 'Heron Unified',
      gradeBands: ['K-2', '3-5'],
      highNeed: true,
      highNeedBasis: '67% eligible for free or reduced-price meals',
      highNeedYear: 2025,
    });
    expect(res.status).toBe(200);
    const { school } = (await res.json()) as { school: Record<string, unknown> };
    expect(school).toMatchObject({
      status: 'approved',
      district: 'Heron Unified',
      gradeBands: ['K-2', '3-5'],
      highNeed: true,
      highNeedYear: 2025,
    });
    expect(await knex('audit_events').where({ action: 'school.accepted', target_id: id }).first('id')).toBeTruthy();
  });

  it('answers a high-need flag without its basis, an unknown field and a taken name with 400, 400 and 409', async () => {
    const id = await schoolInsert(`Osprey Point School ${tag}`);
    await schoolInsert(`Osprey Point Annex ${tag}`);
    const noBasis = await send('PATCH', `/api/schools/${id}`, { highNeed: true });
    expect(noBasis.status).toBe(400);
    expect(((await noBasis.json()) as { error: { fields: object } }).error.fields).toHaveProperty('highNeedBasis');
    expect((await send('PATCH', `/api/schools/${id}`, { colour: 'red' })).status).toBe(400);
    expect((await send('PATCH', `/api/schools/${id}`, { name: `Osprey Point Annex ${tag}` })).status).toBe(409);
  });
});

describe('GET /api/schools/directory', () => {
  it('filters by status and text and pages with the total across pages', async () => {
    const res = await api(`/api/schools/directory?q=${encodeURIComponent(tag)}&status=approved&pageSize=1`, {
      headers: { cookie },
    });
    expect(res.status).toBe(200);
    const body = (await res.json()) as { schools: { status: string }[]; total: number };
    expect(body.schools).toHaveLength(1);
    expect(body.total).toBeGreaterThan(1);
    expect(body.schools.every((s) => s.status === 'approved')).toBe(true);
  });
});

describe('every reach and schools directory route', () => {
  it('answers 401 to anonymous callers and 403 to teachers, with the JSON error shape', async () => {
    const teacher = await accountCreate(knex, { role: 'teacher', label: 'reach-denied' });
    const teacherCookie = await userSessionCookie(knex, teacher.id);
    const paths = [
      '/api/reach/figures?quarter=2026-Q1',
      '/api/reach/breakdown?quarter=2026-Q1',
      '/api/reach/breakdown.csv?quarter=2026-Q1',
      '/api/reach/rows?quarter=2026-Q1&figure=kits',
      '/api/reach/rows.csv?quarter=2026-Q1&figure=kits',
      '/api/reach/report.pdf?quarter=2026-Q1',
      '/api/schools/directory',
      '/api/schools/proposals',
    ];
    for (const path of paths) {
      const anonymous = await api(path);
      expect(anonymous.status, path).toBe(401);
      expect(((await anonymous.json()) as { error: { code: string } }).error.code).toBe('not_signed_in');
      const denied = await api(path, { headers: { cookie: teacherCookie } });
      expect(denied.status, path).toBe(403);
      expect(((await denied.json()) as { error: { code: string } }).error.code).toBe('forbidden');
    }
  });
});
