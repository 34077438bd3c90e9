/**
 * The app's storage, chosen by environment variables once per process:
 *   KW_STORAGE_DRIVER   "disk" (default) or "s3"
 *   KW_STORAGE_DIR      disk: the folder (default ".data/uploads" under the working folder; git ignores .data/)
 *   KW_S3_ENDPOINT, KW_S3_BUCKET, KW_S3_REGION, KW_S3_ACCESS_KEY_ID, KW_S3_SECRET_ACCESS_KEY   s3: the bucket
 */
import { resolve } from 'node:path';
import { diskStorageCreate } from './disk-storage.server';
import type { ObjectStorage } from './object-storage';
import { s3StorageCreate } from './s3-storage.server';
import { serverEnv } from '../server-config';

/** The disk driver's folder when KW_STORAGE_DIR is not set, relative to the working folder. */
export const STORAGE_DIR_DEFAULT = '.data/uploads';

const S3_VARIABLES = ['KW_S3_BUCKET', 'KW_S3_REGION', 'KW_S3_ACCESS_KEY_ID', 'KW_S3_SECRET_ACCESS_KEY'] as const;

/** The storage the variables describe; throws at start-up when they name an unknown driver or miss S3 settings. */
export function storageFromEnv(env: Record<string, string | undefined>): ObjectStorage {
  const driver = env.KW_STORAGE_DRIVER || 'disk';
  if (driver === 'disk') return diskStorageCreate(resolve(env.KW_STORAGE_DIR || STORAGE_DIR_DEFAULT));
  if (driver === 's3') {
    const missing = S3_VARIABLES.filter((name) => !env[name]);
    if (missing.length > 0) throw new Error(`storage: KW_STORAGE_DRIVER=s3 needs ${missing.join(', ')}`);
    return s3StorageCreate({
      endpoint: env.KW_S3_ENDPOINT || undefined,
      bucket: env.KW_S3_BUCKET!,
      region: env.KW_S3_REGION!,
      accessKeyId: env.KW_S3_ACCESS_KEY_ID!,
      secretAccessKey: env.KW_S3_SECRET_ACCESS_KEY!,
    });
  }
  throw new Error(`storage: KW_STORAGE_DRIVER must be "disk" or "s3", not "${driver}"`);
}

let instance: ObjectStorage | undefined;

/** The process's storage (from the environment on first use). */
export function appStorage(): ObjectStorage {
  instance ??= storageFromEnv(serverEnv());
  return instance;
}
