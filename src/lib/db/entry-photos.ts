/**
 * Queries on entry_photos: the stored copies of a journal entry's photos. Who may see or change them is decided
 * by the entry (src/lib/journal/entry-access.server.ts).
 */
import type { Knex } from 'knex';
import { isUuid } from './accounts';
import { db } from './knex';

export interface EntryPhotoRow {
  id: string;
  entry_id: string;
  storage_key: string;
  thumbnail_storage_key: string;
  content_type: string;
  width_px: number;
  height_px: number;
  thumbnail_width_px: number;
  thumbnail_height_px: number;
  size_bytes: number;
  alt_text: string;
  position: number;
  source_type: string;
  created_at: Date;
}

export type EntryPhotoInsert = Omit<EntryPhotoRow, 'created_at'>;

/** The photo with that id, or null (also for a malformed id). */
export async function entryPhotoById(id: string, trx: Knex = db()): Promise<EntryPhotoRow | null> {
  if (!isUuid(id)) return null;
  return (await trx<EntryPhotoRow>('entry_photos').where({ id }).first()) ?? null;
}

/** The photos of the entries, in each entry's order. */
export async function entryPhotoRows(entryIds: readonly string[], trx: Knex = db()): Promise<EntryPhotoRow[]> {
  if (entryIds.length === 0) return [];
  return trx<EntryPhotoRow>('entry_photos')
    .whereIn('entry_id', entryIds)
    .orderBy([{ column: 'entry_id' }, { column: 'position' }, { column: 'created_at' }]);
}

/** How many photos the entry has. */
export async function entryPhotoCount(entryId: string, trx: Knex = db()): Promise<number> {
  const row = await trx('entry_photos').where({ entry_id: entryId }).count<{ count: string }[]>('* as count').first();
  return Number(row?.count ?? 0);
}

/** The next free position on the entry. */
export async function entryPhotoNextPosition(entryId: string, trx: Knex = db()): Promise<number> {
  const row = await trx('entry_photos')
    .where({ entry_id: entryId })
    .max<{ max: number | null }[]>('position as max')
    .first();
  return row?.max === null || row?.max === undefined ? 0 : row.max + 1;
}

/** Inserts the photo rows. */
export async function entryPhotoInsert(rows: EntryPhotoInsert[], trx: Knex = db()): Promise<EntryPhotoRow[]> {
  if (rows.length === 0) return [];
  return trx<EntryPhotoRow>('entry_photos').insert(rows).returning('*');
}

/** Sets a photo's alt text; the updated row. */
export async function entryPhotoAltTextSet(id: string, altText: string, trx: Knex = db()): Promise<EntryPhotoRow> {
  const [row] = await trx<EntryPhotoRow>('entry_photos').where({ id }).update({ alt_text: altText }).returning('*');
  return row!;
}

/** Deletes a photo row. */
export async function entryPhotoDelete(id: string, trx: Knex = db()): Promise<void> {
  await trx('entry_photos').where({ id }).delete();
}
