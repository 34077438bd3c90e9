import type { Knex } from 'knex';

/**
 * entries, for class journals and review:
 *   saved_results — up to three data tool results (analysis SavedResult shape), replacing the single saved_result;
 *   photos_confirmed_at/by — the teacher's confirmation, given on submit, that no student can be identified in the
 *     photos or that the school's releases are on file;
 *   author_id — the teacher who wrote it (null for a team entry, written through the class session).
 * Indexes serve the review queue (submitted and approved, oldest first) and the public pages (published, newest
 * first, by activity and by class). The decision columns that exist already (reviewed_by, reviewed_at,
 * review_note) keep who decided, when, and the note or reason.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('entries', (t) => {
    t.jsonb('saved_results')
      .notNullable()
      .defaultTo(knex.raw(`'[]'::jsonb`))
      .comment('Up to three data tool results (analysis SavedResult shape)');
    t.timestamp('photos_confirmed_at', { useTz: true })
      .nullable()
      .comment('When the teacher confirmed no student is identifiable in the photos, or releases are on file');
    t.uuid('photos_confirmed_by')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('entries_photos_confirmed_by_fk');
    t.uuid('author_id')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('entries_author_fk')
      .comment('The teacher who wrote it; null for a team entry');
  });
  await knex.raw(`UPDATE entries SET saved_results = jsonb_build_array(saved_result) WHERE saved_result IS NOT NULL`);
  await knex.schema.alterTable('entries', (t) => {
    t.dropColumn('saved_result');
  });
  await knex.raw(
    `ALTER TABLE entries ADD CONSTRAINT entries_saved_results_check
       CHECK (jsonb_typeof(saved_results) = 'array' AND jsonb_array_length(saved_results) <= 3)`,
  );
  await knex.raw(
    `ALTER TABLE entries ADD CONSTRAINT entries_team_name_check CHECK (author_kind <> 'team' OR team_name IS NOT NULL)`,
  );
  await knex.raw(
    `CREATE INDEX entries_queue_idx ON entries (submitted_at, id) WHERE state = 'submitted' AND teacher_approved`,
  );
  await knex.raw(
    `CREATE INDEX entries_published_activity_idx ON entries (activity_slug, published_at DESC) WHERE state = 'published'`,
  );
  await knex.raw(
    `CREATE INDEX entries_published_class_idx ON entries (class_id, published_at DESC) WHERE state = 'published'`,
  );
  await knex.raw(`CREATE INDEX entry_photos_entry_idx ON entry_photos (entry_id, created_at)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(
    'DROP INDEX IF EXISTS entry_photos_entry_idx, entries_published_class_idx, entries_published_activity_idx, entries_queue_idx',
  );
  await knex.raw('ALTER TABLE entries DROP CONSTRAINT IF EXISTS entries_team_name_check');
  await knex.raw('ALTER TABLE entries DROP CONSTRAINT IF EXISTS entries_saved_results_check');
  await knex.schema.alterTable('entries', (t) => {
    t.jsonb('saved_result').nullable().comment('A data tool result with its plot (analysis SavedResult shape)');
  });
  await knex.raw(`UPDATE entries SET saved_result = saved_results -> 0 WHERE jsonb_array_length(saved_results) > 0`);
  await knex.schema.alterTable('entries', (t) => {
    t.dropForeign(['author_id'], 'entries_author_fk');
    t.dropForeign(['photos_confirmed_by'], 'entries_photos_confirmed_by_fk');
    t.dropColumn('author_id');
    t.dropColumn('photos_confirmed_by');
    t.dropColumn('photos_confirmed_at');
    t.dropColumn('saved_results');
  });
}
