import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { getSignedUrl as presign } from '@aws-sdk/s3-request-presigner';
import type { Readable } from 'node:stream';

export interface StorageConfig {
  endpoint: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
}

/** The one module that talks to object storage. The database keeps keys, never bytes or URLs. */
export interface Storage {
  putObject(key: string, body: Buffer | Readable, contentType: string, contentLength?: number): Promise<void>;
  getSignedUrl(key: string, expiresInSeconds?: number): Promise<string>;
  deleteObject(key: string): Promise<void>;
  probe(): Promise<boolean>;
}

export function createStorage(config: StorageConfig): Storage {
  const client = new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    forcePathStyle: true,
    // Default checksums make some S3-compatible servers store streamed bodies aws-chunked encoded.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = config.bucket;
  return {
    async putObject(key, body, contentType, contentLength) {
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: contentLength }));
    },
    getSignedUrl: (key, expiresIn = 300) => presign(client, new GetObjectCommand({ Bucket, Key: key }), { expiresIn }),
    async deleteObject(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async probe() {
      try {
        await client.send(new HeadBucketCommand({ Bucket }), { abortSignal: AbortSignal.timeout(3000) });
        return true;
      } catch {
        return false;
      }
    },
  };
}
