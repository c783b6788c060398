import { z } from 'zod';
import { projectRoleSchema } from '../auth/permissions';
import { emailInput } from './common';

export const memberSchema = z.object({
  id: z.uuid(),
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  organisationName: z.string().nullable(),
  role: projectRoleSchema,
});
export type Member = z.infer<typeof memberSchema>;

export const memberRoleUpdateSchema = z.object({ role: projectRoleSchema });

export const invitationInputSchema = z.object({
  email: emailInput(),
  role: projectRoleSchema,
});
export type InvitationInput = z.infer<typeof invitationInputSchema>;

export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: projectRoleSchema,
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What an invitee sees before accepting (no sign-in needed to read it). */
export const invitationPreviewSchema = z.object({
  projectName: z.string(),
  invitedBy: z.string(),
  email: z.string(),
  role: projectRoleSchema,
  expired: z.boolean(),
  accepted: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

export const invitationTokenParam = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'malformed invitation token'),
});
