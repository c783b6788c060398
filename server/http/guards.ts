import type { IncomingMessage } from 'node:http';
import { textFault } from '@shared/schemas/common';
import type { RequestHandler } from 'express';
import { HttpError } from './errors';

/**
 * The deepest nesting of arrays and objects a JSON body may have. The deepest real body (an assembly's input)
 * nests under 10 levels; a limit keeps every walk over a body short and its recursion (zod's too) shallow.
 */
export const MAX_JSON_DEPTH = 64;

/** Text the database cannot store: a NUL character or a lone UTF-16 surrogate (`nul` below means either). */
const hasNul = (text: string) => textFault(text) !== undefined;

/**
 * One iterative walk over a parsed body (a stack of its own, so no nesting can overflow the call stack):
 * `deep` at the first array or object nested more than MAX_JSON_DEPTH levels, `nul` at the first string
 * (value or key) holding a NUL character, which PostgreSQL text cannot store; undefined for a clean body.
 * `text: false` skips the strings (a body whose text cannot hold a NUL).
 */
function scan(body: unknown, text: boolean): 'deep' | 'nul' | undefined {
  if (typeof body === 'string') return text && hasNul(body) ? 'nul' : undefined;
  if (!body || typeof body !== 'object') return undefined;
  const open: object[] = [body];
  const depths: number[] = [1];
  /** Checks a string at once and stacks an array or object; true for a NUL. */
  const visit = (value: unknown, depth: number) => {
    if (typeof value === 'string') return text && hasNul(value);
    if (value && typeof value === 'object') {
      open.push(value);
      depths.push(depth);
    }
    return false;
  };
  while (open.length > 0) {
    const value = open.pop()!;
    const depth = depths.pop()!;
    if (depth > MAX_JSON_DEPTH) return 'deep';
    if (Array.isArray(value)) {
      for (const item of value) if (visit(item, depth + 1)) return 'nul';
    } else
      for (const k in value)
        if ((text && hasNul(k)) || visit((value as Record<string, unknown>)[k], depth + 1)) return 'nul';
  }
  return undefined;
}

/**
 * The path of the first string (value or key) holding a NUL character, not looking deeper than
 * MAX_JSON_DEPTH (`scan` found one at most that deep), so the recursion stays shallow.
 */
function nulPath(value: unknown, path: string[] = []): [field: string, reason: string] | null {
  if (typeof value === 'string') {
    const fault = textFault(value);
    return fault ? [path.join('.') || '(body)', fault] : null;
  }
  if (value && typeof value === 'object' && path.length < MAX_JSON_DEPTH)
    for (const [k, v] of Object.entries(value)) {
      const fault = textFault(k);
      if (fault) return [[...path, '(key)'].join('.'), fault];
      const found = nulPath(v, [...path, k]);
      if (found) return found;
    }
  return null;
}

/**
 * The refusal of a parsed body nested too deeply (400 `invalid_json`) or holding a NUL character (400
 * `validation_failed` naming the field); undefined for a clean body. The common case (a clean body) is one
 * walk; the path of a NUL is found only for a refusal. `json`, the body's text where it is at hand (the lean
 * path), spares the string checks — most of the walk's cost — when it has no `\u` escape: JSON forbids raw
 * control characters and UTF-8 decoding never yields a lone surrogate, so only an escape can bring either.
 */
export function bodyRefusal(body: unknown, json?: string): HttpError | undefined {
  const found = scan(body, json === undefined || json.includes('\\u'));
  if (found === 'deep')
    return new HttpError(
      400,
      'invalid_json',
      `the body nests arrays and objects more than ${MAX_JSON_DEPTH} levels deep`,
    );
  if (found === 'nul') {
    const [field, reason] = nulPath(body) ?? ['(body)', 'text must not contain NUL characters'];
    return new HttpError(400, 'validation_failed', 'the request is not valid', { [field]: reason });
  }
  return undefined;
}

/** The refusal of a write whose Origin is not ours (CSRF); requests without Origin are not from a browser form. */
export function originRefusal(req: IncomingMessage, trusted: string[]): HttpError | undefined {
  if (req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS') return undefined;
  const { origin } = req.headers;
  return origin && !trusted.includes(origin)
    ? new HttpError(403, 'bad_origin', 'cross-site request refused')
    : undefined;
}

export const refuseBadBody: RequestHandler = (req, _res, next) => next(bodyRefusal(req.body));

export const originCheck =
  (trusted: string[]): RequestHandler =>
  (req, _res, next) =>
    next(originRefusal(req, trusted));
