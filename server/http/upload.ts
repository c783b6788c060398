import { PassThrough, type Readable } from 'node:stream';
import { UPLOAD_LIMITS } from '@shared/schemas/submittals';
import type { Request, Response } from 'express';
import multer from 'multer';
import { DomainError } from '../services/errors';
import type { FileHandler, ReceiveFiles } from '../storage/files';
import { HttpError } from './errors';

/** Uploads received at the same time by this process; more are refused (503) until one ends. */
export const CONCURRENT_UPLOADS = 4;
let receiving = 0;
/** How many uploads this process is receiving now (tests). */
export const uploadsInProgress = () => receiving;

/** Limits of every upload beside the file size and count, which each route may set. */
const limits = { fields: 5, fieldSize: 10_000, headerPairs: 50 };
const refusals: Record<string, [number, string]> = {
  LIMIT_PART_COUNT: [413, 'too many parts in the upload; nothing was stored'],
  LIMIT_FIELD_COUNT: [400, 'too many form fields; nothing was stored'],
  LIMIT_FIELD_KEY: [400, 'a form field name is too long; nothing was stored'],
  LIMIT_FIELD_VALUE: [400, 'a form field is too long; nothing was stored'],
  LIMIT_UNEXPECTED_FILE: [400, 'files go in the field “files”; nothing was stored'],
};

/** Multer's refusal in our words, with the limits of this upload. */
function refusal(code: string, max: { fileBytes: number; files: number }): [number, string] | undefined {
  if (code === 'LIMIT_FILE_SIZE')
    return [413, `a file is larger than ${max.fileBytes / (1024 * 1024)} MB; nothing was stored`];
  if (code === 'LIMIT_FILE_COUNT') return [413, `at most ${max.files} files at once; nothing was stored`];
  return refusals[code];
}

/**
 * A multer storage engine that streams each file to `handler.store` (multer keeps the limits, the order and
 * the removal of what was stored when the upload fails). The handler reads a stream of its own: a file over
 * the size limit fails it at once, and whatever the handler leaves unread is drained.
 */
function streamingEngine<T>(
  handler: FileHandler<T>,
  failures: Set<unknown>,
  fileBytes: number,
): multer.StorageEngine {
  return {
    _handleFile(_req, file, done) {
      const stream = new PassThrough();
      file.stream.on('limit', () =>
        stream.destroy(
          new HttpError(413, 'limit_file_size', refusal('LIMIT_FILE_SIZE', { fileBytes, files: 0 })![1]),
        ),
      );
      file.stream.on('error', (err) => stream.destroy(err));
      stream.on('close', () => {
        file.stream.unpipe(stream);
        file.stream.resume();
      });
      file.stream.pipe(stream);
      handler.store({ originalName: file.originalname, stream }).then(
        (stored) => done(null, { stored } as Partial<Express.Multer.File>),
        (err: Error) => {
          failures.add(err);
          done(err);
        },
      );
    },
    _removeFile(_req, file, done) {
      handler.remove((file as unknown as { stored: T }).stored).then(() => done(null), done);
    },
  };
}

/**
 * The files of a multipart/form-data upload (field `files`), streamed to object storage by the service's
 * handler — nothing is held whole in memory or written to disk — with limits on the size of each file, the
 * number of files and the other parts, and on the uploads received at once. Called by a route handler, i.e.
 * after the caller's permission has been checked.
 */
export function receiveUpload(
  req: Request,
  res: Response,
  max: { fileBytes: number; files: number } = {
    fileBytes: UPLOAD_LIMITS.maxFileBytes,
    files: UPLOAD_LIMITS.maxFiles,
  },
): ReceiveFiles {
  return <T>(handler: FileHandler<T>) => {
    if (!req.is('multipart/form-data'))
      return Promise.reject(
        new HttpError(
          415,
          'multipart_required',
          'send the files as multipart/form-data in the field “files”',
        ),
      );
    if (receiving >= CONCURRENT_UPLOADS) {
      res.set('Retry-After', '10');
      return Promise.reject(
        new HttpError(
          503,
          'uploads_busy',
          `the server is receiving ${CONCURRENT_UPLOADS} uploads already; try again in a few seconds. Nothing was stored`,
        ),
      );
    }
    receiving++;
    const failures = new Set<unknown>();
    const parser = multer({
      storage: streamingEngine(handler, failures, max.fileBytes),
      limits: { ...limits, fileSize: max.fileBytes, files: max.files, parts: max.files + 5 },
      // Names arrive as UTF-8 from browsers; they are only ever displayed (see server/storage/files.ts).
      defParamCharset: 'utf8',
    }).array('files', max.files);
    return new Promise<T[]>((resolve, reject) => {
      parser(req, res, (err: unknown) => {
        receiving--;
        // The handler's own refusals (type, room, storage) as they are; multer's limits in our words.
        if (failures.has(err) || err instanceof HttpError || err instanceof DomainError) return reject(err);
        if (err instanceof multer.MulterError) {
          const [status, message] = refusal(err.code, max) ?? [
            400,
            'the upload could not be read; nothing was stored',
          ];
          return reject(new HttpError(status, err.code.toLowerCase(), message));
        }
        if (err)
          return reject(
            new HttpError(
              400,
              'bad_upload',
              'the upload could not be read (a malformed part, e.g. a control character in a file name); nothing was stored',
            ),
          );
        const files = (req.files as (Express.Multer.File & { stored: T })[] | undefined) ?? [];
        if (files.length === 0)
          return reject(new HttpError(400, 'no_files', 'choose at least one file (field “files”)'));
        resolve(files.map((f) => f.stored));
      });
    });
  };
}

export interface StoredFile {
  body: Readable;
  name: string;
  contentType: string;
  size: number | undefined;
}

/**
 * Streams a stored file back byte for byte as a download: its detected type, its sanitised name, never
 * cached and never rendered as a page of ours, whatever it contains.
 */
export async function sendStoredFile(res: Response, f: StoredFile): Promise<undefined> {
  res.attachment(f.name);
  res.status(200).set({
    'Content-Type': f.contentType,
    'Cache-Control': 'private, no-store',
    'Content-Security-Policy': "default-src 'none'; sandbox",
    ...(f.size !== undefined ? { 'Content-Length': String(f.size) } : {}),
  });
  await new Promise<void>((resolve, reject) => {
    f.body.on('error', (err) => {
      res.destroy(err);
      reject(err);
    });
    res.on('close', resolve);
    f.body.pipe(res);
  });
  return undefined;
}
