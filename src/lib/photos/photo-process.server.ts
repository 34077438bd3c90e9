/**
 * Turns an uploaded photo into the two copies Kitwright stores: a display copy (longest side ≤ 1600 px) and a
 * thumbnail (≤ 400 px), both JPEG (what every browser and the PDF booklet's jspdf embed as is), upright (turned by the photo's orientation tag) and without any of the
 * original's metadata (sharp writes none unless asked; the EXIF read-back test holds this). The original bytes
 * are never stored or served.
 *
 * Checks, cheapest first: not empty; the type from the first bytes (file-type), never the name; no markup or
 * script text hidden in the file (a polyglot); the pixel count from the header before decoding (a
 * decompression bomb); then a strict decode that refuses truncated or corrupt data. At most two photos are
 * decoded at once in the process, so memory does not grow with the number of concurrent uploads.
 */
import { fileTypeFromBuffer } from 'file-type';
import pLimit from 'p-limit';
import sharp, { type Sharp } from 'sharp';
import type { Readable } from 'node:stream';
import { InputError } from '../errors';
import { streamReadCapped } from '../upload/multipart-read.server';
import {
  PHOTO_ACCEPTED_SENTENCE,
  PHOTO_ACCEPTED_TYPES,
  PHOTO_BYTES_MAX,
  PHOTO_DISPLAY_MAX_PX,
  PHOTO_PIXELS_MAX,
  PHOTO_THUMBNAIL_MAX_PX,
  type PhotoAcceptedType,
} from './photo-rules';

/** One stored copy of a photo. */
export interface PhotoCopy {
  bytes: Buffer;
  contentType: 'image/jpeg';
  widthPx: number;
  heightPx: number;
}

/** A photo ready to store: its two copies and the type the upload really was. */
export interface ProcessedPhoto {
  display: PhotoCopy;
  thumbnail: PhotoCopy;
  sourceType: PhotoAcceptedType;
}

/**
 * Photos read and decoded at once in this process. An upload waiting for a slot is not read (the request waits
 * under back pressure), so memory holds at most this many originals however many uploads arrive together.
 */
export const PHOTO_DECODES_AT_ONCE = 2;
const photoSlot = pLimit(PHOTO_DECODES_AT_ONCE);

const DISPLAY_QUALITY = 82; // common practice, no source: JPEG quality where artefacts stop showing in photos
const THUMBNAIL_QUALITY = 75; // common practice, no source

/**
 * Markup and script openings that have no business inside a photo: a file carrying one is a polyglot (an image
 * that is also a page or a script) and is refused rather than cleaned. Each is at least 7 characters: compressed
 * image data is close to random, and a 4-letter one like "<svg" turned up by chance in about 1 in 70 noise
 * photos of 8 MB (seen in the upload bench); at 7 characters the chance is below 1 in 10^7 per photo.
 */
const POLYGLOT_SIGNATURES = ['<script', '<iframe', '<!doctype html', 'javascript:'];

/**
 * Checks and re-encodes one uploaded photo. `name` is only used in messages. Throws InputError (400) with a
 * message that says what is accepted when the bytes are not a photo Kitwright takes.
 */
export function photoProcess(bytes: Buffer, name = 'This file'): Promise<ProcessedPhoto> {
  return photoSlot(() => photoProcessNow(bytes, name));
}

/**
 * Reads an uploaded photo from its stream (at most the photo limit, else 413) once a slot is free, then checks
 * and re-encodes it like photoProcess.
 */
export function photoProcessStream(stream: Readable, name: string): Promise<ProcessedPhoto> {
  return photoSlot(async () => photoProcessNow(await streamReadCapped(stream, PHOTO_BYTES_MAX, name), name));
}

async function photoProcessNow(bytes: Buffer, name: string): Promise<ProcessedPhoto> {
  if (bytes.byteLength === 0) throw new InputError(`${name} is empty (0 bytes). ${PHOTO_ACCEPTED_SENTENCE}`);
  const sourceType = await photoTypeOf(bytes, name);
  const signature = polyglotSignatureFind(bytes);
  if (signature) {
    throw new InputError(
      `${name} carries "${signature}" text besides image data, so it is refused. ${PHOTO_ACCEPTED_SENTENCE}`,
    );
  }
  const meta = await sharp(bytes, { limitInputPixels: false })
    .metadata()
    .catch(() => {
      throw new InputError(`${name} could not be read as an image. ${PHOTO_ACCEPTED_SENTENCE}`);
    });
  const pixels = (meta.width ?? 0) * (meta.height ?? 0);
  if (pixels > PHOTO_PIXELS_MAX) {
    throw new InputError(
      `${name} declares ${meta.width} × ${meta.height} px (${Math.round(pixels / 1_000_000).toLocaleString('en-US')} megapixels), more than the ${PHOTO_PIXELS_MAX / 1_000_000} megapixels a photo may have. ${PHOTO_ACCEPTED_SENTENCE}`,
    );
  }
  try {
    const display = await copyOf(
      sharp(bytes, { limitInputPixels: PHOTO_PIXELS_MAX, failOn: 'error' }).rotate(),
      PHOTO_DISPLAY_MAX_PX,
      DISPLAY_QUALITY,
    );
    const thumbnail = await copyOf(sharp(display.bytes), PHOTO_THUMBNAIL_MAX_PX, THUMBNAIL_QUALITY);
    return { display, thumbnail, sourceType };
  } catch {
    throw new InputError(`${name} is damaged or cut short and could not be decoded. ${PHOTO_ACCEPTED_SENTENCE}`);
  }
}

async function photoTypeOf(bytes: Buffer, name: string): Promise<PhotoAcceptedType> {
  const found = await fileTypeFromBuffer(bytes);
  if (found && (PHOTO_ACCEPTED_TYPES as readonly string[]).includes(found.mime)) return found.mime as PhotoAcceptedType;
  const what =
    found === undefined
      ? 'is not an image Kitwright recognises'
      : found.mime === 'image/heic' || found.mime === 'image/heif'
        ? 'is a HEIC photo, which this server cannot decode (on a phone, share or export it as JPEG)'
        : `is ${found.mime} (.${found.ext}), not a photo type Kitwright takes`;
  throw new InputError(`${name} ${what}. ${PHOTO_ACCEPTED_SENTENCE}`);
}

/** The first markup or script signature found in the bytes (case-insensitive), or null. */
export function polyglotSignatureFind(bytes: Buffer): string | null {
  const text = bytes.toString('latin1').toLowerCase();
  return POLYGLOT_SIGNATURES.find((s) => text.includes(s)) ?? null;
}

async function copyOf(pipeline: Sharp, maxPx: number, quality: number): Promise<PhotoCopy> {
  const { data, info } = await pipeline
    .resize({ width: maxPx, height: maxPx, fit: 'inside', withoutEnlargement: true })
    .jpeg({ quality })
    .toBuffer({ resolveWithObject: true });
  return { bytes: data, contentType: 'image/jpeg', widthPx: info.width, heightPx: info.height };
}
