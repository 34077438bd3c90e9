/**
 * The storage contract, one suite run against every driver (disk-storage.test.ts, s3-storage.test.ts): what a
 * put stores comes back byte for byte with its type and length, a missing key reads as null, delete is
 * idempotent, a put replaces, streamed bodies work, and keys that could escape their folder are refused.
 */
import { createHash, randomBytes } from 'node:crypto';
import { Readable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import type { ObjectStorage } from '../../../src/lib/storage/object-storage';

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** Registers the contract tests for the storage `make()` returns (called once per test). */
export function storageContract(driverName: string, make: () => ObjectStorage): void {
  describe(`${driverName} storage contract`, () => {
    it('returns what was put, byte for byte, with its content type and length', async () => {
      const storage = make();
      const body = randomBytes(300_000);
      await storage.put('photos/a1/p1.webp', body, { contentType: 'image/webp' });
      const got = await storage.getStream('photos/a1/p1.webp');
      expect(got).not.toBeNull();
      expect(got!.contentType).toBe('image/webp');
      expect(got!.sizeBytes).toBe(body.byteLength);
      expect(sha256(await bytesOf(got!.stream))).toBe(sha256(body));
    });

    it('answers null for a key that holds nothing', async () => {
      expect(await make().getStream('photos/none/missing.webp')).toBeNull();
    });

    it('replaces the object when the same key is put again', async () => {
      const storage = make();
      await storage.put('photos/a2/p.jpg', Buffer.from('first version'), { contentType: 'image/jpeg' });
      await storage.put('photos/a2/p.jpg', Buffer.from('second'), { contentType: 'image/png' });
      const got = await storage.getStream('photos/a2/p.jpg');
      expect((await bytesOf(got!.stream)).toString()).toBe('second');
      expect(got!.contentType).toBe('image/png');
    });

    it('stores a streamed body of known and of unknown length', async () => {
      const storage = make();
      const body = randomBytes(1_500_000);
      const chunks = () => Readable.from([body.subarray(0, 700_000), body.subarray(700_000)]);
      await storage.put('meshes/m1.stl', chunks(), { contentType: 'model/stl', sizeBytes: body.byteLength });
      await storage.put('meshes/m2.stl', chunks(), { contentType: 'model/stl' });
      for (const key of ['meshes/m1.stl', 'meshes/m2.stl']) {
        const got = await storage.getStream(key);
        expect(got!.sizeBytes).toBe(body.byteLength);
        expect(sha256(await bytesOf(got!.stream))).toBe(sha256(body));
      }
    });

    it('deletes an object, and deleting it again is not an error', async () => {
      const storage = make();
      await storage.put('photos/a3/p.webp', Buffer.from('x'), { contentType: 'image/webp' });
      await storage.delete('photos/a3/p.webp');
      expect(await storage.getStream('photos/a3/p.webp')).toBeNull();
      await expect(storage.delete('photos/a3/p.webp')).resolves.toBeUndefined();
    });

    it('refuses keys that are absolute, climb out with "..", are empty or use upper case', async () => {
      const storage = make();
      for (const key of ['/etc/passwd', '../outside', 'photos/../../x', '', 'Photos/a.webp', 'a//b']) {
        await expect(storage.put(key, Buffer.from('x'), { contentType: 'text/plain' })).rejects.toThrow(/storage key/);
        await expect(storage.getStream(key)).rejects.toThrow(/storage key/);
      }
    });
  });
}
