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

/** A finite number (NaN, ±Infinity and numbers written as strings are refused). */
export const finite = () => z.number().refine(Number.isFinite, 'must be a finite number');

export const unitSystemSchema = z.enum(['SI', 'IP']);

/** A 409 for a stale save: the error plus the record as it is now, so the client can merge or reload. */
export const versionConflictSchema = <T extends z.ZodType>(current: T) => apiErrorSchema.extend({ current });
