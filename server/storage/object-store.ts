import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  NoSuchKey,
  S3Client,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import type { StorageConfig } from '../config';
import { DomainError } from '../services/errors';

/**
 * Stored files, through the S3 API: a real service (AWS S3 or any S3-compatible one) in production, the
 * local fake (s3rver, see local-s3.ts) in development, demo and tests. Keys are ours (uuids); names and
 * content types are kept in the database, never taken from the key.
 */
export interface ObjectStore {
  /** Stores a stream of unknown length as it arrives (never the whole object in memory). */
  put(key: string, body: Readable, contentType: string): Promise<void>;
  /** The object as a stream; 404 when it is missing. */
  get(key: string): Promise<{ body: Readable; size: number | undefined }>;
  delete(key: string): Promise<void>;
  /** Keys under a prefix (tests and housekeeping). */
  list(prefix?: string): Promise<string[]>;
}

/** S3's smallest part of a multipart upload (5 MiB): the most an upload holds at a time. */
const PART_BYTES = 5 * 1024 * 1024;

export interface S3Target {
  bucket: string;
  endpoint?: string;
  region: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
}

export function createS3Store(target: S3Target): ObjectStore {
  const client = new S3Client({
    region: target.region,
    endpoint: target.endpoint,
    forcePathStyle: target.forcePathStyle,
    credentials:
      target.accessKeyId && target.secretAccessKey
        ? { accessKeyId: target.accessKeyId, secretAccessKey: target.secretAccessKey }
        : undefined,
    // Plain PUT bodies with Content-MD5-free requests: what every S3-compatible service (and s3rver) accepts.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = target.bucket;
  return {
    // One part of S3's minimum size is held at a time, one in flight: ≈ 10 MiB per upload whatever its
    // size; a body shorter than a part goes up as one plain PUT. A failed upload aborts its parts.
    async put(key, body, contentType) {
      await new Upload({
        client,
        params: { Bucket, Key: key, Body: body, ContentType: contentType },
        partSize: PART_BYTES,
        queueSize: 1,
      }).done();
    },
    async get(key) {
      try {
        const out = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        return { body: out.Body as Readable, size: out.ContentLength };
      } catch (err) {
        if (err instanceof NoSuchKey || (err as { name?: string }).name === 'NoSuchKey')
          throw new DomainError('not_found', 'not_found', 'the stored file is missing');
        throw err;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async list(prefix) {
      const keys: string[] = [];
      let token: string | undefined;
      do {
        const out = await client.send(
          new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken: token }),
        );
        for (const o of out.Contents ?? []) if (o.Key) keys.push(o.Key);
        token = out.IsTruncated ? out.NextContinuationToken : undefined;
      } while (token);
      return keys;
    },
  };
}

/** Used when an app is built without storage (e.g. a bare API benchmark): uploads answer 503. */
export const unavailableStore = (): ObjectStore => {
  const refuse = async (): Promise<never> => {
    throw new DomainError(
      'unavailable',
      'storage_unavailable',
      'file storage is not configured on this server',
    );
  };
  return { put: refuse, get: refuse, delete: refuse, list: refuse };
};

export const storageTarget = (config: StorageConfig): S3Target | null =>
  config.bucket
    ? {
        bucket: config.bucket,
        endpoint: config.endpoint,
        region: config.region,
        accessKeyId: config.accessKeyId,
        secretAccessKey: config.secretAccessKey,
        forcePathStyle: config.forcePathStyle,
      }
    : null;
