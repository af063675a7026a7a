import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';
import AWSAccount from 's3rver/lib/models/account.js';
import { isPresigned, verifySignature } from './s3-signature';

export interface S3StandIn {
  endpoint: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  close(): Promise<void>;
}

/**
 * A local S3-compatible server (s3rver) keeping its objects in a project folder. It does not use s3rver's
 * well-known credentials (S3RVER/S3RVER, which anyone on the machine could use to list every original
 * with its GPS): each start makes a key pair of its own, known only to this process, and a gate in front
 * verifies every signature (s3rver itself does not) and refuses anonymous requests, other keys, and
 * presigned URLs for anything but reading one object.
 */
export async function startS3StandIn(directory: string, port: number, bucket = 'gridleak'): Promise<S3StandIn> {
  mkdirSync(directory, { recursive: true });
  AWSAccount.registry.get('S3RVER')?.revokeAccessKey('S3RVER');
  const accessKeyId = `GL${randomBytes(9).toString('hex').toUpperCase()}`;
  const secretAccessKey = randomBytes(30).toString('base64url');
  const account = new AWSAccount(Number.parseInt(randomBytes(5).toString('hex'), 16), 'Gridleak');
  account.createKeyPair(accessKeyId, secretAccessKey);

  const server = new S3rver({
    address: '127.0.0.1',
    port,
    silent: true,
    directory,
    configureBuckets: [{ name: bucket }],
  });
  server.middleware.unshift(async (ctx, next) => {
    const request = { method: ctx.method, url: ctx.url, headers: ctx.headers };
    const readsOneObject =
      (ctx.method === 'GET' || ctx.method === 'HEAD') && ctx.path.split('/').filter(Boolean).length >= 2;
    // s3rver checks only the key id of a version-4 signature, and presigned URLs show the key id to browsers.
    const allowed =
      ctx.method === 'OPTIONS' ||
      (verifySignature(request, accessKeyId, secretAccessKey) && (!isPresigned(request) || readsOneObject));
    if (!allowed) {
      ctx.status = 403;
      ctx.type = 'application/xml';
      ctx.body =
        '<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>AccessDenied</Code><Message>Access Denied</Message></Error>';
      return;
    }
    await next();
  });
  const { port: boundPort } = await server.run();
  return {
    endpoint: `http://127.0.0.1:${boundPort}`,
    bucket,
    accessKeyId,
    secretAccessKey,
    close: async () => {
      await server.close();
      account.revokeAccessKey(accessKeyId);
    },
  };
}
