/** s3rver ships no types; the little of it that server/storage/local-s3.ts uses. */
declare module 's3rver' {
  import type { AddressInfo } from 'node:net';

  interface S3rverOptions {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    resetOnClose?: boolean;
    configureBuckets?: { name: string; configs?: (string | Buffer)[] }[];
  }

  /** The little of Koa's context that the abort handler in local-s3.ts reads and sets. */
  interface Context {
    method: string;
    query: Record<string, string | string[] | undefined>;
    status: number;
  }

  export default class S3rver {
    constructor(options: S3rverOptions);
    /** Koa's middleware list (composed when the server starts listening). */
    middleware: ((ctx: Context, next: () => Promise<void>) => Promise<void>)[];
    store: { getResourcePath(bucket: string, key: string | undefined, resource: string): string };
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
