import { apiErrorSchema } from '@shared/schemas/common';
import type { z } from 'zod';

/**
 * Every failed call to /api ends up here: the HTTP status, the server's stable `code`, its message and,
 * for validation failures, per-field reasons keyed by dotted path. `body` keeps the whole response so
 * that callers can read extras such as `current` on a 409 version conflict.
 */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string> | undefined;
  readonly body: unknown;

  constructor(
    status: number,
    code: string,
    message: string,
    fields?: Record<string, string>,
    body?: unknown,
  ) {
    super(message);
    this.name = 'ApiRequestError';
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.body = body;
  }
}

export const isApiRequestError = (e: unknown): e is ApiRequestError => e instanceof ApiRequestError;

/**
 * On a 409 the server sends the record as it now stands (`current`: someone saved first, or a newer version
 * exists): that record, read with its schema; null for any other error. `code` narrows which 409s count
 * (`version_conflict` by default; null = any 409).
 */
export function currentOnConflict<S extends z.ZodType>(
  error: unknown,
  schema: S,
  code: string | null = 'version_conflict',
): z.infer<S> | null {
  if (!isApiRequestError(error) || error.status !== 409 || (code !== null && error.code !== code))
    return null;
  const body = error.body as { current?: unknown } | null;
  const parsed = schema.safeParse(body?.current);
  return parsed.success ? parsed.data : null;
}

/** An API address whose every interpolated value is encoded (one path segment): apiPath`/api/assemblies/${id}`. */
export const apiPath = (parts: TemplateStringsArray, ...values: (string | number)[]) =>
  parts.reduce((path, part, i) => path + encodeURIComponent(values[i - 1] ?? '') + part);

type Method = 'GET' | 'POST' | 'PUT' | 'DELETE';

interface RequestOptions {
  method?: Method;
  body?: unknown;
  signal?: AbortSignal;
}

async function send(path: string, { method = 'GET', body, signal }: RequestOptions): Promise<Response> {
  try {
    return await fetch(path, {
      method,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        ...(body !== undefined ? { 'Content-Type': 'application/json' } : {}),
      },
      body: body !== undefined ? JSON.stringify(body) : undefined,
      signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiRequestError(0, 'network_error', 'The server could not be reached. Check your connection.');
  }
}

async function readJson(res: Response): Promise<unknown> {
  const text = await res.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

async function toError(res: Response): Promise<ApiRequestError> {
  const body = await readJson(res);
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiRequestError(res.status, code, message, fields, body);
  }
  return new ApiRequestError(
    res.status,
    `http_${res.status}`,
    res.statusText || `Request failed (${res.status})`,
  );
}

/** Call the API and check the answer against a shared schema. */
export async function apiRequest<S extends z.ZodType>(
  path: string,
  schema: S,
  options: RequestOptions = {},
): Promise<z.output<S>> {
  const res = await send(path, options);
  if (!res.ok) throw await toError(res);
  const body = await readJson(res);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    throw new ApiRequestError(
      res.status,
      'unexpected_response',
      `The server answered ${path} in an unexpected shape.`,
      undefined,
      body,
    );
  }
  return parsed.data;
}

/** Call the API where success carries no body (204). */
export async function apiRequestEmpty(path: string, options: RequestOptions = {}): Promise<void> {
  const res = await send(path, options);
  if (!res.ok) throw await toError(res);
}

/** One sentence for a Notice, whatever was thrown. */
export function errorMessage(error: unknown): string {
  if (isApiRequestError(error)) {
    if (error.status === 401) return 'Your session has ended. Sign in again.';
    if (error.status === 403) return error.message || 'Your role on this project does not allow that.';
    return error.message;
  }
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
