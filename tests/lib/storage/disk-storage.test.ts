import { mkdtempSync, readdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { diskStorageCreate } from '../../../src/lib/storage/disk-storage.server';
import { storageContract } from './storage-contract';

const root = mkdtempSync(join(tmpdir(), 'kw-disk-'));
afterAll(() => rm(root, { recursive: true, force: true }));

storageContract('disk', () => diskStorageCreate(root));

describe('diskStorageCreate', () => {
  it('leaves no partial file behind when a streamed put fails half way', async () => {
    const storage = diskStorageCreate(join(root, 'failing'));
    async function* broken() {
      yield Buffer.from('half of a photo');
      throw new Error('client went away');
    }
    const { Readable } = await import('node:stream');
    await expect(
      storage.put('photos/b/p.webp', Readable.from(broken()), { contentType: 'image/webp' }),
    ).rejects.toThrow('client went away');
    expect(readdirSync(join(root, 'failing', 'data', 'photos', 'b'))).toEqual([]);
    expect(await storage.getStream('photos/b/p.webp')).toBeNull();
  });
});
