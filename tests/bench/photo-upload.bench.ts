/**
 * `npm run bench:photos` — the upload part of the issue-11 review bench: the built app on the demo database, on
 * loopback. Prints min / median / max over ROUNDS of:
 *   1. six 8 MB JPEG photos uploaded to one entry, sent as the entry form sends them (requests under the 40 MB
 *      limit, photoUploadBatches: 4 + 2), from the first byte sent to the last answer (target ≤ 5 s);
 *   2. the app's peak resident memory (sampled every 20 ms from /proc) above its idle level during 1 upload and
 *      during 10 concurrent uploads of four 8 MB photos each (32 MB requests): with streaming and the decode
 *      limit the peak should not grow in proportion to the number of uploads.
 * Storage: a disk folder of its own (.data/uploads-bench-PORT), removed at the end. Ports: PORT (app, 4321); the
 * project's PostgreSQL. Builds the app when KW_OUT_DIR (default dist) has no build.
 */
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import knexFactory, { type Knex } from 'knex';
import { APP_DATABASE, PROJECT_ROOT, databaseUrl } from '../../scripts/lib/postgres';
import { databaseUp } from '../../scripts/db';
import { migrateLatest, seedDemoIfEmpty } from '../../scripts/lib/migrate';
import { appBuild } from '../../scripts/lib/build';
import { appEnv } from '../../scripts/lib/app-env';
import { serverStart } from '../../scripts/lib/server';
import { photoUploadBatches } from '../../src/lib/photos/photo-rules';
import { accountCreate, classCreateDirect, schoolIdByName, userSessionCookie } from '../api/auth-helpers';
import { photoNoiseJpeg } from '../fixtures/photos';

const ROUNDS = Number(process.env.KW_BENCH_ROUNDS ?? 3);
const CONCURRENT = 10;
const PHOTO_BYTES = 8_000_000;
const host = '127.0.0.1';
const port = Number(process.env.PORT ?? 4321);

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2;
};
const figure = (name: string, xs: number[], unit: string, target?: number) => {
  const f = (x: number) => x.toFixed(x >= 100 ? 0 : 2).padStart(8);
  const m = median(xs);
  console.log(
    `${name.padEnd(48)} min ${f(Math.min(...xs))}  median ${f(m)}  max ${f(Math.max(...xs))} ${unit.padEnd(4)}` +
      (target === undefined ? '' : `  target ≤ ${target}: ${m <= target ? 'met' : 'MISSED'}`),
  );
};

/** Resident memory of a process, MB (VmRSS in /proc/PID/status). */
function rssMb(pid: number): number {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8').match(/VmRSS:\s+(\d+) kB/);
  return line ? Number(line[1]) / 1024 : NaN;
}

/** Samples the process's memory every 20 ms while `work` runs; the peak, MB. */
async function peakRssDuring(pid: number, work: () => Promise<unknown>): Promise<number> {
  let peak = rssMb(pid);
  const timer = setInterval(() => (peak = Math.max(peak, rssMb(pid))), 20);
  try {
    await work();
  } finally {
    clearInterval(timer);
  }
  return Math.max(peak, rssMb(pid));
}

await databaseUp();
const dbUrl = databaseUrl(APP_DATABASE);
await migrateLatest(dbUrl);
await seedDemoIfEmpty(dbUrl);
if (!existsSync(join(PROJECT_ROOT, process.env.KW_OUT_DIR ?? 'dist', 'server', 'entry.mjs'))) appBuild();

const storageDir = join(PROJECT_ROOT, '.data', `uploads-bench-${port}`);
rmSync(storageDir, { recursive: true, force: true });
const env = { ...appEnv({ databaseUrl: dbUrl, host, port, smtpPort: 0, mailHttpPort: 0 }), KW_STORAGE_DIR: storageDir };
const app = await serverStart(env, { logFile: join(PROJECT_ROOT, '.data', `bench-photos-${port}.log`) });
const knex: Knex = knexFactory({ client: 'pg', connection: dbUrl, pool: { min: 0, max: 2 } });

try {
  const school = await schoolIdByName(knex, 'Juniper Flats Middle School');
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'bench-photos', schoolId: school });
  const classId = (await classCreateDirect(knex, teacher, 'Bench photo class')).id;
  const cookie = await userSessionCookie(knex, teacher.id);
  const entryIds: string[] = [];
  const entryNew = async () => {
    const [row] = await knex('entries')
      .insert({
        class_id: classId,
        author_kind: 'teacher',
        author_id: teacher.id,
        title: 'Upload bench',
        state: 'draft',
      })
      .returning(['id']);
    entryIds.push(row.id as string);
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
  for (let r = 0; r < ROUNDS; r++) {
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
  for (let r = 0; r < ROUNDS; r++) {
    await new Promise((res) => setTimeout(res, 500));
    const base = rssMb(pid);
    idle.push(base);
    const single = await entryNew();
    one.push((await peakRssDuring(pid, () => post(single, four))) - base);
    const entries = await Promise.all(Array.from({ length: CONCURRENT }, entryNew));
    ten.push((await peakRssDuring(pid, () => Promise.all(entries.map((id) => post(id, four))))) - base);
  }

  console.log(`\nphoto uploads, ${ROUNDS} rounds (app pid ${pid}, storage on disk)`);
  figure('six 8 MB photos stored and answered', sixSeconds, 's', 5);
  figure('app memory at rest', idle, 'MB');
  figure('peak memory above rest, 1 upload of 4 × 8 MB', one, 'MB');
  figure(`peak memory above rest, ${CONCURRENT} concurrent uploads of 4 × 8 MB`, ten, 'MB');
} finally {
  await app.stop();
  await knex.destroy();
  rmSync(storageDir, { recursive: true, force: true });
}
