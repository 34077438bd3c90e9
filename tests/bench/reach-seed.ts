/**
 * The bench seed of `npm run bench:reach` (not the demo seed): invented schools, teachers, classes, kits, journal
 * entries, events, attendance and sign-in days at the sizes issue 12 names, spread over the REACH_SEED_MONTHS
 * before now. Every table is filled by one set-based INSERT … SELECT over generate_series, so the rows are made in
 * PostgreSQL in batches and none crosses the wire; random() after setseed() in one transaction makes the same
 * data on every run (up to the dates, which follow now()).
 */
import type { Knex } from 'knex';
import { REACH_SOURCE_TABLES } from '../../migrations/20261205130000_add_reach_data_versions';

export const REACH_SEED_SIZES = {
  schools: 2_000,
  teachers: 4_000,
  classes: 10_000,
  kits: 30_000,
  entries: 100_000,
  events: 500,
} as const;
/** The tables the seed fills: every table the reach figures read. */
export const REACH_TABLES = REACH_SOURCE_TABLES;
/** The span the facts are spread over, ending now. */
export const REACH_SEED_MONTHS = 24;
const ACTIVITIES = [
  'launch-stack',
  'scale-it',
  'shake-test',
  'thermal-cycling',
  'deployment-trials',
  'clean-room-build',
];
const REGIONS = ['Northern Plateau', 'River Basin', 'Coastal Lowlands', 'High Desert', 'Lake District', 'Valley Rim'];

/** A timestamp at a random point of the seed's span, as SQL. */
const SPAN_AT = `now() - random() * interval '${REACH_SEED_MONTHS} months'`;
/** The n-th of a list, as a SQL array subscript (1-based) picked by random(). */
const pick = (list: readonly string[]) =>
  `(ARRAY[${list.map((v) => `'${v}'`).join(',')}])[1 + floor(random() * ${list.length})::int]`;

/** Empties the tables the seed fills (and everything that hangs off them). */
export async function reachSeedClear(knex: Knex): Promise<void> {
  await knex.raw('TRUNCATE schools, users, events RESTART IDENTITY CASCADE');
}

/** Fills an empty database with the bench data; answers the number of rows per table. */
export async function reachSeed(knex: Knex): Promise<Record<string, number>> {
  const n = REACH_SEED_SIZES;
  await knex.transaction(async (trx) => {
    await trx.raw('SELECT setseed(0.42)');
    await trx.raw(`
      INSERT INTO schools (name, city, region, country, setting, high_need, high_need_basis, high_need_year,
                           district, grade_bands, status)
      SELECT 'Bench School ' || lpad(i::text, 4, '0'), 'Bench Town ' || (i % 97), ${pick(REGIONS)}, 'Freeland',
             (ARRAY['rural','suburban','urban']::school_setting[])[1 + i % 3],
             hn, CASE WHEN hn THEN (50 + i % 40) || '% eligible for free or reduced-price meals' ELSE '' END,
             CASE WHEN hn THEN 2025 END, 'District ' || (i % 40),
             ARRAY['3-5','6-8']::grade_band[], CASE WHEN i % 50 = 0 THEN 'proposed' ELSE 'approved' END::school_status
      FROM (SELECT i, random() < 0.35 AS hn FROM generate_series(1, ${n.schools}) i) x`);
    // Teachers belong to schools by number: teacher t teaches at school t mod schools.
    await trx.raw(`
      WITH s AS (SELECT id, row_number() OVER (ORDER BY name) - 1 AS k FROM schools)
      INSERT INTO users (email, display_name, role, school_id, email_verified_at)
      SELECT 'bench-teacher-' || i || '@bench.example', 'Bench Teacher ' || i, 'teacher', s.id, now()
      FROM generate_series(0, ${n.teachers - 1}) i JOIN s ON s.k = i % ${n.schools}`);
    await trx.raw(`
      WITH t AS (SELECT id, school_id, row_number() OVER (ORDER BY email) - 1 AS k FROM users WHERE role = 'teacher')
      INSERT INTO classes (teacher_id, school_id, name, grade_band, student_count, join_code)
      SELECT t.id, t.school_id, 'Class ' || i, (ARRAY['3-5','6-8']::grade_band[])[1 + i % 2],
             12 + floor(random() * 24)::int, 'B' || lpad(i::text, 7, '0')
      FROM generate_series(0, ${n.classes - 1}) i JOIN t ON t.k = i % ${n.teachers}`);
    await trx.raw(`
      WITH c AS (SELECT id, teacher_id, row_number() OVER (ORDER BY join_code) - 1 AS k FROM classes)
      INSERT INTO kits (class_id, teacher_id, title, model_id, activity_slug, inputs, engine_version, content_hash,
                        sheet_count, created_at, updated_at)
      SELECT c.id, c.teacher_id, 'Bench kit ' || x.i, 'bench-model',
             CASE WHEN random() < 0.8 THEN ${pick(ACTIVITIES)} END, '{}'::jsonb, 'bench', md5(x.i::text),
             3 + x.i % 6, x.at, x.at
      FROM (SELECT i, floor(random() * ${n.classes})::int AS k, ${SPAN_AT} AS at
            FROM generate_series(1, ${n.kits}) i) x JOIN c ON c.k = x.k`);
    // Entries: 55 % published a few days after they were written, 15 % waiting for review, the rest drafts.
    await trx.raw(`
      WITH c AS (SELECT id, teacher_id, row_number() OVER (ORDER BY join_code) - 1 AS k FROM classes)
      INSERT INTO entries (class_id, author_kind, author_id, title, activity_slug, state, teacher_approved,
                           submitted_at, published_at, created_at, updated_at)
      SELECT c.id, 'teacher', c.teacher_id, 'Bench entry ' || x.i, x.slug,
             CASE WHEN x.r < 0.55 THEN 'published' WHEN x.r < 0.7 THEN 'submitted' ELSE 'draft' END::entry_state,
             x.r < 0.7, CASE WHEN x.r < 0.7 THEN x.at END,
             CASE WHEN x.r < 0.55 THEN LEAST(now(), x.at + random() * interval '5 days') END, x.at, x.at
      FROM (SELECT i, floor(random() * ${n.classes})::int AS k, random() AS r, ${SPAN_AT} AS at,
                   CASE WHEN random() < 0.7 THEN ${pick(ACTIVITIES)} END AS slug
            FROM generate_series(1, ${n.entries}) i) x JOIN c ON c.k = x.k`);
    // Events: 85 % published, 5 % cancelled, 10 % drafts; a few in the months ahead.
    await trx.raw(`
      WITH s AS (SELECT id, row_number() OVER (ORDER BY name) - 1 AS k FROM schools)
      INSERT INTO events (title, kind, school_id, starts_at, state, published_at, attendee_count)
      SELECT 'Bench event ' || x.i, (ARRAY['workshop','big_build','visit','other']::event_kind[])[1 + x.i % 4], s.id,
             x.at, CASE WHEN x.r < 0.85 THEN 'published' WHEN x.r < 0.9 THEN 'cancelled' ELSE 'draft' END::event_state,
             CASE WHEN x.r < 0.9 THEN x.at - interval '30 days' END, 0
      FROM (SELECT i, floor(random() * ${n.schools})::int AS k, random() AS r,
                   now() - random() * interval '${REACH_SEED_MONTHS} months' + interval '2 months' AS at
            FROM generate_series(1, ${n.events}) i) x JOIN s ON s.k = x.k`);
    // Attendance: 1 to 8 schools per event that took place (school k, k + 37, k + 74 … are distinct).
    await trx.raw(`
      WITH s AS (SELECT id, row_number() OVER (ORDER BY name) - 1 AS k FROM schools),
      ev AS (SELECT e.id, s.k, 1 + floor(random() * 8)::int AS n
             FROM events e JOIN s ON s.id = e.school_id WHERE e.state = 'published' AND e.starts_at <= now())
      INSERT INTO event_attendance (event_id, school_id, attendee_count)
      SELECT ev.id, s.id, 5 + floor(random() * 60)::int
      FROM ev CROSS JOIN LATERAL generate_series(0, ev.n - 1) j JOIN s ON s.k = (ev.k + j * 37) % ${n.schools}`);
    // Sign-in days: each teacher on about 20 days of the span.
    await trx.raw(`
      INSERT INTO account_sign_in_days (user_id, day)
      SELECT u.id, (${SPAN_AT})::date FROM users u CROSS JOIN generate_series(1, 20)
      WHERE u.role = 'teacher'
      ON CONFLICT DO NOTHING`);
  });
  const counts: Record<string, number> = {};
  for (const table of REACH_TABLES) {
    const [{ count }] = (await knex(table).count({ count: '*' })) as [{ count: string }];
    counts[table] = Number(count);
  }
  return counts;
}
