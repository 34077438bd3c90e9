/** The public journal pages show published entries only: an unpublished one is on no page, by any URL. */
import type { Knex } from 'knex';
import sharp from 'sharp';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { api, BASE_URL } from './harness';
import { accountCreate, classCreateDirect, userSessionCookie } from './auth-helpers';

const SLUG = 'clean-room-build';
const CHECKLIST = { noFacesOrNames: true, noPersonalData: true, onTopic: true, respectful: true };
let knex: Knex;

beforeAll(() => {
  knex = testKnex();
});
afterAll(async () => {
  await knex?.destroy();
});

it('lists a published entry on its activity page, class page and home page, and never a draft', async () => {
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'pages-teacher' });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'pages-coord' });
  const klass = await classCreateDirect(knex, teacher, 'Pages class');
  const t = await userSessionCookie(knex, teacher.id);
  const c = await userSessionCookie(knex, coordinator.id);
  const post = (cookie: string, path: string, body: unknown) =>
    api(path, {
      method: 'POST',
      headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });
  const stamp = Date.now().toString(36);
  const make = async (title: string) => {
    const res = await post(t, '/api/entries', { classId: klass.id, title, activitySlug: SLUG, body: 'Gloves *on*.' });
    return ((await res.json()) as { entry: { id: string } }).entry.id;
  };
  const shown = await make(`Shown ${stamp}`);
  await make(`Hidden draft ${stamp}`);
  const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#0d6b62' } })
    .png()
    .toBuffer();
  const form = new FormData();
  form.append('altText', `Paper probe ${stamp}`);
  form.append('photo', new Blob([png], { type: 'image/png' }), 'probe.png');
  const upload = await api(`/api/entries/${shown}/photos`, {
    method: 'POST',
    headers: { cookie: t, origin: BASE_URL },
    body: form,
  });
  expect(upload.status, await upload.clone().text()).toBe(201);
  const thumb = ((await upload.json()) as { photos: { thumbnailUrl: string }[] }).photos[0]!.thumbnailUrl;
  expect((await api(thumb)).status).toBe(404);
  expect((await post(t, `/api/entries/${shown}/submit`, { photosConfirmed: true })).status).toBe(200);
  expect((await post(c, `/api/review/${shown}/decision`, { decision: 'publish', checklist: CHECKLIST })).status).toBe(
    200,
  );

  for (const path of [`/activities/${SLUG}/journal`, `/journal/classes/${klass.id}`, '/']) {
    const res = await api(path);
    expect(res.status, path).toBe(200);
    const html = await res.text();
    expect(html, path).toContain(`Shown ${stamp}`);
    expect(html, path).not.toContain(`Hidden draft ${stamp}`);
  }
  const activityHtml = await (await api(`/activities/${SLUG}/journal`)).text();
  expect(activityHtml).toContain(`alt="Paper probe ${stamp}"`);
  expect(activityHtml).toContain(thumb);
  expect((await api(thumb)).status).toBe(200);
  // A class with nothing published has no public page.
  const empty = await classCreateDirect(knex, teacher, 'Empty class');
  expect((await api(`/journal/classes/${empty.id}`)).status).toBe(404);
});
