import type { Knex } from 'knex';

/**
 * event_attendance — how many people from each school came to an event: a count per school, never names.
 * Recorded by a coordinator after the event; the reach figures read attendance from here, not from
 * events.attendee_count (kept as the event's own headline total).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('event_attendance', (t) => {
    t.uuid('event_id')
      .notNullable()
      .references('id')
      .inTable('events')
      .onDelete('CASCADE')
      .withKeyName('event_attendance_event_fk');
    t.uuid('school_id')
      .notNullable()
      .references('id')
      .inTable('schools')
      .onDelete('CASCADE')
      .withKeyName('event_attendance_school_fk');
    t.integer('attendee_count').notNullable().comment('People from this school who came; a count, no names');
    t.uuid('recorded_by')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('event_attendance_recorded_by_fk');
    t.timestamp('recorded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['event_id', 'school_id'], { constraintName: 'event_attendance_pk' });
    t.index(['school_id'], 'event_attendance_school_idx');
  });
  await knex.raw(
    'ALTER TABLE event_attendance ADD CONSTRAINT event_attendance_count_check CHECK (attendee_count >= 0)',
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('event_attendance');
}
