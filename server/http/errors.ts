import { CalcInputError } from '@shared/calc/errors';
import type { ApiError } from '@shared/schemas/common';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';

/** An error with an HTTP status and a stable code; everything the API refuses is one of these. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'resource') => new HttpError(404, 'not_found', `${what} not found`);
export const forbidden = (message = 'your role on this project does not allow this') =>
  new HttpError(403, 'forbidden', message);
export const invalidJson = () => new HttpError(400, 'invalid_json', 'the body is not valid JSON');
export const unauthorised = () => new HttpError(401, 'unauthenticated', 'sign in first');

/** Zod issues → `{ "layers.2.thickness": "Too small: expected number to be >0" }`. */
export function zodFields(err: ZodError, prefix?: string): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '(body)';
    fields[path] ??= issue.message;
  }
  return fields;
}

export function toApiError(err: unknown): { status: number; body: ApiError & Record<string, unknown> } {
  if (err instanceof HttpError)
    return {
      status: err.status,
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

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const { status, body } = toApiError(err);
  if (status >= 500) req.log?.error({ err }, 'unhandled error');
  if (res.headersSent) return;
  res.status(status).json(body);
};

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({
    error: { code: 'not_found', message: `no API route ${req.method} ${req.originalUrl.split('?')[0]}` },
  });
};
