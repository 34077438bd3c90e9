/**
 * The review queue's queries, as reviewQueuePage sends them, planned by PostgreSQL on the bench seed's spread of
 * entries (a scratch database, 20,000 entries, ANALYZEd): each filter's count is read from the partial queue index
 * made for it, and the totals equal counts made here with plain SQL.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { knexFor } from '../../scripts/lib/migrate';
import { reviewQueuePage } from '../../src/lib/db/entries';
import { ReviewQueueQuerySchema } from '../../src/lib/journal/entry-rules';
import { reviewBenchSeed } from '../bench/review-bench-seed';
import { scratchDatabaseCreate } from './database';

let knex: Knex;
let schoolId: string;

beforeAll(async () => {
  knex = knexFor(await scratchDatabaseCreate('kitwright_queue_plan_check'));
  await knex.migrate.latest();
  await reviewBenchSeed(knex, 20_000);
  schoolId = ((await knex('schools').orderBy('name').first('id')) as { id: string }).id;
}, 120_000);

afterAll(async () => {
  await knex?.destroy();
});

/** The queue page for the query; the plans PostgreSQL makes for every statement it sent, and its answer. */
async function plannedPage(query: Record<string, string>) {
  const statements: { sql: string; bindings: readonly Knex.Value[] }[] = [];
  const record = (q: { sql: string; bindings: readonly Knex.Value[] }) => statements.push(q);
  knex.on('query', record);
  const now = new Date();
  const page = await reviewQueuePage(ReviewQueueQuerySchema.parse(query), now, knex).finally(() =>
    knex.off('query', record),
  );
  const plans: string[] = [];
  for (const s of statements) {
    // The event shows PostgreSQL's numbered placeholders, in order; knex.raw takes "?".
    const { rows } = await knex.raw(`EXPLAIN ${s.sql.replace(/\$\d+/g, '?')}`, s.bindings as Knex.RawBinding[]);
    plans.push((rows as { 'QUERY PLAN': string }[]).map((r) => r['QUERY PLAN']).join('\n'));
  }
  const countPlan = plans[statements.findIndex((s) => /^select count\(\*\)/i.test(s.sql))];
  return { page, now, countPlan: countPlan ?? '' };
}

/** The queue's size under a condition on entries e and their classes c, by plain SQL. */
async function queueCount(where: string, bindings: Knex.RawBinding[]): Promise<number> {
  const { rows } = await knex.raw(
    `SELECT count(*)::int AS n FROM entries e JOIN classes c ON c.id = e.class_id
     WHERE e.state = 'submitted' AND e.teacher_approved AND ${where}`,
    bindings,
  );
  return (rows as { n: number }[])[0]!.n;
}

describe('reviewQueuePage', () => {
  it('counts one school’s queue from entries_queue_class_idx, class by class', async () => {
    const { page, countPlan } = await plannedPage({ schoolId });
    expect(countPlan).toContain('entries_queue_class_idx');
    expect(page.total).toBe(await queueCount('c.school_id = ?', [schoolId]));
    expect(page.rows).toHaveLength(25);
  });

  it('counts one activity’s queue from entries_queue_activity_idx', async () => {
    const { page, countPlan } = await plannedPage({ activity: 'shake-test', sort: 'title', dir: 'desc' });
    expect(countPlan).toContain('entries_queue_activity_idx');
    expect(page.total).toBe(await queueCount("e.activity_slug = 'shake-test'", []));
    const titles = page.rows.map((r) => r.title);
    expect(titles).toEqual([...titles].sort().reverse());
  });

  it('counts the entries waiting 30 days or more without reading classes', async () => {
    const { page, now, countPlan } = await plannedPage({ minAgeDays: '30', sort: 'school' });
    expect(countPlan).toMatch(/entries_queue(_class)?_idx/);
    expect(countPlan).not.toContain('classes');
    expect(page.total).toBe(await queueCount('e.submitted_at <= ?', [new Date(now.getTime() - 30 * 86_400_000)]));
  });
});
