import { CalcInputError } from '@shared/calc/errors';
import type { ApiError } from '@shared/schemas/common';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { ZodError } from 'zod';
import { DomainError, type ErrorKind, Refusal, zodFields } from '../services/errors';

export { notFound } from '../services/errors';

/** A refusal of the HTTP layer itself (access, parsing, limits): its kind is its status; services throw `DomainError`. */
export class HttpError extends Refusal<number> {
  get status(): number {
    return this.kind;
  }
}

export const forbidden = (message = 'your role on this project does not allow this') =>
  new HttpError(403, 'forbidden', message);
export const invalidJson = () => new HttpError(400, 'invalid_json', 'the body is not valid JSON');
export const unauthorised = () => new HttpError(401, 'unauthenticated', 'sign in first');

/** The one map from a domain error's kind to the HTTP status it answers with. */
const STATUS: Record<ErrorKind, number> = {
  malformed: 400,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  archived: 409,
  expired: 410,
  too_large: 413,
  unsupported: 415,
  invalid: 422,
  unavailable: 503,
};

export function toApiError(err: unknown): { status: number; body: ApiError & Record<string, unknown> } {
  if (err instanceof HttpError || err instanceof DomainError)
    return {
      status: err instanceof HttpError ? err.status : STATUS[err.kind],
      body: {
        error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) },
        ...err.extra,
      },
    };
  if (err instanceof ZodError)
    return {
      status: 400,
      body: {
        error: { code: 'validation_failed', message: 'the request is not valid', fields: zodFields(err) },
      },
    };
  if (err instanceof CalcInputError)
    return {
      status: 422,
      body: { error: { code: 'invalid_input', message: err.message, fields: { [err.field]: err.reason } } },
    };
  const e = err as { type?: string; status?: number; code?: string };
  if (e?.type === 'entity.parse.failed') return toApiError(invalidJson());
  if (e?.type === 'entity.too.large')
    return { status: 413, body: { error: { code: 'too_large', message: 'the body is too large' } } };
  if (e?.status && e.status >= 400 && e.status < 500)
    return {
      status: e.status,
      body: { error: { code: 'bad_request', message: 'the request could not be processed' } },
    };
  return {
    status: 500,
    body: {
      error: { code: 'internal_error', message: 'something went wrong on our side; it has been logged' },
    },
  };
}

type Fields = Record<string, unknown>;

/** The names a database error gives of the things involved (never the data): PostgreSQL's error fields. */
const DB_NAMES = [
  'code',
  'severity',
  'routine',
  'schema',
  'table',
  'column',
  'dataType',
  'constraint',
] as const;
const isDatabaseError = (e: Fields) => typeof e.code === 'string' && /^[0-9A-Z]{5}$/.test(e.code);

/**
 * What the log keeps of an unexpected error: its type, message, code and stack — but never the data it was
 * about. A failed query (drizzle's error, or any error with `query`/`params`) carries the SQL and its
 * parameters, user text included, in those fields and in its message and stack's first line; its driver error
 * (the `cause`) the failing row in `detail` and quoted values in its message. Of those only the SQLSTATE code,
 * the names of the constraint, table, column and type, the message with every quoted value replaced by "…"
 * (a quoted name listed there stays) and the stack frames are kept.
 */
export function loggableError(err: unknown): Fields {
  if (!(err instanceof Error)) return { type: typeof err };
  const chain: (Error & Fields)[] = [];
  for (let e: unknown = err; e instanceof Error && chain.length < 5; e = e.cause)
    chain.push(e as Error & Fields);
  const db = chain.find(isDatabaseError);
  const type = err.constructor.name;
  if (!db && !chain.some((e) => 'query' in e || 'params' in e))
    return { type, message: err.message, code: chain[0]!.code, stack: err.stack };
  const names = Object.fromEntries(
    DB_NAMES.filter((k) => typeof db?.[k] === 'string').map((k) => [k, db![k]]),
  );
  const known = new Set(Object.values(names));
  return {
    type,
    ...names,
    message: db
      ? String(db.message).replace(/"([^"]*)"/g, (q, inner: string) => (known.has(inner) ? q : '"…"'))
      : 'a database query failed',
    stack: err.stack
      ?.split('\n')
      .filter((line) => /^\s+at /.test(line))
      .join('\n'),
  };
}

/** Logs a 5xx: what `loggableError` keeps of it. */
export const logFailure = (log: Logger | undefined, err: unknown) =>
  log?.error({ err: loggableError(err) }, 'unhandled error');

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const { status, body } = toApiError(err);
  if (status >= 500) logFailure(req.log, err);
  if (res.headersSent) return;
  res.status(status).json(body);
};

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({
    error: { code: 'not_found', message: `no API route ${req.method} ${req.originalUrl.split('?')[0]}` },
  });
};
