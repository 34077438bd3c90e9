/**
 * Upload storage behind one small interface: put an object, get it back as a stream, delete it. Two drivers
 * implement it (disk-storage.server.ts, s3-storage.server.ts) and pass the same contract tests
 * (tests/lib/storage). Objects are only ever read back through the app, which checks access first
 * (storage-response.server.ts); no driver hands out public URLs.
 */
import type { Readable } from 'node:stream';

/** What `put` is told about the object besides its bytes. */
export interface ObjectPutOptions {
  /** The media type answered when the object is read back, e.g. "image/webp". */
  contentType: string;
  /** The exact length in bytes when the body is a stream and the caller knows it (lets S3 stream it). */
  sizeBytes?: number;
}

/** An object read back: its bytes as a stream (the caller must consume or destroy it), type and length. */
export interface StoredObject {
  stream: Readable;
  contentType: string;
  sizeBytes: number;
}

/** The storage contract every driver keeps. */
export interface ObjectStorage {
  /** "disk" or "s3", for logs and the health of the configuration. */
  readonly driver: 'disk' | 's3';
  /** Stores the bytes under the key, replacing any object there; readers never see a half-written object. */
  put(key: string, body: Buffer | Readable, options: ObjectPutOptions): Promise<void>;
  /** The object under the key, or null when there is none. */
  getStream(key: string): Promise<StoredObject | null>;
  /** Removes the object; removing a key that holds nothing is not an error. */
  delete(key: string): Promise<void>;
}

/**
 * A storage key: lower-case segments of letters, digits, "_", "." and "-" joined by "/". Each segment starts
 * with a letter or digit, so no key is absolute, empty or climbs with "..".
 */
const STORAGE_KEY = /^[a-z0-9][a-z0-9_.-]*(?:\/[a-z0-9][a-z0-9_.-]*)*$/;

/** Longest key, characters (S3 allows 1024 bytes; a file path should stay well under PATH_MAX). */
export const STORAGE_KEY_MAX = 512;

/**
 * Returns the key when it is one the drivers accept; throws a plain Error (a programming mistake, never user
 * input: keys are made by the app from ids) when it is empty, too long, absolute or climbs with "..".
 */
export function storageKeyCheck(key: string): string {
  if (key.length > STORAGE_KEY_MAX || !STORAGE_KEY.test(key)) {
    throw new Error(`storage: "${key}" is not a valid storage key`);
  }
  return key;
}
