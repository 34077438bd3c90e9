import type { Knex } from 'knex';

/**
 * entries — class journal entries by the teacher or a team (team names only, no student names). States:
 *   draft → submitted → published | returned | declined; nothing is public before a coordinator publishes it.
 * entry_photos — photos re-encoded without metadata, in upload storage by key.
 * events — workshops and big builds an office runs, with attendance counts for reach.
 * live_links — short codes printed as QR codes whose target can change; live_link_visits counts scans.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('entries', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('class_id')
      .notNullable()
      .references('id')
      .inTable('classes')
      .onDelete('CASCADE')
      .withKeyName('entries_class_fk');
    t.uuid('kit_id').nullable().references('id').inTable('kits').onDelete('SET NULL').withKeyName('entries_kit_fk');
    t.text('activity_slug').nullable();
    t.enu('author_kind', ['teacher', 'team'], { useNative: true, enumName: 'entry_author_kind' }).notNullable();
    t.text('team_name').nullable().comment('Chosen by the team; no student names');
    t.text('title').notNullable();
    t.text('body').notNullable().defaultTo('');
    t.jsonb('saved_result').nullable().comment('A data tool result with its plot (analysis SavedResult shape)');
    t.enu('state', ['draft', 'submitted', 'published', 'returned', 'declined'], {
      useNative: true,
      enumName: 'entry_state',
    })
      .notNullable()
      .defaultTo('draft');
    t.boolean('teacher_approved')
      .notNullable()
      .defaultTo(false)
      .comment('Team entries wait for the teacher before reaching the review queue');
    t.text('review_note').nullable();
    t.uuid('reviewed_by')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('entries_reviewed_by_fk');
    t.timestamp('submitted_at', { useTz: true }).nullable();
    t.timestamp('reviewed_at', { useTz: true }).nullable();
    t.timestamp('published_at', { useTz: true }).nullable();
    t.timestamps(true, true);
    t.index(['class_id'], 'entries_class_idx');
    t.index(['state', 'submitted_at'], 'entries_state_idx');
  });

  await knex.schema.createTable('entry_photos', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('entry_id')
      .notNullable()
      .references('id')
      .inTable('entries')
      .onDelete('CASCADE')
      .withKeyName('entry_photos_entry_fk');
    t.text('storage_key').notNullable();
    t.text('content_type').notNullable();
    t.integer('width_px').notNullable();
    t.integer('height_px').notNullable();
    t.integer('size_bytes').notNullable();
    t.text('alt_text').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('events', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('title').notNullable();
    t.enu('kind', ['workshop', 'big_build', 'visit', 'other'], {
      useNative: true,
      enumName: 'event_kind',
    }).notNullable();
    t.uuid('school_id')
      .nullable()
      .references('id')
      .inTable('schools')
      .onDelete('SET NULL')
      .withKeyName('events_school_fk');
    t.text('venue').notNullable().defaultTo('');
    t.timestamp('starts_at', { useTz: true }).notNullable();
    t.timestamp('ends_at', { useTz: true }).nullable();
    t.integer('attendee_count').notNullable().defaultTo(0);
    t.text('notes').notNullable().defaultTo('');
    t.uuid('created_by')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('events_created_by_fk');
    t.timestamps(true, true);
  });

  await knex.schema.createTable('live_links', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('code').notNullable().comment('The short code after /go/');
    t.text('title').notNullable();
    t.text('target_url').notNullable();
    t.uuid('created_by')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('live_links_created_by_fk');
    t.timestamps(true, true);
    t.unique(['code'], { indexName: 'live_links_code_unique' });
  });

  await knex.schema.createTable('live_link_visits', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('link_id')
      .notNullable()
      .references('id')
      .inTable('live_links')
      .onDelete('CASCADE')
      .withKeyName('live_link_visits_link_fk');
    t.timestamp('visited_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['link_id', 'visited_at'], 'live_link_visits_link_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['live_link_visits', 'live_links', 'events', 'entry_photos', 'entries']) {
    await knex.schema.dropTableIfExists(table);
  }
  await knex.raw('DROP TYPE IF EXISTS event_kind, entry_state, entry_author_kind');
}
