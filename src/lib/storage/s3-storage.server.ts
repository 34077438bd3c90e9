/**
 * The S3-compatible storage driver (@aws-sdk/client-s3). Path-style addressing, so it works with any
 * S3-compatible server at an endpoint URL; checksums only where the operation requires them, since some
 * compatible servers store a streamed body with the SDK's checksum framing left in (stack notes). The bucket
 * stays private: objects are read back through the app.
 */
import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { storageKeyCheck, type ObjectPutOptions, type ObjectStorage, type StoredObject } from './object-storage';

/** Where the bucket is and how to sign requests to it. */
export interface S3StorageConfig {
  /** Base URL of the S3-compatible server, e.g. "https://s3.eu-west-1.example.com"; unset for AWS itself. */
  endpoint?: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
}

/** An S3 driver for one bucket (which must exist). */
export function s3StorageCreate(config: S3StorageConfig): ObjectStorage {
  const client = new S3Client({
    ...(config.endpoint ? { endpoint: config.endpoint } : {}),
    region: config.region,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    forcePathStyle: true,
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = config.bucket;

  return {
    driver: 's3',

    async put(key: string, body: Buffer | Readable, options: ObjectPutOptions): Promise<void> {
      // PutObject needs the length up front; a stream of unknown length is read into memory first.
      const sized = Buffer.isBuffer(body) || options.sizeBytes !== undefined ? body : await bufferOf(body);
      await client.send(
        new PutObjectCommand({
          Bucket,
          Key: storageKeyCheck(key),
          Body: sized,
          ContentType: options.contentType,
          ...(Buffer.isBuffer(sized) ? { ContentLength: sized.byteLength } : { ContentLength: options.sizeBytes }),
        }),
      );
    },

    async getStream(key: string): Promise<StoredObject | null> {
      try {
        const out = await client.send(new GetObjectCommand({ Bucket, Key: storageKeyCheck(key) }));
        return {
          stream: out.Body as Readable,
          contentType: out.ContentType ?? 'application/octet-stream',
          sizeBytes: out.ContentLength ?? 0,
        };
      } catch (err) {
        if (err instanceof NoSuchKey || (err instanceof S3ServiceException && err.$metadata.httpStatusCode === 404)) {
          return null;
        }
        throw err;
      }
    },

    async delete(key: string): Promise<void> {
      await client.send(new DeleteObjectCommand({ Bucket, Key: storageKeyCheck(key) }));
    },
  };
}

async function bufferOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}
