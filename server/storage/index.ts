import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
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
  /** A short-lived GET URL; `downloadName` makes the browser save it under that name. */
  getSignedUrl(key: string, options?: { expiresInSeconds?: number; downloadName?: string }): Promise<string>;
  getObject(key: string): Promise<Buffer>;
  exists(key: string): Promise<boolean>;
  deleteObject(key: string): Promise<void>;
  listObjects(prefix: string): AsyncGenerator<{ key: string; lastModified: Date }>;
  probe(): Promise<boolean>;
}

const SLOT_MS = 120_000;

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
    // Signed from the start of the current two-minute slot, so repeated lists hand out the same URL
    // and browsers reuse the images they already have; each URL still expires within minutes.
    getSignedUrl: (key, { expiresInSeconds = 420, downloadName } = {}) =>
      presign(
        client,
        new GetObjectCommand({
          Bucket,
          Key: key,
          ResponseContentDisposition: downloadName ? `attachment; filename="${downloadName.replace(/[^\w.-]/g, '_')}"` : undefined,
        }),
        { expiresIn: expiresInSeconds, signingDate: new Date(Math.floor(Date.now() / SLOT_MS) * SLOT_MS) },
      ),
    async getObject(key) {
      const res = await client.send(new GetObjectCommand({ Bucket, Key: key }));
      return Buffer.from(await res.Body!.transformToByteArray());
    },
    async exists(key) {
      try {
        await client.send(new HeadObjectCommand({ Bucket, Key: key }));
        return true;
      } catch (err) {
        if ((err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
        throw err;
      }
    },
    async deleteObject(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async *listObjects(prefix) {
      let ContinuationToken: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken }));
        for (const o of page.Contents ?? []) if (o.Key) yield { key: o.Key, lastModified: o.LastModified ?? new Date(0) };
        ContinuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (ContinuationToken);
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
