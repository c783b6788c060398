import { z } from 'zod';
import { firmRoleSchema } from '../auth/permissions';
import { emailInput } from './common';

/** Someone in a firm with their firm role (`organisation_members`). */
export const firmMemberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: firmRoleSchema,
  since: z.string().describe('When they joined the firm'),
});
export type FirmMember = z.infer<typeof firmMemberSchema>;

/** Adding someone who already has a Skinwright account to the firm, by their e-mail address. */
export const firmMemberAddSchema = z.object({
  email: emailInput(),
  role: firmRoleSchema,
});
export type FirmMemberAdd = z.infer<typeof firmMemberAddSchema>;

export const firmMemberRoleUpdateSchema = z.object({ role: firmRoleSchema });

export const firmMemberParams = z.object({
  orgId: z.uuid(),
  userId: z.string().regex(/^[A-Za-z0-9_-]{1,100}$/, 'malformed user id'),
});
