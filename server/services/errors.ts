import type { ZodError } from 'zod';

/**
 * What kind of refusal an error is, in the domain's words. Services, storage and auth say only this; the
 * HTTP layer (server/http/errors.ts) holds the one map from kind to status.
 */
export type ErrorKind =
  /** The request itself is not what the step takes (e.g. two files where one is expected, an empty file). */
  | 'malformed'
  /** Well formed but refused by a rule: the `fields` say which and why. */
  | 'invalid'
  | 'forbidden'
  | 'not_found'
  /** The thing changed or stands in the way (someone saved first, a duplicate, the last owner). */
  | 'conflict'
  /** The project is archived and read-only. */
  | 'archived'
  /** Existed but is no longer valid (an expired invitation). */
  | 'expired'
  | 'too_large'
  /** A file of a type that is not accepted. */
  | 'unsupported'
  /** A part the step needs (file storage) is not available here. */
  | 'unavailable';

/**
 * A refusal: what decides its status (`K`: a domain kind, or a status the HTTP layer sets itself), a stable
 * `code`, a message for people, and optionally the fields at fault and more body.
 */
export class Refusal<K extends ErrorKind | number> extends Error {
  constructor(
    readonly kind: K,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** More for the answer's body beside `error`, e.g. `current` (the record as it is now) or `errors`. */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

/** A refusal in the domain's words; the HTTP layer maps its kind to the status it answers with. */
export class DomainError extends Refusal<ErrorKind> {}

export const notFound = (what = 'resource') => new DomainError('not_found', 'not_found', `${what} not found`);

/** A conflict; a version conflict passes the record as it is now (`current`) so the client can show it. */
export const conflict = (code: string, message: string, current?: unknown) =>
  new DomainError('conflict', code, message, undefined, current === undefined ? undefined : { current });

/** Zod issues → `{ "layers.2.thickness": "Too small: expected number to be >0" }`. */
export function zodFields(err: ZodError, prefix?: string): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '(body)';
    fields[path] ??= issue.message;
  }
  return fields;
}
