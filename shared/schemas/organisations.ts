import { z } from 'zod';

/** Firms as the site administrator sees them: who they are, and whether someone has verified that. */
export const adminOrganisationSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  handle: z.string().describe('The firm’s unique handle, e.g. `@corvid-architects-k3x9qa`'),
  createdAt: z.string(),
  members: z.number().int().describe('People in the firm'),
  verifiedAt: z
    .string()
    .nullable()
    .describe('When a site administrator verified the firm; null = not verified'),
  verifiedBy: z.string().nullable().describe('The name of the site administrator who verified it'),
});
export type AdminOrganisation = z.infer<typeof adminOrganisationSchema>;

export const adminOrganisationListSchema = z.object({ organisations: z.array(adminOrganisationSchema) });

export const organisationVerificationSchema = z.object({
  verified: z
    .boolean()
    .describe(
      'true: you have confirmed the firm is who its name says (its sheets show it as verified); false: withdraw that',
    ),
});
