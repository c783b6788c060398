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
});

export const verifyParamsSchema = z.object({ code: z.string() });

/** What anyone may learn from a verification code, without signing in. */
export const sheetVerificationSchema = z.object({
  code: z.string().describe('The verification code, 10 base32 characters'),
  issuer: z.string().describe('The firm that issued the sheet (the firm of the person who ran the checks)'),
  project: z.object({ name: z.string(), number: z.string() }),
  assembly: z.object({ name: z.string(), revision: z.number().int() }),
  criteriaSet: z.object({ name: z.string(), version: z.number().int() }),
  runAt: z.string().describe('When the check run was made (the date on the sheet)'),
  verdict: verdictSchema,
  engineVersion: z.string(),
  hashPrefix: z.string().describe('The first 16 hex characters of the run’s SHA-256 hash'),
});
export type SheetVerification = z.infer<typeof sheetVerificationSchema>;
