import type { Knex } from 'knex';

/**
 * events — gain a publish state, the venue's time zone, a capacity, the kit and activity used, a description and
 *   the venue size for a big-build plan. starts_at/ends_at stay UTC instants; time_zone says how to show them.
 * event_registrations — teachers signed up for an event (an account, or a name and school e-mail confirmed by a
 *   link). Sign-ups, not attendance: attendance is event_attendance.
 * live_links — gain the kit a link belongs to (each saved kit has its own) and a retired time.
 * live_link_scans — replaces live_link_visits: a count per link and day, nothing about who scanned.
 * mail_dead_letters — messages the mail job gave up on after its retries.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('events', (t) => {
    t.enu('state', ['draft', 'published', 'cancelled'], { useNative: true, enumName: 'event_state' })
      .notNullable()
      .defaultTo('draft');
    t.timestamp('published_at', { useTz: true }).nullable();
    t.text('time_zone').notNullable().defaultTo('UTC').comment('IANA time zone of the venue');
    t.integer('capacity').nullable().comment('Places for registrations; null means no limit');
    t.uuid('kit_id').nullable().references('id').inTable('kits').onDelete('SET NULL').withKeyName('events_kit_fk');
    t.text('activity_slug').nullable();
    t.text('description').notNullable().defaultTo('');
    t.text('venue_preset').nullable().comment('Venue preset id of src/lib/layout/venues for the big-build plan');
    t.decimal('venue_width_m', 8, 2).nullable();
    t.decimal('venue_length_m', 8, 2).nullable();
    t.integer('build_scale_denominator')
      .nullable()
      .comment('Scale of a big build as 1:N (1 = life-size); null when the event is not a big build');
    t.index(['state', 'starts_at'], 'events_state_starts_idx');
  });
  await knex.raw('ALTER TABLE events ADD CONSTRAINT events_capacity_check CHECK (capacity IS NULL OR capacity > 0)');
  await knex.raw(
    'ALTER TABLE events ADD CONSTRAINT events_build_scale_check CHECK (build_scale_denominator IS NULL OR build_scale_denominator >= 1)',
  );

  await knex.schema.createTable('event_registrations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('event_id')
      .notNullable()
      .references('id')
      .inTable('events')
      .onDelete('CASCADE')
      .withKeyName('event_registrations_event_fk');
    t.uuid('user_id')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('event_registrations_user_fk');
    t.text('name').notNullable();
    t.text('email').notNullable().comment('Lower case');
    t.uuid('school_id')
      .nullable()
      .references('id')
      .inTable('schools')
      .onDelete('SET NULL')
      .withKeyName('event_registrations_school_fk');
    t.enu('state', ['pending', 'confirmed', 'waitlisted', 'cancelled'], {
      useNative: true,
      enumName: 'registration_state',
    }).notNullable();
    t.timestamp('queued_at', { useTz: true }).nullable().comment('Waiting-list order');
    t.text('confirm_token_hash').nullable().comment('SHA-256 of the e-mail confirmation token');
    t.text('manage_token_hash').notNullable().comment('SHA-256 of the token in the cancel link');
    t.timestamp('reminder_sent_at', { useTz: true }).nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('confirmed_at', { useTz: true }).nullable();
    t.timestamp('cancelled_at', { useTz: true }).nullable();
    t.index(['event_id', 'state'], 'event_registrations_event_idx');
  });
  await knex.raw(
    "CREATE UNIQUE INDEX event_registrations_email_unique ON event_registrations (event_id, email) WHERE state <> 'cancelled'",
  );

  await knex.schema.alterTable('live_links', (t) => {
    t.uuid('kit_id')
      .nullable()
      .references('id')
      .inTable('kits')
      .onDelete('CASCADE')
      .withKeyName('live_links_kit_fk')
      .comment('The saved kit this link was made for');
    t.timestamp('retired_at', { useTz: true }).nullable();
    t.unique(['kit_id'], { indexName: 'live_links_kit_unique' });
  });
  await knex('live_links').update({ code: knex.raw('upper(code)') });

  await knex.schema.dropTable('live_link_visits');
  await knex.schema.createTable('live_link_scans', (t) => {
    t.uuid('link_id')
      .notNullable()
      .references('id')
      .inTable('live_links')
      .onDelete('CASCADE')
      .withKeyName('live_link_scans_link_fk');
    t.date('day').notNullable().comment('UTC day of the scans');
    t.bigInteger('count').notNullable().defaultTo(0);
    t.primary(['link_id', 'day'], { constraintName: 'live_link_scans_pk' });
  });

  await knex.schema.createTable('mail_dead_letters', (t) => {
    t.bigIncrements('id').primary();
    t.text('to_address').notNullable();
    t.text('subject').notNullable();
    t.text('last_error').notNullable();
    t.integer('attempts').notNullable();
    t.timestamp('failed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('mail_dead_letters');
  await knex.schema.dropTable('live_link_scans');
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
  await knex.schema.alterTable('live_links', (t) => {
    t.dropUnique(['kit_id'], 'live_links_kit_unique');
    t.dropForeign(['kit_id'], 'live_links_kit_fk');
    t.dropColumns('kit_id', 'retired_at');
  });
  await knex.schema.dropTable('event_registrations');
  await knex.schema.alterTable('events', (t) => {
    t.dropIndex(['state', 'starts_at'], 'events_state_starts_idx');
    t.dropForeign(['kit_id'], 'events_kit_fk');
    t.dropColumns(
      'state',
      'published_at',
      'time_zone',
      'capacity',
      'kit_id',
      'activity_slug',
      'description',
      'venue_preset',
      'venue_width_m',
      'venue_length_m',
      'build_scale_denominator',
    );
  });
  await knex.raw('DROP TYPE IF EXISTS event_state, registration_state');
}
