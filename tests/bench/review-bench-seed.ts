/**
 * The review bench's own data (not the demo seed), for a database of its own: invented schools, teachers, classes
 * and REVIEW_BENCH_ENTRIES journal entries (Markdown bodies of 0.9–3.6 kB, every tenth with a real saved result)
 * spread over every state, activity and the last half year, made by PostgreSQL itself (INSERT … SELECT over
 * generate_series: one statement a table, no rows sent over the wire), then VACUUM ANALYZEd (visibility map and
 * statistics, as autovacuum leaves a settled database) so the planner sees the real spread. Skips the work when the database already holds exactly this data.
 */
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Knex } from 'knex';
import { PROJECT_ROOT } from '../../scripts/lib/postgres';
import { vibrationSavedResult } from '../../src/lib/analysis/saved-result-tools';
import { vibrationAnalyse } from '../../src/lib/analysis/vibration';
import { vibrationInputFromCsv } from '../../src/lib/analysis/vibration-csv';
import { vibrationSampleCsv } from '../../src/lib/tools/vibration-sample';

export const REVIEW_BENCH_ENTRIES = 100_000;
export const REVIEW_BENCH_SCHOOLS = 40;
const TEACHERS_PER_SCHOOL = 10;
const CLASSES_PER_TEACHER = 3;
/** Names the seed's version too: a database seeded by an older seed is emptied and seeded again. */
export const REVIEW_BENCH_COORDINATOR_EMAIL = 'bench-coordinator-2@example.org';

/** One paragraph of an entry body in Markdown (invented); entry i has 1 + i mod 4 of them, 0.9–3.6 kB. */
const BODY_PARAGRAPH =
  'We built the **paper probe** at 1:20 and shook it on the foam block for ten seconds per run, three runs in ' +
  'all. Two tabs came loose on the first run, so we added *white glue* and waited a day. The phone recorded ' +
  'the acceleration on three axes at 100 Hz; we saved the [PSD](https://example.org/psd) and compared the peaks ' +
  'with the ones the class before us found. Our loudest peak was near 20 Hz, where the foam block rocks. ' +
  'Next time we want to tape the phone closer to the centre and try a stiffer block, then repeat all three ' +
  'runs with the panels folded in.\n\n';

/** The shake-test tool's own sample, analysed as the tool does: a real saved result (about 28 kB of JSON). */
function benchSavedResult(): string {
  const sample = vibrationInputFromCsv(vibrationSampleCsv(), { units: 'auto' });
  return JSON.stringify(vibrationSavedResult(vibrationAnalyse(sample.input, sample.unitSource)));
}

/**
 * The state of entry i, by i mod 20: 40 % published, 30 % submitted and approved (the queue), 5 % team entries
 * waiting for their teacher, 10 % drafts, 10 % returned, 5 % declined.
 */
const STATE_OF_I = `CASE
  WHEN i % 20 < 8 THEN 'published'
  WHEN i % 20 < 15 THEN 'submitted'
  WHEN i % 20 < 17 THEN 'draft'
  WHEN i % 20 < 19 THEN 'returned'
  ELSE 'declined' END::entry_state`;

/** The activity slugs of content/activities, so the queue's activity filter finds entries. */
function activitySlugs(): string[] {
  return readdirSync(join(PROJECT_ROOT, 'content', 'activities'))
    .filter((f) => f.endsWith('.md'))
    .map((f) => f.slice(0, -3))
    .sort();
}

/** True when the database holds the bench data (with `entries` entries) already. */
async function seeded(knex: Knex, entries: number): Promise<boolean> {
  const { rows } = await knex.raw(
    `SELECT (SELECT count(*) FROM entries)::int AS entries,
      (SELECT count(*) FROM users WHERE email = ?)::int AS coordinators`,
    [REVIEW_BENCH_COORDINATOR_EMAIL],
  );
  const counts = rows[0] as { entries: number; coordinators: number };
  return counts.entries === entries && counts.coordinators === 1;
}

/**
 * Fills the (bench-only) database with the bench data, emptying it first; does nothing when it is there. Tests of
 * query plans pass fewer entries.
 */
export async function reviewBenchSeed(knex: Knex, entries = REVIEW_BENCH_ENTRIES): Promise<void> {
  if (await seeded(knex, entries)) return;
  const started = performance.now();
  const slugs = activitySlugs();
  await knex.transaction(async (trx) => {
    await trx.raw('TRUNCATE schools, users, classes, entries CASCADE');
    await trx.raw(
      `INSERT INTO schools (name, city, region, country, setting)
       SELECT 'Bench School ' || lpad(s::text, 3, '0'), 'Bench City ' || (s % 7), 'Bench Region', 'Benchland',
         (ARRAY['rural', 'suburban', 'urban'])[1 + s % 3]::school_setting
       FROM generate_series(1, ?) AS s`,
      [REVIEW_BENCH_SCHOOLS],
    );
    await trx.raw(
      `INSERT INTO users (email, display_name, role, school_id, email_verified_at)
       SELECT 'bench-teacher-' || row_number() OVER () || '@example.org', 'Bench Teacher ' || row_number() OVER (),
         'teacher', schools.id, now()
       FROM schools, generate_series(1, ?)`,
      [TEACHERS_PER_SCHOOL],
    );
    await trx('users').insert({
      email: REVIEW_BENCH_COORDINATOR_EMAIL,
      display_name: 'Bench Coordinator',
      role: 'coordinator',
      email_verified_at: trx.fn.now(),
    });
    await trx.raw(
      `INSERT INTO classes (teacher_id, school_id, name, grade_band, student_count, join_code)
       SELECT users.id, users.school_id, 'Bench Class ' || row_number() OVER (), '6-8', 24,
         upper(substr(md5('bench-class-' || row_number() OVER ()), 1, 8))
       FROM users, generate_series(1, ?)
       WHERE users.role = 'teacher'`,
      [CLASSES_PER_TEACHER],
    );
    // Entry i goes to class i mod n (so every class has entries in every state), was submitted (i × 37) mod 180
    // days' worth of minutes ago, and every tenth carries a saved result.
    await trx.raw(
      `WITH c AS (SELECT id, teacher_id, row_number() OVER (ORDER BY id) - 1 AS n FROM classes),
       k AS (SELECT count(*) AS total FROM classes),
       g AS (SELECT i, ${STATE_OF_I} AS state,
               now() - make_interval(mins => (i * 37) % (180 * 24 * 60)) AS sent
             FROM generate_series(1, ?) AS i)
       INSERT INTO entries (class_id, author_kind, author_id, team_name, title, body, saved_results, activity_slug,
         state, teacher_approved, submitted_at, reviewed_at, published_at, review_note)
       SELECT c.id,
         CASE WHEN i % 3 = 0 OR i % 20 = 14 THEN 'team' ELSE 'teacher' END::entry_author_kind,
         CASE WHEN i % 3 = 0 OR i % 20 = 14 THEN NULL ELSE c.teacher_id END,
         CASE WHEN i % 3 = 0 OR i % 20 = 14 THEN 'Team ' || (i % 50) END,
         'Bench entry ' || substr(md5(i::text), 1, 10),
         repeat(?, 1 + i % 4),
         CASE WHEN i % 10 = 0 THEN jsonb_build_array(?::jsonb) ELSE '[]'::jsonb END,
         (?::text[])[1 + i % ?],
         g.state,
         g.state <> 'draft' AND i % 20 <> 14,
         CASE WHEN g.state <> 'draft' THEN g.sent END,
         CASE WHEN g.state IN ('published', 'returned', 'declined') THEN g.sent + interval '1 hour' END,
         CASE WHEN g.state = 'published' THEN g.sent + interval '1 hour' END,
         CASE WHEN g.state IN ('returned', 'declined') THEN 'Invented bench note.' END
       FROM g, k, c WHERE c.n = g.i % k.total`,
      [entries, BODY_PARAGRAPH, benchSavedResult(), slugs, slugs.length],
    );
  });
  await knex.raw('VACUUM ANALYZE schools, users, classes, entries');
  console.log(`bench seed: ${entries} entries in ${((performance.now() - started) / 1000).toFixed(1)} s`);
}
