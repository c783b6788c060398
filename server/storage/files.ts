import { fileTypeFromBuffer } from 'file-type';
import { HttpError } from '../http/errors';

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

/** Detects the type of an upload from its bytes; refuses what is empty or not on the allow-list. */
export async function detectAllowedType(bytes: Buffer, name: string): Promise<string> {
  if (bytes.length === 0)
    throw new HttpError(400, 'empty_file', `“${name}” is empty (0 bytes): nothing was stored`, {
      files: `${name}: empty file`,
    });
  const detected = await fileTypeFromBuffer(bytes);
  if (!detected || !ALLOWED_TYPES[detected.mime])
    throw new HttpError(
      415,
      'unsupported_type',
      `“${name}” is ${detected ? `a ${detected.ext.toUpperCase()} file` : 'not a recognised file'} by its content; accepted: PDF, PNG, JPEG or DWG. Nothing was stored.`,
      { files: `${name}: type not accepted` },
    );
  return detected.mime;
}
