/**
 * A journal entry's photos: storing the processed copies (storage + entry_photos rows, all or nothing), listing
 * them for pages and the booklet, reading them back, changing alt text and deleting. Who may do what is asked of
 * the entry (src/lib/journal/entry-access.server.ts); this module never decides it.
 */
import type { Knex } from 'knex';
import type { Actor } from '../auth/actor';
import {
  entryPhotoAltTextSet,
  entryPhotoById,
  entryPhotoCount,
  entryPhotoDelete,
  entryPhotoInsert,
  entryPhotoNextPosition,
  entryPhotoRows,
  type EntryPhotoRow,
} from '../db/entry-photos';
import { db } from '../db/knex';
import { InputError, NotFoundError } from '../errors';
import { entryEditableByActor, entryForActor } from '../journal/entry-access.server';
import type { StoredObject } from '../storage/object-storage';
import { appStorage } from '../storage/storage.server';
import { photoProcess, type ProcessedPhoto } from './photo-process.server';
import {
  ENTRY_PHOTOS_MAX,
  PHOTO_ACCEPTED_SENTENCE,
  photoThumbnailUrl,
  photoUrl,
  type EntryPhotoView,
} from './photo-rules';

/** Which stored copy of a photo. */
export type PhotoVariant = 'display' | 'thumbnail';

/** A processed photo with the alt text it was sent with. */
export interface PhotoToSave {
  photo: ProcessedPhoto;
  altText: string;
}

const PHOTO_NOT_FOUND = 'There is no photo with that id among the photos you can open.';

/** Storage keys of a photo's two copies. */
export function photoStorageKeysOf(entryId: string, photoId: string): Record<PhotoVariant, string> {
  return { display: `photos/${entryId}/${photoId}.jpg`, thumbnail: `photos/${entryId}/${photoId}-thumb.jpg` };
}

/** A row as pages and forms see it. */
export function entryPhotoView(row: EntryPhotoRow): EntryPhotoView {
  return {
    id: row.id,
    entryId: row.entry_id,
    altText: row.alt_text,
    contentType: row.content_type,
    sourceType: row.source_type,
    widthPx: row.width_px,
    heightPx: row.height_px,
    thumbnailWidthPx: row.thumbnail_width_px,
    thumbnailHeightPx: row.thumbnail_height_px,
    url: photoUrl(row.id),
    thumbnailUrl: photoThumbnailUrl(row.id),
  };
}

/** The photos of each entry, in order (entries without photos get an empty list). No access check inside. */
export async function entryPhotoList(entryIds: readonly string[], trx?: Knex): Promise<Map<string, EntryPhotoView[]>> {
  const out = new Map<string, EntryPhotoView[]>(entryIds.map((id) => [id, []]));
  for (const row of await entryPhotoRows(entryIds, trx)) out.get(row.entry_id)?.push(entryPhotoView(row));
  return out;
}

/** Throws InputError when adding `adding` photos to an entry that has `existing` would pass the limit. */
export function entryPhotoRoomCheck(existing: number, adding: number): void {
  if (existing + adding <= ENTRY_PHOTOS_MAX) return;
  const room = Math.max(0, ENTRY_PHOTOS_MAX - existing);
  throw new InputError(
    `This entry has ${existing} photo${existing === 1 ? '' : 's'}; ${adding} more would pass the ${ENTRY_PHOTOS_MAX} an entry may have` +
      (room > 0 ? ` (room for ${room}).` : '. Delete one first.') +
      ` ${PHOTO_ACCEPTED_SENTENCE}`,
  );
}

/**
 * Stores processed photos on the entry, all or nothing: every copy is put in storage, then the rows are inserted
 * in the transaction; if anything fails the copies already put are deleted. Checks the entry's photo limit
 * (call it with the entry row locked). The entry's photos after the change.
 */
export async function entryPhotosSave(entryId: string, photos: PhotoToSave[], trx: Knex): Promise<EntryPhotoView[]> {
  entryPhotoRoomCheck(await entryPhotoCount(entryId, trx), photos.length);
  const storage = appStorage();
  const put: string[] = [];
  try {
    const first = await entryPhotoNextPosition(entryId, trx);
    const rows = [];
    for (const [i, { photo, altText }] of photos.entries()) {
      const id = crypto.randomUUID();
      const keys = photoStorageKeysOf(entryId, id);
      for (const variant of ['display', 'thumbnail'] as const) {
        const copy = photo[variant];
        await storage.put(keys[variant], copy.bytes, { contentType: copy.contentType });
        put.push(keys[variant]);
      }
      rows.push({
        id,
        entry_id: entryId,
        storage_key: keys.display,
        thumbnail_storage_key: keys.thumbnail,
        content_type: photo.display.contentType,
        width_px: photo.display.widthPx,
        height_px: photo.display.heightPx,
        thumbnail_width_px: photo.thumbnail.widthPx,
        thumbnail_height_px: photo.thumbnail.heightPx,
        size_bytes: photo.display.bytes.byteLength,
        alt_text: altText,
        position: first + i,
        source_type: photo.sourceType,
      });
    }
    await entryPhotoInsert(rows, trx);
  } catch (err) {
    await photoStorageDelete(put);
    throw err;
  }
  return (await entryPhotoList([entryId], trx)).get(entryId) ?? [];
}

/**
 * Checks, before an upload is read, that the actor may add photos to the entry now and that it has room for one
 * more (404, 409 or 400); the entry's id.
 */
export async function entryPhotoUploadCheck(actor: Actor, entryId: string): Promise<string> {
  const entry = await entryEditableByActor(actor, entryId);
  entryPhotoRoomCheck(await entryPhotoCount(entry.id), 1);
  return entry.id;
}

/** Saves uploaded photos on the entry, checking again with the entry locked that the actor may change it. */
export function entryPhotosAdd(actor: Actor, entryId: string, photos: PhotoToSave[]): Promise<EntryPhotoView[]> {
  return db().transaction(async (trx) => {
    await entryEditableByActor(actor, entryId, trx);
    return entryPhotosSave(entryId, photos, trx);
  });
}

/**
 * Processes and stores photos given as bytes (the seed and scripts use it; the upload route processes as the
 * request streams, then calls entryPhotosSave). No access check: the caller has one or needs none.
 */
export async function entryPhotosStore(
  entryId: string,
  photos: { bytes: Buffer; altText: string }[],
  trx?: Knex,
): Promise<EntryPhotoView[]> {
  const processed: PhotoToSave[] = [];
  for (const p of photos) processed.push({ photo: await photoProcess(p.bytes), altText: p.altText });
  return trx
    ? entryPhotosSave(entryId, processed, trx)
    : db().transaction((t) => entryPhotosSave(entryId, processed, t));
}

/** The photo and whether its entry is published, if the actor may see its entry; NotFoundError otherwise. */
export async function photoForActor(
  actor: Actor,
  photoId: string,
): Promise<{ row: EntryPhotoRow; published: boolean }> {
  const row = await entryPhotoById(photoId);
  if (!row) throw new NotFoundError(PHOTO_NOT_FOUND);
  try {
    const entry = await entryForActor(actor, row.entry_id);
    return { row, published: entry.state === 'published' };
  } catch (err) {
    if (err instanceof NotFoundError) throw new NotFoundError(PHOTO_NOT_FOUND);
    throw err;
  }
}

/** One stored copy of the photo, or null when storage has lost it. */
export function photoRead(row: EntryPhotoRow, variant: PhotoVariant): Promise<StoredObject | null> {
  return appStorage().getStream(variant === 'display' ? row.storage_key : row.thumbnail_storage_key);
}

/** A photo copy's bytes (for the PDF booklet), or null. No access check: call it only for entries already checked. */
export async function photoBytes(photoId: string, variant: PhotoVariant = 'display'): Promise<Buffer | null> {
  const row = await entryPhotoById(photoId);
  const object = row ? await photoRead(row, variant) : null;
  if (!object) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of object.stream) chunks.push(Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}

/** Changes a photo's alt text, if the actor may change its entry now. */
export async function photoAltTextChange(actor: Actor, photoId: string, altText: string): Promise<EntryPhotoView> {
  return db().transaction(async (trx) => {
    const row = await editablePhoto(actor, photoId, trx);
    return entryPhotoView(await entryPhotoAltTextSet(row.id, altText, trx));
  });
}

/** Deletes a photo (row, then its stored copies), if the actor may change its entry now. */
export async function photoRemove(actor: Actor, photoId: string): Promise<void> {
  const keys = await db().transaction(async (trx) => {
    const row = await editablePhoto(actor, photoId, trx);
    await entryPhotoDelete(row.id, trx);
    return [row.storage_key, row.thumbnail_storage_key];
  });
  // After the commit: a failed delete leaves an orphan file, never a row pointing at nothing.
  await photoStorageDelete(keys);
}

async function editablePhoto(actor: Actor, photoId: string, trx: Knex): Promise<EntryPhotoRow> {
  const row = await entryPhotoById(photoId, trx);
  if (!row) throw new NotFoundError(PHOTO_NOT_FOUND);
  await entryEditableByActor(actor, row.entry_id, trx);
  return row;
}

/** The storage keys of all the entry's photo copies (read them before deleting the entry, in its transaction). */
export async function entryPhotoStorageKeys(entryId: string, trx?: Knex): Promise<string[]> {
  return (await entryPhotoRows([entryId], trx)).flatMap((r) => [r.storage_key, r.thumbnail_storage_key]);
}

/** Deletes stored copies by key (after the rows' transaction committed). */
export async function photoStorageDelete(keys: readonly string[]): Promise<void> {
  const storage = appStorage();
  await Promise.all(keys.map((key) => storage.delete(key)));
}
