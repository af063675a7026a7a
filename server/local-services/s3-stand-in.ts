import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

export interface S3StandIn {
  endpoint: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  close(): Promise<void>;
}

/** A local S3-compatible server (s3rver) keeping its objects in a project folder. */
export async function startS3StandIn(directory: string, port: number, bucket = 'gridleak'): Promise<S3StandIn> {
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({ address: '127.0.0.1', port, silent: true, directory, configureBuckets: [{ name: bucket }] });
  const { port: boundPort } = await server.run();
  return {
    endpoint: `http://127.0.0.1:${boundPort}`,
    bucket,
    // s3rver's fixed credentials.
    accessKeyId: 'S3RVER',
    secretAccessKey: 'S3RVER',
    close: () => server.close(),
  };
}
