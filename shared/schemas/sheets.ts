import { z } from 'zod';
import { verdictSchema } from '../checks/report';
import { inspectionAreaSchema, inspectionStatusSchema, inspectionSummarySchema } from '../inspections/schema';
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

const accountSchema = z.object({
  name: z.string(),
  emailDomain: z
    .string()
    .describe('Only the part after @ of the account’s e-mail address (confirmed before it could sign in)'),
});

/** What anyone may learn from a verification code, without signing in. */
export const sheetVerificationSchema = z.object({
  kind: z.literal('sheet').describe('A compliance sheet of a check run'),
  code: z.string().describe('The verification code, 10 base32 characters'),
  issuer: sheetIssuerSchema.describe(
    'The firm that issued the sheet (the firm of the person who ran the checks)',
  ),
  ranBy: accountSchema
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

/**
 * What a field report's code confirms: the inspection as the report printed it (a report is a snapshot —
 * answering one more item gives a new report and a new code; the old code still confirms the old report).
 */
export const fieldReportVerificationSchema = z.object({
  kind: z.literal('field report').describe('A field report of an inspection'),
  code: z.string().describe('The verification code, 10 base32 characters'),
  issuer: sheetIssuerSchema.describe('The firm of the project the inspection belongs to'),
  issuedBy: accountSchema.nullable().describe('The signed-in account that printed the report'),
  project: z.object({ name: z.string(), number: z.string() }),
  inspection: z.object({
    number: z.number().int(),
    title: z.string(),
    elevation: z.string(),
    area: inspectionAreaSchema,
    status: inspectionStatusSchema,
    counts: inspectionSummarySchema.shape.counts,
  }),
  assembly: z.object({ name: z.string(), revision: z.number().int() }),
  asOf: z.string().describe('The latest change the report includes'),
  issuedAt: z.string().describe('When the report with this code was first printed'),
  hash: z.string().describe('The report’s SHA-256 hash (64 hex characters), printed in full on it'),
});
export type FieldReportVerification = z.infer<typeof fieldReportVerificationSchema>;

/** `GET /api/verify/:code`: a compliance sheet or a field report. */
export const verificationSchema = z.discriminatedUnion('kind', [
  sheetVerificationSchema,
  fieldReportVerificationSchema,
]);
export type Verification = z.infer<typeof verificationSchema>;
