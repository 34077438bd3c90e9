/**
 * Journal photo uploads and serving, against the running test server, its database and its storage folder
 * (KW_STORAGE_DIR, set by scripts/test.ts). EXIF is read back with exifr (independent of sharp, which writes the
 * copies); types with file-type; orientation per the EXIF Orientation table (6 = turn 90° clockwise).
 */
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import exifr from 'exifr';
import { fileTypeFromBuffer } from 'file-type';
import type { Knex } from 'knex';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import {
  pdfDocument,
  photoBombPng,
  photoJpeg,
  photoJpegWithGps,
  photoNoiseJpeg,
  photoOrientation6,
  photoPng,
  photoPolyglot,
} from '../fixtures/photos';
import {
  accountCreate,
  classCreateDirect,
  classSessionCookie,
  schoolIdByName,
  userSessionCookie,
  type TestAccount,
} from './auth-helpers';
import { photoMetadataOf, PHOTO_JPEG_CLEAN } from '../fixtures/photo-metadata';
import { api, BASE_URL } from './harness';

const STORAGE_DIR = process.env.KW_STORAGE_DIR ?? '';
const ACCEPTED = 'Photos must be JPEG, PNG or WebP images of at most 10 MB and 50 megapixels, 6 to an entry.';

let knex: Knex;
let teacher: TestAccount;
let otherTeacher: TestAccount;
let coordinator: TestAccount;
let classId: string;
let otherClassId: string;
const cookie = {} as Record<
  'teacher' | 'otherTeacher' | 'coordinator' | 'admin' | 'classSession' | 'otherClass',
  string
>;

async function entryCreate(state = 'draft', authorKind: 'teacher' | 'team' = 'teacher'): Promise<string> {
  const [row] = await knex('entries')
    .insert({
      class_id: classId,
      author_kind: authorKind,
      team_name: authorKind === 'team' ? 'Team Comet' : null,
      author_id: authorKind === 'teacher' ? teacher.id : null,
      title: `Photo test ${state}`,
      state,
    })
    .returning(['id']);
  return row.id as string;
}

type Part = [bytes: Buffer, filename: string, altText?: string];

function upload(entryId: string, parts: Part[], as: string | null = cookie.teacher): Promise<Response> {
  const form = new FormData();
  for (const [bytes, filename, altText] of parts) {
    form.append('altText', altText ?? '');
    form.append('photo', new Blob([new Uint8Array(bytes)]), filename);
  }
  const headers: Record<string, string> = { origin: BASE_URL };
  if (as) headers.cookie = as;
  return api(`/api/entries/${entryId}/photos`, { method: 'POST', body: form, headers });
}

function get(path: string, as: string | null): Promise<Response> {
  return api(path, as ? { headers: { cookie: as } } : {});
}

/** Every file under the storage folder (data and metadata), to show a refused upload stored nothing. */
function storedFiles(): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    let names: string[];
    try {
      names = readdirSync(dir);
    } catch {
      return;
    }
    for (const name of names) {
      const full = join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else out.push(full);
    }
  };
  walk(STORAGE_DIR);
  return out.sort();
}

async function photoRowCount(entryId: string): Promise<number> {
  return Number((await knex('entry_photos').where({ entry_id: entryId }).count('* as n'))[0]!.n);
}

beforeAll(async () => {
  expect(STORAGE_DIR, 'scripts/test.ts sets KW_STORAGE_DIR').not.toBe('');
  knex = testKnex();
  const juniper = await schoolIdByName(knex, 'Juniper Flats Middle School');
  teacher = await accountCreate(knex, { role: 'teacher', label: 'photos-teacher', schoolId: juniper });
  otherTeacher = await accountCreate(knex, { role: 'teacher', label: 'photos-other', schoolId: juniper });
  coordinator = await accountCreate(knex, { role: 'coordinator', label: 'photos-coordinator' });
  const admin = await accountCreate(knex, { role: 'admin', label: 'photos-admin' });
  classId = (await classCreateDirect(knex, teacher, 'Photo class')).id;
  otherClassId = (await classCreateDirect(knex, otherTeacher, 'Other photo class')).id;
  cookie.teacher = await userSessionCookie(knex, teacher.id);
  cookie.otherTeacher = await userSessionCookie(knex, otherTeacher.id);
  cookie.coordinator = await userSessionCookie(knex, coordinator.id);
  cookie.admin = await userSessionCookie(knex, admin.id);
  cookie.classSession = await classSessionCookie(knex, classId);
  cookie.otherClass = await classSessionCookie(knex, otherClassId);
});

afterAll(async () => {
  await knex?.destroy();
});

describe('POST /api/entries/[id]/photos', () => {
  it('stores a photo without GPS or camera make/model, as JPEG copies of at most 1600 and 400 px', async () => {
    const entryId = await entryCreate();
    const res = await upload(entryId, [[await photoJpegWithGps(), 'field.jpg', 'Our probe model on the bench']]);
    expect(res.status).toBe(201);
    const { photos } = (await res.json()) as {
      photos: { id: string; url: string; thumbnailUrl: string; altText: string }[];
    };
    expect(photos).toHaveLength(1);
    expect(photos[0]!.altText).toBe('Our probe model on the bench');

    for (const url of [photos[0]!.url, photos[0]!.thumbnailUrl]) {
      const got = await get(url, cookie.teacher);
      expect(got.status).toBe(200);
      expect(got.headers.get('content-type')).toBe('image/jpeg');
      expect(got.headers.get('cache-control')).toBe('private, no-store');
      expect(await photoMetadataOf(Buffer.from(await got.arrayBuffer()))).toEqual(PHOTO_JPEG_CLEAN);
    }
    // What is on disk is the stripped copy too (never the original).
    for (const file of storedFiles().filter((f) => f.includes(entryId) && f.endsWith('.jpg'))) {
      expect(await exifr.gps(file)).toBeUndefined();
    }
  });

  it('stores a photo tagged orientation 6 upright', async () => {
    const entryId = await entryCreate();
    const res = await upload(entryId, [[await photoOrientation6(), 'sideways.jpg']]);
    expect(res.status).toBe(201);
    const { photos } = (await res.json()) as { photos: { url: string; widthPx: number; heightPx: number }[] };
    expect([photos[0]!.widthPx, photos[0]!.heightPx]).toEqual([40, 60]);
    const meta = await sharp(Buffer.from(await (await get(photos[0]!.url, cookie.teacher)).arrayBuffer())).metadata();
    expect([meta.width, meta.height, meta.orientation]).toEqual([40, 60, undefined]);
  });

  it('takes a PNG named .jpg as a PNG (the bytes decide)', async () => {
    const entryId = await entryCreate();
    const res = await upload(entryId, [[await photoPng(), 'renamed.jpg']]);
    expect(res.status).toBe(201);
    const { photos } = (await res.json()) as { photos: { sourceType: string }[] };
    expect(photos[0]!.sourceType).toBe('image/png');
    expect((await knex('entry_photos').where({ entry_id: entryId }).first()).source_type).toBe('image/png');
  });

  it('lets a team add photos to its own team entry through the class session', async () => {
    const entryId = await entryCreate('draft', 'team');
    expect((await upload(entryId, [[await photoJpeg(), 'team.jpg']], cookie.classSession)).status).toBe(201);
  });

  describe('refuses, with a message that says what is accepted, and stores nothing', () => {
    const cases: [string, () => Promise<Part[]> | Part[], number, RegExp][] = [
      [
        'a JPEG header followed by a script (polyglot)',
        () => [[photoPolyglot(), 'poly.jpg']],
        400,
        /carries "<script"/,
      ],
      ['a PDF named .png', () => [[pdfDocument(), 'report.png']], 400, /application\/pdf/],
      ['a 0-byte file', () => [[Buffer.alloc(0), 'empty.jpg']], 400, /empty \(0 bytes\)/],
      ['an 11 MB photo', async () => [[await photoNoiseJpeg(11_000_000), 'huge.jpg']], 413, /larger than the 10 MB/],
      ['a PNG declaring 50,000 × 50,000 px', () => [[photoBombPng(), 'bomb.png']], 400, /2,500 megapixels/],
      [
        'a good photo sent with a bad one (all or nothing)',
        async () => [
          [await photoJpeg(), 'good.jpg'],
          [pdfDocument(), 'bad.png'],
        ],
        400,
        /application\/pdf/,
      ],
    ];
    for (const [what, parts, status, message] of cases) {
      it(what, async () => {
        const entryId = await entryCreate();
        const before = storedFiles();
        const res = await upload(entryId, await parts());
        expect(res.status).toBe(status);
        const body = (await res.json()) as { error: { code: string; message: string } };
        expect(body.error.message).toMatch(message);
        if (status === 400) expect(body.error.message).toContain(ACCEPTED);
        expect(await photoRowCount(entryId)).toBe(0);
        expect(storedFiles()).toEqual(before);
      });
    }

    it('a seventh photo on an entry that has six', async () => {
      const entryId = await entryCreate();
      const six: Part[] = [];
      for (let i = 0; i < 6; i++) six.push([await photoJpeg(120 + i, 90), `p${i}.jpg`]);
      expect((await upload(entryId, six)).status).toBe(201);
      const before = storedFiles();
      const res = await upload(entryId, [[await photoJpeg(), 'seventh.jpg']]);
      expect(res.status).toBe(400);
      const { error } = (await res.json()) as { error: { message: string } };
      expect(error.message).toMatch(/has 6 photos/);
      expect(error.message).toContain(ACCEPTED);
      expect(await photoRowCount(entryId)).toBe(6);
      expect(storedFiles()).toEqual(before);
    });

    it('seven photos in one request', async () => {
      const entryId = await entryCreate();
      const seven: Part[] = [];
      for (let i = 0; i < 7; i++) seven.push([await photoJpeg(100, 80), `p${i}.jpg`]);
      const before = storedFiles();
      const res = await upload(entryId, seven);
      expect(res.status).toBe(413);
      expect(((await res.json()) as { error: { message: string } }).error.message).toBe(
        'Send at most 6 photos at a time.',
      );
      expect(await photoRowCount(entryId)).toBe(0);
      expect(storedFiles()).toEqual(before);
    });

    it('a body that is not multipart', async () => {
      const entryId = await entryCreate();
      const res = await api(`/api/entries/${entryId}/photos`, {
        method: 'POST',
        headers: { origin: BASE_URL, cookie: cookie.teacher, 'content-type': 'application/json' },
        body: '{}',
      });
      expect(res.status).toBe(400);
      expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(/multipart\/form-data/);
    });
  });

  it('answers 409 for a submitted entry, 404 to another teacher or class, 403 to a coordinator', async () => {
    const submitted = await entryCreate('submitted');
    const draft = await entryCreate();
    const jpeg = await photoJpeg();
    expect((await upload(submitted, [[jpeg, 'a.jpg']])).status).toBe(409);
    expect((await upload(draft, [[jpeg, 'a.jpg']], cookie.otherTeacher)).status).toBe(404);
    expect((await upload(draft, [[jpeg, 'a.jpg']], cookie.otherClass)).status).toBe(404);
    // A class session does not change the teacher's own entries.
    expect((await upload(draft, [[jpeg, 'a.jpg']], cookie.classSession)).status).toBe(404);
    expect((await upload(draft, [[jpeg, 'a.jpg']], cookie.coordinator)).status).toBe(403);
    expect((await upload(draft, [[jpeg, 'a.jpg']], null)).status).toBe(401);
    expect(await photoRowCount(draft)).toBe(0);
  });
});

describe('GET /api/photos/[id] and /thumbnail', () => {
  it('answers 404 for an unpublished entry to everyone but its class, its teacher and staff; 200 once published', async () => {
    const entryId = await entryCreate('submitted');
    await knex('entries').where({ id: entryId }).update({ state: 'draft' });
    const res = await upload(entryId, [[await photoJpeg(), 'p.jpg']]);
    const { photos } = (await res.json()) as { photos: { url: string; thumbnailUrl: string }[] };
    await knex('entries').where({ id: entryId }).update({ state: 'submitted' });
    const urls = [photos[0]!.url, photos[0]!.thumbnailUrl];
    const callers: [string, string | null, number][] = [
      ['anonymous', null, 404],
      ['other teacher', cookie.otherTeacher, 404],
      ['other class session', cookie.otherClass, 404],
      ['class session', cookie.classSession, 200],
      ['teacher', cookie.teacher, 200],
      ['coordinator', cookie.coordinator, 200],
      ['admin', cookie.admin, 200],
    ];
    for (const state of ['submitted', 'returned', 'declined', 'draft'] as const) {
      await knex('entries').where({ id: entryId }).update({ state });
      for (const url of urls) {
        for (const [who, as, status] of callers) {
          const got = await get(url, as);
          await got.arrayBuffer();
          expect(got.status, `${state} ${url} as ${who}`).toBe(status);
        }
      }
    }
    await knex('entries').where({ id: entryId }).update({ state: 'published', published_at: new Date() });
    for (const url of urls) {
      const got = await get(url, null);
      expect(got.status).toBe(200);
      expect(got.headers.get('cache-control')).toBe('public, max-age=300');
      expect((await fileTypeFromBuffer(Buffer.from(await got.arrayBuffer())))?.mime).toBe('image/jpeg');
    }
  });

  it('answers 404 as JSON for a malformed photo id', async () => {
    const got = await get('/api/photos/not-a-uuid/thumbnail', cookie.teacher);
    expect(got.status).toBe(404);
    expect(((await got.json()) as { error: { code: string } }).error.code).toBe('not_found');
  });
});

describe('PATCH and DELETE /api/photos/[id]', () => {
  it('changes the alt text, then deletes the photo and its stored copies', async () => {
    const entryId = await entryCreate();
    const { photos } = (await (await upload(entryId, [[await photoJpeg(), 'p.jpg', 'before']])).json()) as {
      photos: { id: string; url: string }[];
    };
    const id = photos[0]!.id;
    const headers = { origin: BASE_URL, cookie: cookie.teacher, 'content-type': 'application/json' };
    const tooLong = await api(`/api/photos/${id}`, {
      method: 'PATCH',
      headers,
      body: JSON.stringify({ altText: 'x'.repeat(251) }),
    });
    expect(tooLong.status).toBe(400);
    const patched = await api(`/api/photos/${id}`, {
      method: 'PATCH',
      headers,
      body: JSON.stringify({ altText: 'after' }),
    });
    expect(patched.status).toBe(200);
    expect(((await patched.json()) as { photo: { altText: string } }).photo.altText).toBe('after');

    expect(storedFiles().filter((f) => f.includes(id))).not.toEqual([]);
    const other = await api(`/api/photos/${id}`, {
      method: 'DELETE',
      headers: { ...headers, cookie: cookie.otherTeacher },
    });
    expect(other.status).toBe(404);
    const deleted = await api(`/api/photos/${id}`, { method: 'DELETE', headers });
    expect(deleted.status).toBe(200);
    expect(storedFiles().filter((f) => f.includes(id))).toEqual([]);
    expect((await get(photos[0]!.url, cookie.teacher)).status).toBe(404);
  });
});

describe('DELETE /api/entries/[id]', () => {
  it('removes the stored copies of every photo of the deleted entry from the disk storage', async () => {
    const entryId = await entryCreate();
    const other = await entryCreate();
    const res = await upload(entryId, [
      [await photoJpeg(), 'a.jpg', 'first'],
      [await photoJpeg(), 'b.jpg', 'second'],
    ]);
    expect(res.status).toBe(201);
    expect((await upload(other, [[await photoJpeg(), 'c.jpg', 'kept']])).status).toBe(201);
    const inFolder = (id: string) => storedFiles().filter((f) => f.includes(`/data/photos/${id}/`));
    // Two photos, a display copy and a thumbnail each.
    expect(inFolder(entryId)).toHaveLength(4);

    const deleted = await api(`/api/entries/${entryId}`, {
      method: 'DELETE',
      headers: { origin: BASE_URL, cookie: cookie.teacher },
    });
    expect(deleted.status).toBe(200);
    expect(storedFiles().filter((f) => f.includes(entryId))).toEqual([]);
    expect(await photoRowCount(entryId)).toBe(0);
    // The other entry's photo stays.
    expect(inFolder(other)).toHaveLength(2);
  });
});
