/**
 * The upload figures of the issue-11 bench (`npm run bench:photos` alone, and part of `npm run bench:review`),
 * against an app started by benchAppStart with PHOTO_BENCH_ENV (a disk storage folder of its own). Prints
 * min / median / max over BENCH_ROUNDS of:
 *   1. six 8 MB JPEG photos uploaded to one entry, sent as the entry form sends them (requests under the 40 MB
 *      limit, photoUploadBatches: 4 + 2), from the first byte sent to the last answer (target ≤ 5 s);
 *   2. the app's peak resident memory (sampled every 20 ms from /proc) above its idle level during 1 upload and
 *      during 10 concurrent uploads of four 8 MB photos each (32 MB requests): with streaming and the decode
 *      limit the peak should not grow in proportion to the number of uploads.
 * The teacher, class and entries it makes are deleted at the end, and the storage folder with them.
 */
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from '../../scripts/lib/postgres';
import { photoUploadBatches } from '../../src/lib/photos/photo-rules';
import { accountCreate, classCreateDirect, userSessionCookie } from '../api/auth-helpers';
import { photoNoiseJpeg } from '../fixtures/photos';
import { BENCH_PORT, BENCH_ROUNDS, figure, peakRssDuring, rssMb, type BenchApp } from './bench-harness';

const CONCURRENT = 10;
const PHOTO_BYTES = 8_000_000;
const storageDir = join(PROJECT_ROOT, '.data', `uploads-bench-${BENCH_PORT}`);

/** The app environment the upload figures need: disk storage in a folder of the bench's own. */
export const PHOTO_BENCH_ENV = { KW_STORAGE_DRIVER: 'disk', KW_STORAGE_DIR: storageDir };

/** Measures and prints the upload figures; `schoolId` is the school the bench teacher belongs to. */
export async function photoUploadFigures({ app, knex }: BenchApp, schoolId: string): Promise<void> {
  rmSync(storageDir, { recursive: true, force: true });
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'bench-photos', schoolId });
  try {
    const classId = (await classCreateDirect(knex, teacher, 'Bench photo class')).id;
    const cookie = await userSessionCookie(knex, teacher.id);
    const entryNew = async () => {
      const [row] = await knex('entries')
        .insert({ class_id: classId, author_kind: 'teacher', author_id: teacher.id, title: 'Upload bench' })
        .returning(['id']);
      return row.id as string;
    };

    console.log(`making six ${PHOTO_BYTES / 1e6} MB noise JPEGs…`);
    const photos: Buffer[] = [];
    for (let i = 0; i < 6; i++) photos.push(await photoNoiseJpeg(PHOTO_BYTES, i + 1));

    const post = async (entryId: string, group: Buffer[]) => {
      const form = new FormData();
      group.forEach((bytes, i) => {
        form.append('altText', `Bench photo ${i + 1}`);
        form.append('photo', new Blob([new Uint8Array(bytes)]), `bench-${i + 1}.jpg`);
      });
      const res = await fetch(`${app.url}/api/entries/${entryId}/photos`, {
        method: 'POST',
        body: form,
        headers: { cookie, origin: app.url },
      });
      const text = await res.text();
      if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${text.slice(0, 300)}`);
    };

    const batches = photoUploadBatches(photos.map((p) => p.byteLength));
    console.log(`six photos go as ${batches.length} requests of ${batches.map((b) => b.length).join(' + ')}`);
    const sixSeconds: number[] = [];
    for (let r = 0; r < BENCH_ROUNDS; r++) {
      const entryId = await entryNew();
      const started = performance.now();
      for (const batch of batches)
        await post(
          entryId,
          batch.map((i) => photos[i]!),
        );
      sixSeconds.push((performance.now() - started) / 1000);
    }

    const pid = app.child.pid!;
    const idle: number[] = [];
    const one: number[] = [];
    const ten: number[] = [];
    const four = photos.slice(0, 4);
    for (let r = 0; r < BENCH_ROUNDS; r++) {
      await new Promise((res) => setTimeout(res, 500));
      const base = rssMb(pid);
      idle.push(base);
      const single = await entryNew();
      one.push((await peakRssDuring(pid, () => post(single, four))) - base);
      const entries = await Promise.all(Array.from({ length: CONCURRENT }, entryNew));
      ten.push((await peakRssDuring(pid, () => Promise.all(entries.map((id) => post(id, four))))) - base);
    }

    console.log(`\nphoto uploads, ${BENCH_ROUNDS} rounds (app pid ${pid}, storage on disk)`);
    figure('six 8 MB photos stored and answered', sixSeconds, 's', { op: '≤', value: 5 });
    figure('app memory at rest', idle, 'MB');
    figure('peak memory above rest, 1 upload of 4 × 8 MB', one, 'MB');
    figure(`peak memory above rest, ${CONCURRENT} concurrent uploads of 4 × 8 MB`, ten, 'MB');
  } finally {
    // Classes cascade to their entries and those to their photo rows; the stored copies go with the folder.
    await knex('classes').where({ teacher_id: teacher.id }).delete();
    await knex('users').where({ id: teacher.id }).delete();
    rmSync(storageDir, { recursive: true, force: true });
  }
}
