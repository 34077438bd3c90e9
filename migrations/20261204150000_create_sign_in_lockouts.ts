import type { Knex } from 'knex';

/**
 * sign_in_lockouts — consecutive wrong passwords per e-mail address and until when sign-in is locked
 * (src/lib/auth/sign-in-lockout.ts). Keyed by address, not account, so addresses without an account behave alike.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_in_lockouts', (t) => {
    t.text('email').primary().comment('Lower-cased e-mail address as typed at sign-in');
    t.integer('failures')
      .notNullable()
      .defaultTo(0)
      .comment('Wrong passwords in a row since the last success or reset');
    t.timestamp('locked_until', { useTz: true }).nullable().comment('No sign-in attempt is checked before this');
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_lockouts');
}
