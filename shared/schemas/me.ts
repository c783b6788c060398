import { z } from 'zod';
import { firmRoleSchema } from '../auth/permissions';
import { unitSystemSchema } from './common';

export const meSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  siteRole: z.enum(['admin', 'user']),
  unitSystem: unitSystemSchema,
  organisations: z.array(
    z.object({
      id: z.uuid(),
      name: z.string(),
      handle: z
        .string()
        .describe('The firm’s unique handle, printed on its sheets, e.g. `@corvid-architects-0k3x9qa1`'),
      verified: z.boolean().describe('Whether a site administrator has verified the firm'),
      role: firmRoleSchema.describe('The caller’s role in the firm: admin, editor or reader'),
    }),
  ),
});
export type Me = z.infer<typeof meSchema>;

export const preferencesSchema = z.object({ unitSystem: unitSystemSchema });

export const auditEntrySchema = z.object({
  id: z.number(),
  at: z.string(),
  actorName: z.string().nullable(),
  entity: z.string(),
  entityId: z.string(),
  /** What the object is called now (a submittal: "S-003 rev 1 — title"); null when it is gone. */
  entityName: z.string().nullable(),
  action: z.string(),
  before: z.unknown(),
  after: z.unknown(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const capturedMailSchema = z.object({
  id: z.uuid(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;
