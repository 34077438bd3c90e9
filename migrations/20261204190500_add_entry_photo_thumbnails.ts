import type { Knex } from 'knex';

/**
 * entry_photos, for stored photo copies: each photo is kept as a display copy (storage_key, width_px, height_px,
 * size_bytes, content_type) and a thumbnail (thumbnail_* columns), both re-encoded without metadata; the original
 * upload is never kept, only its real type (source_type, from its bytes). position orders an entry's photos.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('entry_photos', (t) => {
    t.text('thumbnail_storage_key').notNullable().defaultTo('').comment('Storage key of the thumbnail copy');
    t.integer('thumbnail_width_px').notNullable().defaultTo(0);
    t.integer('thumbnail_height_px').notNullable().defaultTo(0);
    t.integer('position').notNullable().defaultTo(0).comment('Order of the photo within its entry, from 0');
    t.text('source_type')
      .notNullable()
      .defaultTo('image/jpeg')
      .comment('Media type of the upload as its bytes said (image/jpeg, image/png, image/webp)');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('entry_photos', (t) => {
    t.dropColumns('thumbnail_storage_key', 'thumbnail_width_px', 'thumbnail_height_px', 'position', 'source_type');
  });
}
