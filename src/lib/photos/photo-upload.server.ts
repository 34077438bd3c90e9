/**
 * Reads an upload of journal photos: a multipart form with files in the field "photo" and, in the same order,
 * one "altText" field per photo. Each file is read (at most 10 MB) and processed while the rest of the request
 * waits; photoProcessStream reads a photo only when a decode slot is free, so the originals in memory stay few
however many uploads arrive together.
 */
import { InputError } from '../errors';
import { multipartRead } from '../upload/multipart-read.server';
import { parseInput } from '../validation';
import type { PhotoToSave } from './entry-photos.server';
import { photoProcessStream } from './photo-process.server';
import {
  ENTRY_PHOTOS_MAX,
  PHOTO_ACCEPTED_SENTENCE,
  PHOTO_ALT_TEXT_MAX,
  PHOTO_BYTES_MAX,
  PHOTO_REQUEST_BYTES_MAX,
  PhotoAltTextSchema,
} from './photo-rules';

/** The form field that carries the photo files. */
export const PHOTO_FILE_FIELD = 'photo';
/** The form field that carries each photo's alt text, in the order of the files. */
export const PHOTO_ALT_FIELD = 'altText';

/** The processed photos of an upload request with their alt texts; 400/413 with what is accepted otherwise. */
export async function photoUploadRead(request: Request): Promise<PhotoToSave[]> {
  const { fields, files } = await multipartRead(
    request,
    {
      fileBytesMax: PHOTO_BYTES_MAX,
      filesMax: ENTRY_PHOTOS_MAX,
      requestBytesMax: PHOTO_REQUEST_BYTES_MAX,
      fieldBytesMax: PHOTO_ALT_TEXT_MAX * 4, // UTF-8: at most four bytes a character
      fieldsMax: ENTRY_PHOTOS_MAX + 4,
      fileNoun: 'photo',
    },
    async (part) => {
      const name = part.filename ? `"${part.filename}"` : `Photo ${part.index + 1}`;
      if (part.field !== PHOTO_FILE_FIELD) {
        throw new InputError(`Send photos in the form field "${PHOTO_FILE_FIELD}", not "${part.field}".`);
      }
      return photoProcessStream(part.stream, name);
    },
  );
  if (files.length === 0) throw new InputError(`Attach at least one photo. ${PHOTO_ACCEPTED_SENTENCE}`);
  const altTexts = fields[PHOTO_ALT_FIELD] ?? [];
  return files.map((photo, i) => ({
    photo,
    altText: parseInput(PhotoAltTextSchema, altTexts[i] ?? '', `photo ${i + 1}'s description`),
  }));
}
