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

/** Aborts a storage call, e.g. when the client that asked for it has gone (on top of the timeouts). */
export interface CallOptions {
  signal?: AbortSignal;
}

/**
 * The one module that talks to object storage. The database keeps keys, never bytes or URLs. Every call
 * has a time limit (a hung storage service must not hold requests and memory for ever) and takes a signal.
 */
export interface Storage {
  putObject(
    key: string,
    body: Buffer | Readable,
    contentType: string,
    contentLength?: number,
    options?: CallOptions,
  ): Promise<void>;
  /** A short-lived GET URL; `downloadName` makes the browser save it under that name. */
  getSignedUrl(key: string, options?: { expiresInSeconds?: number; downloadName?: string }): Promise<string>;
  getObject(key: string, options?: CallOptions): Promise<Buffer>;
  exists(key: string, options?: CallOptions): Promise<boolean>;
  deleteObject(key: string, options?: CallOptions): Promise<void>;
  listObjects(prefix: string): AsyncGenerator<{ key: string; lastModified: Date }>;
  probe(): Promise<boolean>;
}

const SLOT_MS = 120_000;

/** Whole-call limits: small requests, and transfers of whole photos (an original may be tens of MB). */
export const STORAGE_TIMEOUT_MS = { request: 15_000, transfer: 120_000 };

/** The call's own time limit, joined with the caller's signal when there is one. */
export function callSignal(ms: number, signal?: AbortSignal): AbortSignal {
  return signal ? AbortSignal.any([AbortSignal.timeout(ms), signal]) : AbortSignal.timeout(ms);
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
    // A connection that cannot be made, or a socket that goes quiet, fails instead of waiting for ever.
    requestHandler: { connectionTimeout: 5_000, requestTimeout: 60_000 },
  });
  const small = (options?: CallOptions) => ({ abortSignal: callSignal(STORAGE_TIMEOUT_MS.request, options?.signal) });
  const transfer = (options?: CallOptions) => ({
    abortSignal: callSignal(STORAGE_TIMEOUT_MS.transfer, options?.signal),
  });
  const Bucket = config.bucket;
  return {
    async putObject(key, body, contentType, contentLength, options) {
      await client.send(
        new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: contentLength }),
        transfer(options),
      );
    },
    // Signed from the start of the current two-minute slot, so repeated lists hand out the same URL
    // and browsers reuse the images they already have; each URL still expires within minutes.
    getSignedUrl: (key, { expiresInSeconds = 420, downloadName } = {}) =>
      presign(
        client,
        new GetObjectCommand({
          Bucket,
          Key: key,
          ResponseContentDisposition: downloadName
            ? `attachment; filename="${downloadName.replace(/[^\w.-]/g, '_')}"`
            : undefined,
        }),
        { expiresIn: expiresInSeconds, signingDate: new Date(Math.floor(Date.now() / SLOT_MS) * SLOT_MS) },
      ),
    async getObject(key, options) {
      const call = transfer(options);
      const res = await client.send(new GetObjectCommand({ Bucket, Key: key }), call);
      return Buffer.from(await res.Body!.transformToByteArray());
    },
    async exists(key, options) {
      try {
        await client.send(new HeadObjectCommand({ Bucket, Key: key }), small(options));
        return true;
      } catch (err) {
        if ((err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
        throw err;
      }
    },
    async deleteObject(key, options) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }), small(options));
    },
    async *listObjects(prefix) {
      let ContinuationToken: string | undefined;
      do {
        const page = await client.send(
          new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken }),
          small(),
        );
        for (const o of page.Contents ?? [])
          if (o.Key) yield { key: o.Key, lastModified: o.LastModified ?? new Date(0) };
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
