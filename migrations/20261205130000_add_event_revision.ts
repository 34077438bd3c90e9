import type { Knex } from 'knex';

/**
 * events — gain a revision: the iCalendar SEQUENCE of the event's calendar file (RFC 5545, 3.8.7.4), raised each
 *   time a coordinator moves or cancels a published event, so a calendar that holds the earlier file takes the
 *   newer one in its place.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('events', (t) => {
    t.integer('revision')
      .notNullable()
      .defaultTo(0)
      .comment('iCalendar SEQUENCE: raised when a published event is moved or cancelled');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('events', (t) => {
    t.dropColumn('revision');
  });
}
