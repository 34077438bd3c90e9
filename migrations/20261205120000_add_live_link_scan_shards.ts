import type { Knex } from 'knex';

/**
 * live_link_scans — gain a shard: a link's scans of a day are counted on up to LIVE_LINK_SCAN_SHARDS rows
 *   (src/lib/db/live-links.ts) instead of one, each scan adding 1 to a row picked at random, so concurrent scans of
 *   one printed code rarely wait on the same row lock; the day's scans are the sum of its rows. The shard is a
 *   number from 0 to 15 drawn by the database, not personal data: a row still says nothing about who scanned.
 *   Existing rows become shard 0.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('live_link_scans', (t) => {
    t.smallint('shard')
      .notNullable()
      .defaultTo(0)
      .comment('Which of the day’s counter rows (0–15, drawn at random per scan); not about the person scanning');
    t.dropPrimary('live_link_scans_pk');
  });
  await knex.schema.alterTable('live_link_scans', (t) => {
    t.primary(['link_id', 'day', 'shard'], { constraintName: 'live_link_scans_pk' });
  });
  await knex.raw(
    'ALTER TABLE live_link_scans ADD CONSTRAINT live_link_scans_shard_check CHECK (shard >= 0 AND shard < 16)',
  );
}

/** Folds each day's shards back into one row before the column goes. */
export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    WITH folded AS (DELETE FROM live_link_scans WHERE shard <> 0 RETURNING link_id, day, count)
    INSERT INTO live_link_scans (link_id, day, shard, count)
    SELECT link_id, day, 0, sum(count) FROM folded GROUP BY link_id, day
    ON CONFLICT (link_id, day, shard) DO UPDATE SET count = live_link_scans.count + excluded.count`);
  await knex.schema.alterTable('live_link_scans', (t) => {
    t.dropChecks('live_link_scans_shard_check');
    t.dropPrimary('live_link_scans_pk');
    t.dropColumn('shard');
  });
  await knex.schema.alterTable('live_link_scans', (t) => {
    t.primary(['link_id', 'day'], { constraintName: 'live_link_scans_pk' });
  });
}
