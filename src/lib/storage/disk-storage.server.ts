/**
 * The local-disk storage driver (the default): each object is a file under `<root>/data/<key>`, its media type
 * in `<root>/meta/<key>.json`. A put writes a temporary file and renames it into place, so a reader sees the
 * old object or the new one, never half of one.
 */
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, readFile, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { randomUUID } from 'node:crypto';
import { storageKeyCheck, type ObjectPutOptions, type ObjectStorage, type StoredObject } from './object-storage';

interface ObjectMeta {
  contentType: string;
}

/** A disk driver storing under the given folder (created on first put). */
export function diskStorageCreate(rootDir: string): ObjectStorage {
  const dataPath = (key: string) => join(rootDir, 'data', storageKeyCheck(key));
  const metaPath = (key: string) => join(rootDir, 'meta', `${storageKeyCheck(key)}.json`);

  return {
    driver: 'disk',

    async put(key: string, body: Buffer | Readable, options: ObjectPutOptions): Promise<void> {
      const target = dataPath(key);
      const temp = `${target}.${randomUUID()}.partial`;
      await mkdir(dirname(target), { recursive: true });
      await mkdir(dirname(metaPath(key)), { recursive: true });
      try {
        if (Buffer.isBuffer(body)) await writeFile(temp, body);
        else await pipeline(body, createWriteStream(temp));
        const meta: ObjectMeta = { contentType: options.contentType };
        await writeFile(metaPath(key), JSON.stringify(meta));
        await rename(temp, target);
      } catch (err) {
        await rm(temp, { force: true });
        throw err;
      }
    },

    async getStream(key: string): Promise<StoredObject | null> {
      const path = dataPath(key);
      let sizeBytes: number;
      try {
        sizeBytes = (await stat(path)).size;
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw err;
      }
      const meta = JSON.parse(await readFile(metaPath(key), 'utf8')) as ObjectMeta;
      return { stream: createReadStream(path), contentType: meta.contentType, sizeBytes };
    },

    async delete(key: string): Promise<void> {
      await rm(dataPath(key), { force: true });
      await rm(metaPath(key), { force: true });
    },
  };
}
