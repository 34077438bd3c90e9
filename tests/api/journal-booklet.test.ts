/**
 * GET /api/entries/booklet.pdf against the running test server, read back by pdf.js: a teacher prints every entry
 * of their class, each with its state; a coordinator prints one school's published entries only, with their photos.
 */
import type { Knex } from 'knex';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { pdfPageTexts, pdfTextSquash as squash } from '../fixtures/pdf-text';
import { photoJpeg } from '../fixtures/photos';
import { accountCreate, classCreateDirect, userSessionCookie } from './auth-helpers';
import { api, BASE_URL } from './harness';

let knex: Knex;
const stamp = Date.now().toString(36);
const fx = {} as {
  schoolId: string;
  teacher: string;
  coordinator: string;
  classId: string;
  published: string;
  draft: string;
  otherSchoolPublished: string;
};

/** A teacher's entry made through the API, then put in `state` directly (the review flow is tested elsewhere). */
async function entryMade(cookie: string, classId: string, title: string, state: string): Promise<string> {
  const res = await api('/api/entries', {
    method: 'POST',
    headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' },
    body: JSON.stringify({ classId, title, body: `Words of ${title}.` }),
  });
  const id = ((await res.json()) as { entry: { id: string } }).entry.id;
  if (state !== 'draft') {
    await knex('entries')
      .where({ id })
      .update({ state, teacher_approved: true, submitted_at: knex.fn.now(), published_at: knex.fn.now() });
  }
  return id;
}

beforeAll(async () => {
  knex = testKnex();
  const [school, other] = (await knex('schools')
    .insert([{ name: `Booklet School ${stamp}` }, { name: `Booklet Other School ${stamp}` }])
    .returning('id')) as { id: string }[];
  fx.schoolId = school!.id;
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'booklet-teacher', schoolId: fx.schoolId });
  const otherTeacher = await accountCreate(knex, { role: 'teacher', label: 'booklet-other', schoolId: other!.id });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'booklet-coord' });
  fx.teacher = await userSessionCookie(knex, teacher.id);
  fx.coordinator = await userSessionCookie(knex, coordinator.id);
  fx.classId = (await classCreateDirect(knex, teacher, `Booklet class ${stamp}`)).id;
  fx.published = `Published booklet entry ${stamp}`;
  fx.draft = `Draft booklet entry ${stamp}`;
  fx.otherSchoolPublished = `Other school entry ${stamp}`;
  const publishedId = await entryMade(fx.teacher, fx.classId, fx.published, 'draft');
  const form = new FormData();
  form.append('altText', `Booklet photo ${stamp}`);
  form.append('photo', new Blob([new Uint8Array(await photoJpeg(320, 240))]), 'probe.jpg');
  const upload = await api(`/api/entries/${publishedId}/photos`, {
    method: 'POST',
    headers: { cookie: fx.teacher, origin: BASE_URL },
    body: form,
  });
  expect(upload.status, await upload.clone().text()).toBe(201);
  await knex('entries')
    .where({ id: publishedId })
    .update({ state: 'published', teacher_approved: true, submitted_at: knex.fn.now(), published_at: knex.fn.now() });
  await entryMade(fx.teacher, fx.classId, fx.draft, 'draft');
  const otherClass = (await classCreateDirect(knex, otherTeacher, `Other booklet class ${stamp}`)).id;
  await entryMade(await userSessionCookie(knex, otherTeacher.id), otherClass, fx.otherSchoolPublished, 'published');
});

afterAll(async () => {
  await knex?.destroy();
});

/** The booklet as the cookie's owner gets it: status, its pages' text and the images painted. */
async function booklet(cookie: string, query: string) {
  const res = await api(`/api/entries/booklet.pdf?${query}`, { headers: { cookie } });
  if (res.status !== 200) return { status: res.status, text: '', images: 0, body: await res.text() };
  expect(res.headers.get('content-type')).toBe('application/pdf');
  const bytes = new Uint8Array(await res.arrayBuffer());
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  let images = 0;
  for (let n = 1; n <= doc.numPages; n++)
    images += (await (await doc.getPage(n)).getOperatorList()).fnArray.filter(
      (f) => f === OPS.paintImageXObject,
    ).length;
  return { status: 200, text: (await pdfPageTexts(bytes)).map(squash).join(''), images, body: '' };
}

describe('GET /api/entries/booklet.pdf', () => {
  it('gives a teacher every entry of their class, each with its state, and the photo', async () => {
    const b = await booklet(fx.teacher, `classId=${fx.classId}`);
    expect(b.status).toBe(200);
    expect(b.text).toContain(squash(fx.published));
    expect(b.text).toContain(squash(`${fx.draft}`));
    expect(b.text).toContain(squash('· Draft'));
    expect(b.text).toContain(squash(`Booklet photo ${stamp}`));
    expect(b.images).toBe(1);
  });

  it('gives a coordinator one school’s published entries only, with their photos', async () => {
    const b = await booklet(fx.coordinator, `schoolId=${fx.schoolId}`);
    expect(b.status).toBe(200);
    expect(b.text).toContain(squash(`Booklet School ${stamp} journal`));
    expect(b.text).toContain(squash(fx.published));
    expect(b.text).not.toContain(squash(fx.draft));
    expect(b.text).not.toContain(squash(fx.otherSchoolPublished));
    expect(b.images).toBe(1);
  });

  it('refuses a school to a teacher and both a class and a school at once, saying what to send', async () => {
    const forTeacher = await booklet(fx.teacher, `schoolId=${fx.schoolId}`);
    expect(forTeacher.status).toBe(403);
    const both = await booklet(fx.coordinator, `schoolId=${fx.schoolId}&classId=${fx.classId}`);
    expect(both.status).toBe(400);
    expect(both.body).toMatch(/either a class \(\?classId=\) or a school \(\?schoolId=\)/);
  });
});
