import { z } from 'zod';
import { verdictSchema } from '../checks/report';
import { unitSystemSchema } from './common';

/** Compliance sheets (PDF of a stored check run) and their public verification. */

export const sheetQuerySchema = z.object({
  units: unitSystemSchema.optional().describe('Units printed on the sheet; default: the caller’s preference'),
  disposition: z
    .enum(['attachment', 'inline'])
    .default('attachment')
    .describe('attachment = download; inline = show in the browser'),
  sweep: z
    .uuid()
    .optional()
    .describe(
      'A saved sweep of the run’s assembly, printed as an appendix (its chart and cheapest variants)',
    ),
});

export const verifyParamsSchema = z.object({ code: z.string().max(100) });

/**
 * The firm that issued a sheet. Firm names are not unique (anyone may make a firm of any name), so the
 * sheet and the verification page also show the firm's unique handle and whether a site administrator has
 * verified who the firm is.
 */
export const sheetIssuerSchema = z.object({
  name: z.string().describe('The firm’s name when the sheet was issued (names are not unique)'),
  handle: z
    .string()
    .nullable()
    .describe(
      'The firm’s unique handle, e.g. `@corvid-architects-k3x9qa`; null when the firm has been removed',
    ),
  verifiedAt: z
    .string()
    .nullable()
    .describe('When a site administrator verified the firm; null = the issuer is not verified'),
});
export type SheetIssuer = z.infer<typeof sheetIssuerSchema>;

/** What anyone may learn from a verification code, without signing in. */
export const sheetVerificationSchema = z.object({
  code: z.string().describe('The verification code, 10 base32 characters'),
  issuer: sheetIssuerSchema.describe(
    'The firm that issued the sheet (the firm of the person who ran the checks)',
  ),
  ranBy: z
    .object({
      name: z.string(),
      emailDomain: z
        .string()
        .describe(
          'Only the part after @ of the account’s e-mail address (confirmed before it could sign in)',
        ),
    })
    .nullable()
    .describe('The signed-in account that ran the checks; null when the account has been removed'),
  project: z.object({ name: z.string(), number: z.string() }),
  assembly: z.object({ name: z.string(), revision: z.number().int() }),
  criteriaSet: z.object({ name: z.string(), version: z.number().int() }),
  runAt: z.string().describe('When the check run was made (the date on the sheet)'),
  verdict: verdictSchema,
  engineVersion: z.string(),
  hash: z.string().describe('The run’s SHA-256 hash (64 hex characters), printed in full on the sheet'),
});
export type SheetVerification = z.infer<typeof sheetVerificationSchema>;
