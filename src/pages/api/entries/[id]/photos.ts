import { endpoint } from '../../../../lib/http/endpoint';
import { json } from '../../../../lib/http/respond';
import { entryPhotosAdd, entryPhotoUploadCheck } from '../../../../lib/photos/entry-photos.server';
import { photoUploadRead } from '../../../../lib/photos/photo-upload.server';

/**
 * Adds photos to an entry (its teacher, or its class session for a team entry, while it is a draft or returned):
 * multipart, files in "photo", one "altText" per file. Access and room are checked before the body is read; the
 * photos are stored all or none. Answers 201 with the entry's photos.
 */
export const POST = endpoint({ access: ['teacher', 'class'] }, async ({ locals, params, request }) => {
  const entryId = await entryPhotoUploadCheck(locals.actor, params.id ?? '');
  const photos = await photoUploadRead(request);
  return json({ photos: await entryPhotosAdd(locals.actor, entryId, photos) }, 201);
});
