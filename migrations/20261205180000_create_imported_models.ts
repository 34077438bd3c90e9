import type { Knex } from 'knex';

/**
 * kits — an index on model_id, to count the kits of an imported model.
 * imported_models — meshes uploaded as OBJ or STL and checked for paper (src/lib/mesh): the original file in
 *   upload storage, the repaired mesh ready to unfold, what the check found and repaired, and the unit the
 *   uploader chose. Owned by the account that uploaded it; a coordinator can share it with every account. Kits
 *   name an imported model in their inputs (importId) and in model_id as "import:<id>".
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('imported_models', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('owner_id')
      .references('id')
      .inTable('users')
      .onDelete('SET NULL')
      .comment('the uploader; null once the account is gone');
    t.text('title').notNullable();
    t.text('file_name').notNullable().comment('the name the file had, for the teacher; it decides nothing');
    t.text('file_kind').notNullable().checkIn(['stl', 'obj']);
    t.integer('file_bytes').notNullable();
    t.text('storage_key').notNullable().comment('the original file in upload storage');
    t.text('unit').notNullable().checkIn(['mm', 'cm', 'm', 'in']);
    t.text('unit_guess').notNullable().checkIn(['mm', 'cm', 'm', 'in']);
    t.boolean('shared').notNullable().defaultTo(false).comment('set by a coordinator: every account may build it');
    t.integer('triangle_count').notNullable().comment('triangles of the repaired mesh');
    t.integer('face_count').notNullable().comment('polygon faces after coplanar triangles merge');
    t.jsonb('extents').notNullable().comment('bounding box x, y, z in file numbers');
    t.jsonb('findings').notNullable();
    t.jsonb('repairs').notNullable().comment('sentences: what the check repaired');
    t.binary('mesh').notNullable().comment('the repaired mesh (src/lib/mesh/mesh-binary.ts)');
    t.text('mesh_digest')
      .notNullable()
      .comment('SHA-256 of mesh, or of reduced_mesh when there is one: the content hash of kits');
    t.binary('reduced_mesh').comment('the mesh reduced to a target triangle count, when the uploader asked');
    t.integer('reduced_triangle_count');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['owner_id', 'created_at']);
  });
  await knex.raw('CREATE INDEX imported_models_shared ON imported_models (created_at) WHERE shared');
  // Kits built from an imported model are counted on every list of imported models.
  await knex.schema.alterTable('kits', (t) => t.index(['model_id']));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('kits', (t) => t.dropIndex(['model_id']));
  await knex.schema.dropTable('imported_models');
}
