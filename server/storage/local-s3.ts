import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import type { S3Target } from './object-store';

export const LOCAL_BUCKET = 'skinwright-local';
/** s3rver's built-in development key pair. */
const LOCAL_KEY = 'S3RVER';

/**
 * Local fake S3 server for demo, development and tests (like the mail capture): s3rver on loopback, a
 * random port, files in `dir` (or a temporary folder that is removed on close). Never used when S3_BUCKET
 * names a real service.
 */
export async function startLocalS3(dir?: string): Promise<{
  target: S3Target;
  directory: string;
  close(): Promise<void>;
}> {
  const temporary = !dir;
  const directory = dir ? path.resolve(dir) : mkdtempSync(path.join(tmpdir(), 'skinwright-s3-'));
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    directory,
    silent: true,
    configureBuckets: [{ name: LOCAL_BUCKET }],
  });
  // s3rver 3 lacks AbortMultipartUpload (DELETE …?uploadId=): answer it as S3 does, removing the parts, so
  // an upload refused half-way leaves nothing behind here either.
  server.middleware.unshift(async (ctx, next) => {
    const uploadId = ctx.method === 'DELETE' ? ctx.query.uploadId : undefined;
    if (typeof uploadId !== 'string') return next();
    if (/^[0-9a-f]{32}$/.test(uploadId))
      rmSync(path.join(server.store.getResourcePath(LOCAL_BUCKET, undefined, 'uploads'), uploadId), {
        recursive: true,
        force: true,
      });
    ctx.status = 204;
  });
  const { port } = await server.run();
  return {
    directory,
    target: {
      bucket: LOCAL_BUCKET,
      endpoint: `http://127.0.0.1:${port}`,
      region: 'us-east-1',
      accessKeyId: LOCAL_KEY,
      secretAccessKey: LOCAL_KEY,
      forcePathStyle: true,
    },
    async close() {
      await server.close();
      if (temporary) rmSync(directory, { recursive: true, force: true });
    },
  };
}
