import type { Readable } from 'node:stream';
import { UPLOAD_LIMITS } from '@shared/schemas/submittals';
import type { Request, Response } from 'express';
import multer from 'multer';
import { HttpError } from './errors';

export interface UploadedFile {
  originalName: string;
  bytes: Buffer;
}

/**
 * Reads a multipart/form-data upload (field `files`) into memory — nothing touches the disk — with limits
 * on the size of each file, the number of files and the other parts. Called by a route handler, i.e. after
 * the caller's permission has been checked, so that nobody unauthorised gets a body buffered.
 */
const parser = multer({
  storage: multer.memoryStorage(),
  limits: {
    fileSize: UPLOAD_LIMITS.maxFileBytes,
    files: UPLOAD_LIMITS.maxFiles,
    fields: 5,
    fieldSize: 10_000,
    parts: UPLOAD_LIMITS.maxFiles + 5,
    headerPairs: 50,
  },
  // Names arrive as UTF-8 from browsers; they are only ever displayed (see server/storage/files.ts).
  defParamCharset: 'utf8',
}).array('files', UPLOAD_LIMITS.maxFiles);

const mb = UPLOAD_LIMITS.maxFileBytes / (1024 * 1024);

export function readUpload(req: Request, res: Response): Promise<UploadedFile[]> {
  if (!req.is('multipart/form-data'))
    return Promise.reject(
      new HttpError(415, 'multipart_required', 'send the files as multipart/form-data in the field “files”'),
    );
  return new Promise((resolve, reject) => {
    parser(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        const refusals: Record<string, [number, string]> = {
          LIMIT_FILE_SIZE: [413, `a file is larger than ${mb} MB; nothing was stored`],
          LIMIT_FILE_COUNT: [413, `at most ${UPLOAD_LIMITS.maxFiles} files at once; nothing was stored`],
          LIMIT_PART_COUNT: [413, 'too many parts in the upload; nothing was stored'],
          LIMIT_FIELD_COUNT: [400, 'too many form fields; nothing was stored'],
          LIMIT_FIELD_KEY: [400, 'a form field name is too long; nothing was stored'],
          LIMIT_FIELD_VALUE: [400, 'a form field is too long; nothing was stored'],
          LIMIT_UNEXPECTED_FILE: [400, 'files go in the field “files”; nothing was stored'],
        };
        const [status, message] = refusals[err.code] ?? [
          400,
          'the upload could not be read; nothing was stored',
        ];
        reject(new HttpError(status, err.code.toLowerCase(), message));
        return;
      }
      if (err) {
        reject(
          new HttpError(
            400,
            'bad_upload',
            'the upload could not be read (a malformed part, e.g. a control character in a file name); nothing was stored',
          ),
        );
        return;
      }
      const files = (req.files as Express.Multer.File[] | undefined) ?? [];
      if (files.length === 0) {
        reject(new HttpError(400, 'no_files', 'choose at least one file (field “files”)'));
        return;
      }
      resolve(files.map((f) => ({ originalName: f.originalname, bytes: f.buffer })));
    });
  });
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
