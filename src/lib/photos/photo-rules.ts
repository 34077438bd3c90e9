/**
 * The rules for journal photos, in one place: limits, accepted types, sizes of the stored copies, the alt-text
 * schema, the URLs photos are served at, and the statement a teacher confirms before an entry with photos is
 * submitted. Pure (no server imports): the upload form, the routes and the processing all read it.
 */
import { z } from 'zod';

/** Most photos on one entry. */
export const ENTRY_PHOTOS_MAX = 6;
/** Largest photo a teacher or team may upload, bytes (10 MB). */
export const PHOTO_BYTES_MAX = 10_000_000;
/** Largest upload request, bytes (40 MB): several photos at once, sent in groups under this by the form. */
export const PHOTO_REQUEST_BYTES_MAX = 40_000_000;
/**
 * Most pixels a photo may declare (50 megapixels: a 48-megapixel phone photo fits). Checked from the header
 * before any decoding, so a small file declaring a huge image (a decompression bomb) is refused unread.
 */
export const PHOTO_PIXELS_MAX = 50_000_000; // common practice, no source: above today's phone cameras' full size
/** Longest side of the display copy, px. */
export const PHOTO_DISPLAY_MAX_PX = 1600;
/** Longest side of the thumbnail, px. */
export const PHOTO_THUMBNAIL_MAX_PX = 400;
/** Longest alt text, characters. */
export const PHOTO_ALT_TEXT_MAX = 250;

/** Media types accepted, decided from the file's first bytes (never its name or declared type). */
export const PHOTO_ACCEPTED_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoAcceptedType = (typeof PHOTO_ACCEPTED_TYPES)[number];

/** The sentence every refusal ends with: what would be accepted. */
export const PHOTO_ACCEPTED_SENTENCE = `Photos must be JPEG, PNG or WebP images of at most ${PHOTO_BYTES_MAX / 1_000_000} MB and ${PHOTO_PIXELS_MAX / 1_000_000} megapixels, ${ENTRY_PHOTOS_MAX} to an entry.`;

/** The statement a teacher confirms before an entry with photos goes to review. */
export const PHOTO_RELEASE_STATEMENT =
  "No student can be identified in these photos (no faces, names or name tags), or the school's photo releases are on file for every student who can be.";

/** True when submitting an entry with this many photos needs the teacher's confirmation of the statement. */
export function photoReleaseRequired(photoCount: number): boolean {
  return photoCount > 0;
}

/** Alt text: what the photo shows, for readers who cannot see it. */
export const PhotoAltTextSchema = z
  .string()
  .trim()
  .max(PHOTO_ALT_TEXT_MAX, `Keep the description to ${PHOTO_ALT_TEXT_MAX} characters or fewer.`);

/** The change a PATCH of a photo makes. */
export const PhotoPatchSchema = z.object({ altText: PhotoAltTextSchema }).strict();
export type PhotoPatch = z.infer<typeof PhotoPatchSchema>;

/** A stored photo as pages, forms and the booklet see it. */
export interface EntryPhotoView {
  id: string;
  entryId: string;
  altText: string;
  /** The stored copies' type (JPEG). */
  contentType: string;
  /** What the upload really was, from its bytes. */
  sourceType: string;
  widthPx: number;
  heightPx: number;
  thumbnailWidthPx: number;
  thumbnailHeightPx: number;
  url: string;
  thumbnailUrl: string;
}

/** Where the app serves a photo's display copy (after checking who may see its entry). */
export function photoUrl(photoId: string): string {
  return `/api/photos/${photoId}`;
}

/** Where the app serves a photo's thumbnail. */
export function photoThumbnailUrl(photoId: string): string {
  return `/api/photos/${photoId}/thumbnail`;
}

/** Room left in each upload request for the multipart framing and the alt-text fields, bytes. */
const PHOTO_REQUEST_FRAMING_BYTES = 64_000; // common practice, no source: generous for 6 parts' headers and alt text

/**
 * Groups photos (by their sizes in bytes, in order) into upload requests that each stay under the request limit,
 * keeping the order: the indexes of each request's photos. A photo over the photo limit still gets a request of
 * its own, so the server can say what is wrong with it.
 */
export function photoUploadBatches(sizesBytes: readonly number[]): number[][] {
  const batches: number[][] = [];
  let current: number[] = [];
  let total = 0;
  for (const [i, size] of sizesBytes.entries()) {
    if (
      current.length > 0 &&
      (total + size > PHOTO_REQUEST_BYTES_MAX - PHOTO_REQUEST_FRAMING_BYTES || current.length === ENTRY_PHOTOS_MAX)
    ) {
      batches.push(current);
      current = [];
      total = 0;
    }
    current.push(i);
    total += size;
  }
  if (current.length > 0) batches.push(current);
  return batches;
}
