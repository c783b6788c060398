import { z } from 'zod';

/** The one error shape of every API response that is not a success. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z
      .string()
      .describe('Stable machine-readable code, e.g. `validation_failed`, `not_found`, `version_conflict`.'),
    message: z.string().describe('Human-readable explanation.'),
    fields: z
      .record(z.string(), z.string())
      .optional()
      .describe('Per-field reasons, keyed by dotted path into the request (e.g. `layers.2.thickness`).'),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

export const uuidParam = z.object({ id: z.uuid() });
/** The path parameter of a project's routes (`/projects/:projectId/…`). */
export const projectParams = z.object({ projectId: z.uuid() });

/*
 * Limits of what a request may carry (DEVELOPERS.md "API conventions"). Text is trimmed and held to a length
 * that fits its use; a whole number that reaches an `integer` column (versions, revisions, positions, counts)
 * fits it. Lone UTF-16 surrogates and NUL characters are refused for every string by the request guard
 * (server/http/guards.ts), so the schemas need not repeat it.
 */

/** Text limits in characters (UTF-16 code units, as zod and JavaScript count them). */
export const TEXT_MAX = {
  /** A name or title: person, firm, project, assembly, submittal, code table, library entry. */
  name: 200,
  /** One line: an address, a source reference, a revision or row note. */
  line: 500,
  /** Free text: descriptions, notes, comments, review decisions. */
  note: 5000,
} as const;

/**
 * Why a string cannot be stored as text, or undefined: a NUL character (PostgreSQL text cannot hold one) or a
 * lone UTF-16 surrogate (half of a character: it has no UTF-8 form, and JSON columns refuse its escape). The
 * request guard (server/http/guards.ts) refuses both in every string and key of a body.
 */
export function textFault(s: string): string | undefined {
  if (s.includes('\u0000')) return 'text must not contain NUL characters';
  // A string is well formed when every surrogate is half of a pair (ES2024; a tenth of the cost of /\p{Cs}/u).
  if (!s.isWellFormed()) return 'text must not contain a lone UTF-16 surrogate (half of a character)';
  return undefined;
}

/** Trimmed text of at most `max` characters, with the limit in the message. */
export const text = (max: number) => z.string().trim().max(max, `at most ${max} characters`);

/** The largest value of a PostgreSQL `integer` column: 2³¹ − 1. */
export const INT4_MAX = 2_147_483_647;

/** A whole number min … 2³¹ − 1 that fits an `integer` column (a version, revision, position or count). */
export const int4 = (min = 1) =>
  z.number().int().min(min).max(INT4_MAX, `must be at most ${INT4_MAX} (a database integer)`);

/** The same, written in a path or query string. */
export const int4Param = (min = 1) =>
  z.coerce.number().int().min(min).max(INT4_MAX, `must be at most ${INT4_MAX} (a database integer)`);

/**
 * A calendar date YYYY-MM-DD in 1900 … 2199: any date a project, a code edition or a review can have, and one
 * the database can store (it has no year 0).
 */
export const calendarDate = () =>
  z.iso
    .date()
    .refine((d) => d >= '1900-01-01' && d <= '2199-12-31', 'a date between 1900-01-01 and 2199-12-31')
    .describe('Calendar date, YYYY-MM-DD');

/** A finite number (NaN, ±Infinity and numbers written as strings are refused). */
export const finite = () => z.number().refine(Number.isFinite, 'must be a finite number');

/** An e-mail address someone types to reach a person (invitation, firm member): at most 320 characters, kept lower-case. */
export const emailInput = () =>
  z
    .email()
    .max(320)
    .transform((e) => e.toLowerCase());

/**
 * A closed set of values written once, as the keys of its words (labels, glyphs, units): the values in table
 * order, their zod enum and the words, so no value can be listed without words or twice.
 */
export function wordedEnum<W extends Record<string, unknown>>(words: W) {
  type Value = Extract<keyof W, string>;
  const values = Object.keys(words) as [Value, ...Value[]];
  return [values, z.enum(values), words] as const;
}

export const unitSystemSchema = z.enum(['SI', 'IP']);

/*
 * Fields several stored records answer with, spread into their field lists (`...createdFields`) in the place
 * they stand, so the OpenAPI document keeps its order.
 */
/** Who created the record (a user id; null when unknown or deleted) and when (ISO 8601). */
export const createdFields = { createdBy: z.string().nullable(), createdAt: z.string() };
/** An editable record's version (the concurrency token a save names; 409 when stale) and when it was created and last changed. */
export const versionedFields = { version: z.number().int(), createdAt: z.string(), updatedAt: z.string() };

/** A 409 for a stale save: the error plus the record as it is now, so the client can merge or reload. */
export const versionConflictSchema = <T extends z.ZodType>(current: T) => apiErrorSchema.extend({ current });
