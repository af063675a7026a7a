declare module 's3rver' {
  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory: string;
    configureBuckets?: { name: string; configs?: unknown[] }[];
  }
  /** The Koa context fields the stand-in's gate reads. */
  export interface S3rverContext {
    method: string;
    /** The raw request target (path and query as sent). */
    url: string;
    path: string;
    headers: Record<string, string | string[] | undefined>;
    query: Record<string, string | string[] | undefined>;
    get(header: string): string;
    status: number;
    body: unknown;
    type: string;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    /** Koa's middleware list, run in order when the server starts. */
    middleware: ((ctx: S3rverContext, next: () => Promise<void>) => Promise<void> | void)[];
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}

declare module 's3rver/lib/models/account.js' {
  class AWSAccount {
    static registry: Map<string, AWSAccount>;
    constructor(id: number, displayName: string);
    createKeyPair(accessKeyId: string, secretAccessKey: string): void;
    revokeAccessKey(accessKeyId: string): void;
  }
  export default AWSAccount;
}
