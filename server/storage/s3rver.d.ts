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

  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
