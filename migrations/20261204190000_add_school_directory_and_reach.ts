import type { Knex } from 'knex';

/**
 * schools — directory fields a funder's report needs: district, the grade bands taught, and the basis of the
 * high-need flag (what it rests on and the school year of that figure); a trigram index on the name so
 * near-duplicate proposals are found by similarity (pg_trgm).
 * account_sign_in_days — one row per account and UTC day it signed in: the "active teachers" reach figure
 * reads it (sessions are deleted on sign-out, so they cannot say who was active last quarter).
 * Indexes on the time columns every reach figure filters by (events use events_state_starts_idx of the events
 * migration).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS pg_trgm');
  await knex.schema.alterTable('schools', (t) => {
    t.text('district').notNullable().defaultTo('');
    t.specificType('grade_bands', 'grade_band[]')
      .notNullable()
      .defaultTo('{}')
      .comment('Grade bands the school teaches (K-2, 3-5, 6-8, 9-12)');
    t.text('high_need_basis')
      .notNullable()
      .defaultTo('')
      .comment('What the high-need flag rests on, e.g. "62% eligible for free or reduced-price meals"');
    t.integer('high_need_year')
      .nullable()
      .comment('The year the high-need figure is from (first calendar year of its school year)');
  });
  await knex.raw('CREATE INDEX schools_name_trgm_idx ON schools USING gin (lower(name) gin_trgm_ops)');
  await knex.raw('CREATE INDEX schools_status_idx ON schools (status)');

  await knex.schema.createTable('account_sign_in_days', (t) => {
    t.uuid('user_id')
      .notNullable()
      .references('id')
      .inTable('users')
      .onDelete('CASCADE')
      .withKeyName('account_sign_in_days_user_fk');
    t.date('day').notNullable().comment('UTC date of a sign-in');
    t.primary(['user_id', 'day'], { constraintName: 'account_sign_in_days_pk' });
    t.index(['day'], 'account_sign_in_days_day_idx');
  });

  await knex.schema.alterTable('kits', (t) => t.index(['created_at'], 'kits_created_idx'));
  await knex.raw('CREATE INDEX entries_published_idx ON entries (published_at) WHERE published_at IS NOT NULL');
  await knex.schema.alterTable('classes', (t) => t.index(['school_id'], 'classes_school_idx'));
  await knex.schema.alterTable('users', (t) => t.index(['school_id'], 'users_school_idx'));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => t.dropIndex([], 'users_school_idx'));
  await knex.schema.alterTable('classes', (t) => t.dropIndex([], 'classes_school_idx'));
  await knex.raw('DROP INDEX IF EXISTS entries_published_idx');
  await knex.schema.alterTable('kits', (t) => t.dropIndex([], 'kits_created_idx'));
  await knex.schema.dropTable('account_sign_in_days');
  await knex.raw('DROP INDEX IF EXISTS schools_status_idx');
  await knex.raw('DROP INDEX IF EXISTS schools_name_trgm_idx');
  await knex.schema.alterTable('schools', (t) => {
    t.dropColumn('high_need_year');
    t.dropColumn('high_need_basis');
    t.dropColumn('grade_bands');
    t.dropColumn('district');
  });
}
