import type { IncomingMessage } from 'node:http';
import type { RequestHandler } from 'express';
import { HttpError } from './errors';

/** Whether any string (value or key) holds a NUL character, which PostgreSQL text cannot store. */
function hasNul(value: unknown): boolean {
  if (typeof value === 'string') return value.includes('\u0000');
  if (Array.isArray(value)) return value.some(hasNul);
  if (value && typeof value === 'object')
    for (const k in value)
      if (k.includes('\u0000') || hasNul((value as Record<string, unknown>)[k])) return true;
  return false;
}

/** The path of the first string (value or key) holding a NUL character. */
function nulPath(value: unknown, path: string[] = []): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path.join('.') || '(body)' : null;
  if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) {
      if (k.includes('\u0000')) return [...path, '(key)'].join('.');
      const found = nulPath(v, [...path, k]);
      if (found) return found;
    }
  return null;
}

/** The refusal of a body holding a NUL character, naming its field; undefined for a clean body. */
export function nulRefusal(body: unknown): HttpError | undefined {
  // The common case (no NUL anywhere) is one walk without allocations; the path is found only for a refusal.
  const field = hasNul(body) ? nulPath(body) : null;
  return field
    ? new HttpError(400, 'validation_failed', 'the request is not valid', {
        [field]: 'text must not contain NUL characters',
      })
    : undefined;
}

/** The refusal of a write whose Origin is not ours (CSRF); requests without Origin are not from a browser form. */
export function originRefusal(req: IncomingMessage, trusted: string[]): HttpError | undefined {
  if (req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS') return undefined;
  const { origin } = req.headers;
  return origin && !trusted.includes(origin)
    ? new HttpError(403, 'bad_origin', 'cross-site request refused')
    : undefined;
}

export const refuseNul: RequestHandler = (req, _res, next) => next(nulRefusal(req.body));

export const originCheck =
  (trusted: string[]): RequestHandler =>
  (req, _res, next) =>
    next(originRefusal(req, trusted));
