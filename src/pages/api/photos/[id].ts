import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { photoAltTextChange, photoRemove } from '../../../lib/photos/entry-photos.server';
import { PhotoPatchSchema } from '../../../lib/photos/photo-rules';
import { parseInput } from '../../../lib/validation';
import { photoServe } from './_serve';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** A photo's display copy (≤ 1600 px JPEG): to anyone once its entry is published, else only its class and staff. */
export const GET = endpoint({ access: ['anyone'] }, ({ locals, params }) =>
  photoServe(locals.actor, params.id ?? '', 'display'),
);

/** Changes a photo's alt text (its entry's author side, while the entry can change). */
export const PATCH = endpoint({ access: ['teacher', 'class'] }, async ({ locals, params, request }) => {
  const { altText } = parseInput(PhotoPatchSchema, await readJson(request, BODY_BYTES_FORM), 'photo change');
  return { photo: await photoAltTextChange(locals.actor, params.id ?? '', altText) };
});

/** Deletes a photo and its stored copies (its entry's author side, while the entry can change). */
export const DELETE = endpoint({ access: ['teacher', 'class'] }, async ({ locals, params }) => {
  await photoRemove(locals.actor, params.id ?? '');
  return { ok: true };
});
