import type { Knex } from 'knex';

/**
 * classes — a teacher's class: a count of students (never names) and the class code students join with.
 * class_sessions — a student device's session opened with a class code: limited to that class, 8 hours.
 * kits — a model at a scale on a sheet size for a class: the inputs, the engine version and a content hash
 *   (files are regenerated from the inputs or served from cache by hash).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('classes', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('teacher_id')
      .notNullable()
      .references('id')
      .inTable('users')
      .onDelete('CASCADE')
      .withKeyName('classes_teacher_fk');
    t.uuid('school_id')
      .nullable()
      .references('id')
      .inTable('schools')
      .onDelete('SET NULL')
      .withKeyName('classes_school_fk');
    t.text('name').notNullable();
    t.enu('grade_band', ['K-2', '3-5', '6-8', '9-12'], { useNative: true, enumName: 'grade_band' }).notNullable();
    t.integer('student_count').notNullable().comment('A count only: no student names or data are kept');
    t.text('join_code').notNullable().comment('8 characters without look-alikes; rotating it ends every class session');
    t.timestamp('archived_at', { useTz: true }).nullable();
    t.timestamps(true, true);
    t.unique(['join_code'], { indexName: 'classes_join_code_unique' });
    t.index(['teacher_id'], 'classes_teacher_idx');
  });
  await knex.raw(
    'ALTER TABLE classes ADD CONSTRAINT classes_student_count_check CHECK (student_count BETWEEN 0 AND 500)',
  );

  await knex.schema.createTable('class_sessions', (t) => {
    t.text('id').primary().comment('SHA-256 of the cookie token');
    t.uuid('class_id')
      .notNullable()
      .references('id')
      .inTable('classes')
      .onDelete('CASCADE')
      .withKeyName('class_sessions_class_fk');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['class_id'], 'class_sessions_class_idx');
  });

  await knex.schema.createTable('kits', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('class_id')
      .notNullable()
      .references('id')
      .inTable('classes')
      .onDelete('CASCADE')
      .withKeyName('kits_class_fk');
    t.uuid('teacher_id')
      .notNullable()
      .references('id')
      .inTable('users')
      .onDelete('CASCADE')
      .withKeyName('kits_teacher_fk');
    t.text('title').notNullable();
    t.text('model_id').notNullable().comment('A demo model id from content/models, or an uploaded model id');
    t.text('activity_slug').nullable();
    t.jsonb('inputs')
      .notNullable()
      .comment('The kit request as validated: scale, sheet, paper weight, venue, copies, units');
    t.text('engine_version').notNullable();
    t.text('content_hash').notNullable().comment('SHA-256 of inputs + model + engine version');
    t.integer('sheet_count').notNullable().defaultTo(0);
    t.timestamps(true, true);
    t.index(['class_id'], 'kits_class_idx');
    t.index(['teacher_id'], 'kits_teacher_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('kits');
  await knex.schema.dropTableIfExists('class_sessions');
  await knex.schema.dropTableIfExists('classes');
  await knex.raw('DROP TYPE IF EXISTS grade_band');
}
