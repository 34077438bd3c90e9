import type { Knex } from 'knex';

/** Every table a reach figure reads (src/lib/reach/figures.ts). */
export const REACH_SOURCE_TABLES = [
  'schools',
  'users',
  'classes',
  'kits',
  'entries',
  'events',
  'event_attendance',
  'account_sign_in_days',
];

/**
 * reach_data_versions — one counter per table a reach figure reads, raised by a statement trigger in the same
 * transaction as every insert, update, delete or truncate of that table. The app keeps reach query results in
 * memory keyed by the sum of the counters (src/lib/db/reach-cache.ts): a change becomes visible together with its
 * new counter, so a result is never served for data it did not see. One row per table, so writers of different
 * tables never wait for each other; writers of one table queue on its row until they commit.
 * account_sign_in_days_at_idx — the "active teachers" figure filters sign-in days by their UTC instant
 * (day::timestamp AT TIME ZONE 'UTC'), which the index on the bare day cannot serve: the bench plan was a
 * sequential scan of every sign-in day for each reach query.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('reach_data_versions', (t) => {
    t.text('table_name').primary({ constraintName: 'reach_data_versions_pk' }).comment('A table reach figures read');
    t.bigInteger('version').notNullable().defaultTo(0).comment('Raised by every statement that changes the table');
    t.timestamp('changed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex('reach_data_versions').insert(REACH_SOURCE_TABLES.map((table_name) => ({ table_name })));
  await knex.raw(`
    CREATE FUNCTION reach_data_version_raise() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE reach_data_versions SET version = version + 1, changed_at = now() WHERE table_name = TG_TABLE_NAME;
      RETURN NULL;
    END $$`);
  for (const table of REACH_SOURCE_TABLES) {
    await knex.raw(
      `CREATE TRIGGER ${table}_reach_version AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON ${table}
       FOR EACH STATEMENT EXECUTE FUNCTION reach_data_version_raise()`,
    );
  }
  await knex.raw(
    `CREATE INDEX account_sign_in_days_at_idx ON account_sign_in_days (((day::timestamp AT TIME ZONE 'UTC')))`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX IF EXISTS account_sign_in_days_at_idx');
  for (const table of REACH_SOURCE_TABLES) await knex.raw(`DROP TRIGGER IF EXISTS ${table}_reach_version ON ${table}`);
  await knex.raw('DROP FUNCTION IF EXISTS reach_data_version_raise()');
  await knex.schema.dropTable('reach_data_versions');
}
