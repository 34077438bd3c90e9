/** Serves one stored copy of a photo after its entry's access check (the two photo GET routes share it). */
import type { Actor } from '../../../lib/auth/actor';
import { NotFoundError } from '../../../lib/errors';
import { photoForActor, photoRead, type PhotoVariant } from '../../../lib/photos/entry-photos.server';
import { storageResponse } from '../../../lib/storage/storage-response.server';

/** Published photos may be cached briefly by anyone; unpublished ones by no one (a shared cache could leak them). */
const PUBLISHED_CACHE_CONTROL = 'public, max-age=300';
const PRIVATE_CACHE_CONTROL = 'private, no-store';

/** The photo copy as a response; 404 when the actor may not see its entry or the copy is gone. */
export async function photoServe(actor: Actor, photoId: string, variant: PhotoVariant): Promise<Response> {
  const { row, published } = await photoForActor(actor, photoId);
  const object = await photoRead(row, variant);
  if (!object) throw new NotFoundError('This photo is no longer stored.');
  return storageResponse(object, {
    'cache-control': published ? PUBLISHED_CACHE_CONTROL : PRIVATE_CACHE_CONTROL,
    'content-disposition': 'inline',
  });
}
