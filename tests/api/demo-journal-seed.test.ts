/**
 * The demo seed's journal (seeds/01_demo.ts, seeded into the test database by scripts/test.ts): entries in every
 * state, saved results, and drawn photos stored through the upload pipeline — served to anyone once published,
 * to no anonymous visitor before, and without metadata (read back with exifr, an EXIF reader independent of sharp).
 */
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ENTRY_STATES } from '../../src/lib/journal/entry-rules';
import { photoThumbnailUrl, photoUrl } from '../../src/lib/photos/photo-rules';
import { testKnex } from '../db/database';
import { photoMetadataOf, PHOTO_JPEG_CLEAN } from '../fixtures/photo-metadata';
import { api } from './harness';

const DEMO_CLASSES = ['Period 3 Science', 'Room 12 Explorers', 'Physics 2'];
let knex: Knex;

beforeAll(() => {
  knex = testKnex();
});
afterAll(async () => {
  await knex?.destroy();
});

/** The demo entry with this title, and its photos' ids in order. */
async function demoEntry(title: string) {
  const entry = await knex('entries').where({ title }).first('id', 'state', 'saved_results');
  const photos = (await knex('entry_photos').where({ entry_id: entry.id }).orderBy('position').pluck('id')) as string[];
  return { ...entry, photos } as { id: string; state: string; saved_results: unknown[]; photos: string[] };
}

describe('demo seed journal', () => {
  it('has entries in every state in the demo classes', async () => {
    const states = await knex('entries')
      .join('classes', 'classes.id', 'entries.class_id')
      .whereIn('classes.name', DEMO_CLASSES)
      .distinct('entries.state')
      .pluck('entries.state');
    expect([...states].sort()).toEqual([...ENTRY_STATES].sort());
  });

  it('serves the published entry’s drawn photos to anyone, as JPEGs without camera or GPS metadata', async () => {
    const entry = await demoEntry('Our probe survived the shake table');
    expect(entry.state).toBe('published');
    expect(entry.saved_results).toHaveLength(1);
    expect(entry.photos).toHaveLength(2);
    for (const id of entry.photos) {
      for (const url of [photoUrl(id), photoThumbnailUrl(id)]) {
        const res = await api(url);
        expect(res.status, url).toBe(200);
        expect(await photoMetadataOf(Buffer.from(await res.arrayBuffer()))).toEqual(PHOTO_JPEG_CLEAN);
      }
    }
  });

  it('keeps the photos of entries not yet published from anonymous visitors', async () => {
    for (const title of ['Shaking the Wren at 20 Hz and 80 Hz', 'Room 12 built the Wren']) {
      const entry = await demoEntry(title);
      expect(entry.state).not.toBe('published');
      expect(entry.photos.length).toBeGreaterThan(0);
      for (const id of entry.photos) expect((await api(photoUrl(id))).status).toBe(404);
    }
  });
});
