import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { s3StorageCreate } from '../../../src/lib/storage/s3-storage.server';
import { storageFromEnv } from '../../../src/lib/storage/storage.server';
import { s3FakeStart, type S3Fake } from '../../fixtures/s3-fake';
import { storageContract } from './storage-contract';

let fake: S3Fake;
beforeAll(async () => {
  fake = await s3FakeStart();
});
afterAll(() => fake.stop());

storageContract('s3', () => s3StorageCreate(fake.config));

describe('storageFromEnv', () => {
  it('builds the S3 driver from KW_S3_* variables, and it reaches the bucket', async () => {
    const storage = storageFromEnv({
      KW_STORAGE_DRIVER: 's3',
      KW_S3_ENDPOINT: fake.config.endpoint,
      KW_S3_BUCKET: fake.config.bucket,
      KW_S3_REGION: fake.config.region,
      KW_S3_ACCESS_KEY_ID: fake.config.accessKeyId,
      KW_S3_SECRET_ACCESS_KEY: fake.config.secretAccessKey,
    });
    expect(storage.driver).toBe('s3');
    await storage.put('env/check.txt', Buffer.from('ok'), { contentType: 'text/plain' });
    expect((await storage.getStream('env/check.txt'))?.sizeBytes).toBe(2);
  });

  it('names the missing S3 variables and refuses an unknown driver', () => {
    expect(() => storageFromEnv({ KW_STORAGE_DRIVER: 's3', KW_S3_BUCKET: 'b' })).toThrow(
      'KW_S3_REGION, KW_S3_ACCESS_KEY_ID, KW_S3_SECRET_ACCESS_KEY',
    );
    expect(() => storageFromEnv({ KW_STORAGE_DRIVER: 'ftp' })).toThrow('"disk" or "s3"');
    expect(storageFromEnv({}).driver).toBe('disk');
  });
});
