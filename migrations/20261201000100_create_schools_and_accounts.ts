import type { Knex } from 'knex';

/**
 * schools — every school an office serves, with what its reach report needs (setting, high-need flag).
 * users — teachers, coordinators and admins (students never get accounts).
 * user_sessions — lucia sessions of accounts.
 * account_tokens — one-time links (e-mail verification, password reset), stored hashed.
 * invitations — staff invitations sent by an admin, stored hashed, valid 7 days.
 * audit_events — who did what to which account, when.
 * rate_limit_counters — fixed-window attempt counters shared by every app instance.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('schools', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable();
    t.text('city').notNullable().defaultTo('');
    t.text('region').notNullable().defaultTo('');
    t.text('country').notNullable().defaultTo('');
    t.enu('setting', ['rural', 'suburban', 'urban'], { useNative: true, enumName: 'school_setting' })
      .notNullable()
      .defaultTo('suburban');
    t.boolean('high_need')
      .notNullable()
      .defaultTo(false)
      .comment('Serves a high-need community, as the office reports it');
    t.enu('status', ['approved', 'proposed'], { useNative: true, enumName: 'school_status' })
      .notNullable()
      .defaultTo('approved')
      .comment('A teacher may propose a school at sign-up; a coordinator approves it');
    t.timestamps(true, true);
    t.unique(['name', 'city'], { indexName: 'schools_name_city_unique' });
  });

  await knex.schema.createTable('users', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('email').notNullable().comment('Stored lower-cased');
    t.text('display_name').notNullable();
    t.text('password_hash').nullable().comment('argon2id; null until an invited account sets one');
    t.enu('role', ['teacher', 'coordinator', 'admin'], { useNative: true, enumName: 'user_role' }).notNullable();
    t.uuid('school_id')
      .nullable()
      .references('id')
      .inTable('schools')
      .onDelete('SET NULL')
      .withKeyName('users_school_fk');
    t.timestamp('email_verified_at', { useTz: true }).nullable();
    t.timestamp('deactivated_at', { useTz: true }).nullable();
    t.timestamps(true, true);
    t.unique(['email'], { indexName: 'users_email_unique' });
  });

  await knex.schema.createTable('user_sessions', (t) => {
    t.text('id').primary();
    t.uuid('user_id')
      .notNullable()
      .references('id')
      .inTable('users')
      .onDelete('CASCADE')
      .withKeyName('user_sessions_user_fk');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['user_id'], 'user_sessions_user_idx');
  });

  await knex.schema.createTable('account_tokens', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('user_id')
      .notNullable()
      .references('id')
      .inTable('users')
      .onDelete('CASCADE')
      .withKeyName('account_tokens_user_fk');
    t.enu('purpose', ['verify_email', 'reset_password'], {
      useNative: true,
      enumName: 'account_token_purpose',
    }).notNullable();
    t.text('token_hash').notNullable().comment('SHA-256 of the token sent by mail; the token itself is never stored');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true }).nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['token_hash'], { indexName: 'account_tokens_hash_unique' });
  });

  await knex.schema.createTable('invitations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('email').notNullable();
    t.enu('role', null, { useNative: true, existingType: true, enumName: 'user_role' }).notNullable();
    t.text('token_hash').notNullable();
    t.uuid('invited_by')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('invitations_invited_by_fk');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true }).nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['token_hash'], { indexName: 'invitations_hash_unique' });
  });

  await knex.schema.createTable('audit_events', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('actor_id')
      .nullable()
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .withKeyName('audit_events_actor_fk');
    t.text('action').notNullable().comment('e.g. role.changed, account.deactivated, invitation.sent');
    t.text('target_type').notNullable();
    t.text('target_id').notNullable();
    t.jsonb('details').notNullable().defaultTo('{}');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['created_at'], 'audit_events_created_idx');
  });

  await knex.schema.createTable('rate_limit_counters', (t) => {
    t.text('key').primary().comment('e.g. signin:ip:127.0.0.1 or signin:account:a@b.org');
    t.timestamp('window_started_at', { useTz: true }).notNullable();
    t.integer('attempts').notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'rate_limit_counters',
    'audit_events',
    'invitations',
    'account_tokens',
    'user_sessions',
    'users',
    'schools',
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
  await knex.raw('DROP TYPE IF EXISTS account_token_purpose, user_role, school_status, school_setting');
}
