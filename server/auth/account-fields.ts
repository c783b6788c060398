import { TEXT_MAX, text, textFault } from '@shared/schemas/common';
import { APIError } from 'better-auth/api';
import { z } from 'zod';
import { zodFields } from '../services/errors';

/** The better-auth endpoints that write what a caller typed into the user record. */
export const ACCOUNT_FIELD_PATHS: readonly string[] = ['/sign-up/email', '/update-user'];

/**
 * better-auth takes `name`, `email` and `image` without limits of its own, and the user record travels in the
 * signed session cookie: a 100 000-character name made a 138 kB Set-Cookie. The limits of our own forms apply
 * (`TEXT_MAX.name`; an address at most 320 characters, RFC 5321 §4.5.3.1).
 */
const accountFieldsSchema = z.object({
  name: text(TEXT_MAX.name).min(1, 'enter a name').optional(),
  email: z.string().max(320, 'at most 320 characters').optional(),
  image: z.string().max(2000, 'at most 2000 characters').optional(),
});

/**
 * Refuses a sign-up or account update whose text is too long, empty, or holds what the database cannot store
 * (NUL, a lone surrogate): better-auth's 400 with `fields` as in our error shape and the first reason in
 * `message`. Called from better-auth's `before` hook, so nothing is hashed or written first.
 */
export function checkAccountFields(body: unknown): void {
  if (!body || typeof body !== 'object') return; // better-auth's own validation answers that
  const fields: Record<string, string> = {};
  for (const [key, value] of Object.entries(body)) {
    const fault = typeof value === 'string' ? textFault(value) : undefined;
    if (fault) fields[key] = fault;
  }
  const parsed = accountFieldsSchema.safeParse(body);
  if (!parsed.success) Object.assign(fields, zodFields(parsed.error));
  const first = Object.entries(fields)[0];
  if (first)
    throw new APIError('BAD_REQUEST', {
      code: 'VALIDATION_ERROR',
      message: `${first[0]}: ${first[1]}`,
      fields,
    });
}
