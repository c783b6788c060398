import { createHash, randomUUID } from 'node:crypto';
import { pipeline, type Readable, Transform } from 'node:stream';
import { finished } from 'node:stream/promises';
import { fileTypeFromBuffer } from 'file-type';
import { DomainError } from '../services/errors';
import type { ObjectStore } from './object-store';

/*
 * What an upload may be, judged by its bytes (magic numbers, via file-type), never by its name or the
 * browser's Content-Type; and how its name is shown. Stored objects get keys of our own (uuids) — the name
 * is only ever displayed and offered as the download name.
 */

/** Allowed types, by the type detected from the content. DXF is text without a signature: not accepted. */
export const ALLOWED_TYPES: Record<string, { ext: string; label: string }> = {
  'application/pdf': { ext: 'pdf', label: 'PDF' },
  'image/png': { ext: 'png', label: 'PNG image' },
  'image/jpeg': { ext: 'jpg', label: 'JPEG image' },
  'image/vnd.dwg': { ext: 'dwg', label: 'DWG drawing' },
};

const MAX_NAME = 180;

/** C0 and C1 controls, DEL, and the bidirectional controls that can disguise an extension. */
const hidden = (cp: number) =>
  cp <= 0x1f ||
  (cp >= 0x7f && cp <= 0x9f) ||
  cp === 0x200e ||
  cp === 0x200f ||
  (cp >= 0x202a && cp <= 0x202e) ||
  (cp >= 0x2066 && cp <= 0x2069);

/**
 * A client-supplied file name made safe to show and to offer as a download name: the last path part only
 * (either slash), no control or bidirectional-override characters, no leading dots, whitespace collapsed,
 * at most 180 characters; "file" when nothing is left.
 */
export function displayName(raw: string): string {
  const last = raw.split(/[/\\]/).pop() ?? '';
  const cleaned = [...last]
    .filter((ch) => !hidden(ch.codePointAt(0)!))
    .join('')
    .replace(/\s+/g, ' ')
    .replace(/^[.\s]+/, '')
    .trim();
  if (!cleaned) return 'file';
  if (cleaned.length <= MAX_NAME) return cleaned;
  const dot = cleaned.lastIndexOf('.');
  const ext = dot > 0 && cleaned.length - dot <= 10 ? cleaned.slice(dot) : '';
  return cleaned.slice(0, MAX_NAME - ext.length) + ext;
}

/** The name with the extension of the detected type (a PNG called "report.pdf" downloads as "report.pdf.png"). */
export function withTypeExtension(name: string, contentType: string): string {
  const ext = ALLOWED_TYPES[contentType]?.ext;
  if (!ext) return name;
  const lower = name.toLowerCase();
  const same = lower.endsWith(`.${ext}`) || (ext === 'jpg' && lower.endsWith('.jpeg'));
  return same ? name : `${name}.${ext}`;
}

/** "PDF, PNG, JPEG or DWG": the accepted types in words (the label's first word). */
function typeWords(types: readonly string[]): string {
  const words = types.map((t) => (ALLOWED_TYPES[t]?.label ?? t).split(' ')[0]!);
  return words.length < 2 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} or ${words.at(-1)}`;
}

/** Photos: images only, by their bytes. */
export const IMAGE_TYPES: readonly string[] = ['image/png', 'image/jpeg'];

/** Detects the type of an upload from its bytes; refuses what is empty or not on the allow-list (`allowed`: a narrower one). */
export async function detectAllowedType(
  bytes: Buffer,
  name: string,
  allowed: readonly string[] = Object.keys(ALLOWED_TYPES),
): Promise<string> {
  if (bytes.length === 0)
    throw new DomainError('malformed', 'empty_file', `“${name}” is empty (0 bytes): nothing was stored`, {
      files: `${name}: empty file`,
    });
  const detected = await fileTypeFromBuffer(bytes);
  if (!detected || !allowed.includes(detected.mime))
    throw new DomainError(
      'unsupported',
      'unsupported_type',
      `“${name}” is ${detected ? `a ${detected.ext.toUpperCase()} file` : 'not a recognised file'} by its content; accepted: ${typeWords(allowed)}. Nothing was stored.`,
      { files: `${name}: type not accepted` },
    );
  return detected.mime;
}

/** One file of an upload as it arrives: its name as sent, and its bytes as a stream. */
export interface IncomingFile {
  originalName: string;
  stream: Readable;
}

/** What a service does with each arriving file (`store`), and how it takes one back (`remove`). */
export interface FileHandler<T> {
  store(file: IncomingFile): Promise<T>;
  remove(stored: T): Promise<void>;
}

/**
 * Receives the files of a multipart upload, handing each to `handler.store` as it arrives (all or nothing:
 * when anything fails, what was stored is removed and the upload is refused). Built by the HTTP layer
 * (server/http/upload.ts) after the permission check, called by the service once it knows where the files go.
 */
export type ReceiveFiles = <T>(handler: FileHandler<T>) => Promise<T[]>;

/** Bytes enough for file-type to judge any of the accepted types (its own sample size). */
const SNIFF_BYTES = 4100;

/** An upload as stored: our key, the name to show, the detected type, its size and SHA-256. */
export interface StoredUpload {
  key: string;
  name: string;
  contentType: string;
  size: number;
  sha256: string;
}

/**
 * Puts the files of one upload into object storage as they arrive, never holding a whole file: the first
 * bytes are held back until their type is judged (`detectAllowedType`; nothing is stored when it is refused),
 * then everything streams on to the store, counted and hashed on the way. The files of the upload together
 * may take at most `room` bytes: more fails the file with `full()` (its stored part is aborted).
 */
export function fileIntake(
  storage: ObjectStore,
  opts: { keyPrefix: string; room: number; full: () => DomainError; allowed?: readonly string[] },
) {
  let taken = 0;
  return {
    async store({ originalName, stream }: IncomingFile): Promise<StoredUpload> {
      const name = displayName(originalName);
      const hash = createHash('sha256');
      let size = 0;
      let held: Buffer[] = [];
      let checked = false;
      let judged: (type: string) => void = () => {};
      let refused: (err: unknown) => void = () => {};
      const type = new Promise<string>((resolve, reject) => {
        judged = resolve;
        refused = reject;
      });
      /** Judges the held first bytes; only an accepted type lets them (and the rest) through. */
      async function judge(self: Transform) {
        const head = Buffer.concat(held);
        held = [];
        judged(await detectAllowedType(head, name, opts.allowed));
        checked = true;
        self.push(head);
      }
      const body = new Transform({
        async transform(chunk: Buffer, _encoding, done) {
          try {
            size += chunk.length;
            taken += chunk.length;
            hash.update(chunk);
            if (taken > opts.room) throw opts.full();
            if (checked) return done(null, chunk);
            held.push(chunk);
            if (size >= SNIFF_BYTES) await judge(this);
            done();
          } catch (err) {
            done(err as Error);
          }
        },
        async flush(done) {
          try {
            if (!checked) await judge(this);
            done();
          } catch (err) {
            done(err as Error);
          }
        },
      });
      body.once('error', refused);
      // An error either way ends both: a refused file stops reading its part (the upload drains the rest).
      pipeline(stream, body, () => {});
      const contentType = await type;
      const key = `${opts.keyPrefix}${randomUUID()}`;
      try {
        await storage.put(key, body, contentType);
      } catch (err) {
        body.destroy();
        throw err;
      }
      return {
        key,
        name: withTypeExtension(name, contentType),
        contentType,
        size,
        sha256: hash.digest('hex'),
      };
    },
    remove: (stored: StoredUpload) => storage.delete(stored.key),
  };
}

/** Reads a file of an upload to its end without keeping it (a part that is not wanted). */
export async function skipFile({ stream }: IncomingFile): Promise<null> {
  await finished(stream.resume());
  return null;
}

/**
 * A stored object to stream back as a download, under what was recorded of it: its name, its type (unknown:
 * `application/octet-stream`) and its size (unknown: the size the store reports).
 */
export async function storedDownload(
  storage: ObjectStore,
  key: string,
  recorded: { name: string; contentType: string | null; size: number | null },
) {
  const object = await storage.get(key);
  return {
    body: object.body,
    name: recorded.name,
    contentType: recorded.contentType ?? 'application/octet-stream',
    size: recorded.size ?? object.size,
  };
}
