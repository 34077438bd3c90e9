/**
 * Photo checks and re-encoding. Metadata is read back with exifr (an EXIF reader from the npm registry,
 * independent of sharp, which writes our copies); types with file-type; orientation values from the EXIF 2.32
 * Orientation tag table (6 = the stored image must turn 90° clockwise to display upright).
 */
import exifr from 'exifr';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import { photoProcess, polyglotSignatureFind } from '../../../src/lib/photos/photo-process.server';
import { PHOTO_DISPLAY_MAX_PX, PHOTO_THUMBNAIL_MAX_PX } from '../../../src/lib/photos/photo-rules';
import {
  FIXTURE_CAMERA,
  pdfDocument,
  photoBombPng,
  photoJpeg,
  photoJpegWithGps,
  photoOrientation6,
  photoPng,
  photoPolyglot,
} from '../../fixtures/photos';

const ACCEPTED = /Photos must be JPEG, PNG or WebP images of at most 10 MB and 50 megapixels, 6 to an entry\./;

async function refusal(bytes: Buffer): Promise<InputError> {
  const err = await photoProcess(bytes, '"x.jpg"').catch((e: unknown) => e);
  expect(err).toBeInstanceOf(InputError);
  expect((err as Error).message).toMatch(ACCEPTED);
  return err as InputError;
}

describe('photoProcess', () => {
  it('stores no GPS position, camera make or model, nor any EXIF at all', async () => {
    const source = await photoJpegWithGps();
    // The fixture really carries them (else the test below proves nothing).
    const before = await exifr.parse(source, true);
    expect(before).toMatchObject({ ...FIXTURE_CAMERA, GPSLatitudeRef: 'N' });
    expect(before.latitude).toBeCloseTo(45.504, 3);

    const photo = await photoProcess(source);
    for (const copy of [photo.display, photo.thumbnail]) {
      // exifr reads JPEG (it throws on formats it does not know, so undefined here means "read, found none").
      expect((await fileTypeFromBuffer(copy.bytes))?.mime).toBe('image/jpeg');
      const after: Record<string, unknown> | undefined = await exifr.parse(copy.bytes, true);
      expect(after?.Make).toBeUndefined();
      expect(after?.Model).toBeUndefined();
      expect(after?.latitude).toBeUndefined();
      expect(after?.GPSLatitude).toBeUndefined();
      expect(await exifr.gps(copy.bytes)).toBeUndefined();
      const meta = await sharp(copy.bytes).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.iptc).toBeUndefined();
      expect(copy.bytes.includes(Buffer.from('Invented Optics'))).toBe(false);
    }
  });

  it('turns a photo tagged orientation 6 upright and drops the tag', async () => {
    const photo = await photoProcess(await photoOrientation6());
    expect([photo.display.widthPx, photo.display.heightPx]).toEqual([40, 60]);
    const { data, info } = await sharp(photo.display.bytes).raw().toBuffer({ resolveWithObject: true });
    const pixel = (x: number, y: number) => [
      ...data.subarray((y * info.width + x) * info.channels, (y * info.width + x) * info.channels + 3),
    ];
    // The stored left half (red) is on top once turned 90° clockwise; the right half (blue) below.
    expect(pixel(20, 10)[0]).toBeGreaterThan(200);
    expect(pixel(20, 10)[2]).toBeLessThan(60);
    expect(pixel(20, 50)[2]).toBeGreaterThan(200);
    expect(pixel(20, 50)[0]).toBeLessThan(60);
    expect((await sharp(photo.display.bytes).metadata()).orientation).toBeUndefined();
  });

  it('makes a JPEG display copy of at most 1600 px and a thumbnail of at most 400 px, keeping the aspect', async () => {
    const photo = await photoProcess(await photoJpeg(3200, 1800));
    expect((await fileTypeFromBuffer(photo.display.bytes))?.mime).toBe('image/jpeg');
    expect((await fileTypeFromBuffer(photo.thumbnail.bytes))?.mime).toBe('image/jpeg');
    expect([photo.display.widthPx, photo.display.heightPx]).toEqual([PHOTO_DISPLAY_MAX_PX, 900]);
    expect([photo.thumbnail.widthPx, photo.thumbnail.heightPx]).toEqual([PHOTO_THUMBNAIL_MAX_PX, 225]);
    const meta = await sharp(photo.display.bytes).metadata();
    expect([meta.width, meta.height]).toEqual([1600, 900]);
  });

  it('does not enlarge a small photo', async () => {
    const photo = await photoProcess(await photoPng(320, 200));
    expect([photo.display.widthPx, photo.display.heightPx]).toEqual([320, 200]);
    expect([photo.thumbnail.widthPx, photo.thumbnail.heightPx]).toEqual([320, 200]);
  });

  it('decides the type from the bytes: a PNG named .jpg is a PNG', async () => {
    const photo = await photoProcess(await photoPng(), '"team.jpg"');
    expect(photo.sourceType).toBe('image/png');
  });

  it('refuses an empty file', async () => {
    expect((await refusal(Buffer.alloc(0))).message).toMatch(/is empty \(0 bytes\)/);
  });

  it('refuses a PDF, naming what it is', async () => {
    expect((await refusal(pdfDocument())).message).toMatch(/is application\/pdf \(\.pdf\), not a photo type/);
  });

  it('refuses bytes no sniffer recognises', async () => {
    expect((await refusal(Buffer.from('just some text, not an image'))).message).toMatch(
      /not an image Kitwright recognises/,
    );
  });

  it('refuses a JPEG header followed by a script (polyglot)', async () => {
    expect((await fileTypeFromBuffer(photoPolyglot()))?.mime).toBe('image/jpeg');
    expect((await refusal(photoPolyglot())).message).toMatch(/carries "<script" text/);
  });

  it('refuses a whole, valid JPEG with a script appended after its end', async () => {
    const tail = Buffer.concat([await photoJpeg(64, 64), Buffer.from('<SCRIPT src=//x.example/a.js></SCRIPT>')]);
    expect((await refusal(tail)).message).toMatch(/carries "<script" text/);
  });

  it('refuses a small PNG declaring 50,000 × 50,000 px before decoding it', async () => {
    const bomb = photoBombPng();
    expect(bomb.byteLength).toBeLessThan(20_000);
    expect((await refusal(bomb)).message).toMatch(/declares 50000 × 50000 px \(2,500 megapixels\)/);
  });

  it('refuses a JPEG cut short', async () => {
    const whole = await photoJpeg(400, 300);
    expect((await refusal(whole.subarray(0, Math.floor(whole.byteLength / 2)))).message).toMatch(
      /damaged or cut short/,
    );
  });
});

describe('polyglotSignatureFind', () => {
  it('finds markup in any letter case and nothing in plain image data', async () => {
    expect(polyglotSignatureFind(Buffer.from('xx<ScRiPt>'))).toBe('<script');
    expect(polyglotSignatureFind(Buffer.from('<!DOCTYPE HTML><p>'))).toBe('<!doctype html');
    expect(polyglotSignatureFind(await photoJpeg(800, 600))).toBeNull();
  });
});
