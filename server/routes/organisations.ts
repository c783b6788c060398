import {
  adminOrganisationListSchema,
  adminOrganisationSchema,
  organisationVerificationSchema,
} from '@shared/schemas/organisations';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { defineRoute } from '../http/route';

const refused = refusals('siteAdmin', undefined, { invalid: false });

/** Site administration of firms: the list, and verifying who a firm is (its sheets show it). */
export const organisationAdminRoutes = [
  defineRoute({
    method: 'get',
    path: '/admin/organisations',
    summary: 'Every firm with its handle, members and whether it is verified (site administrators)',
    tag: 'Administration',
    access: { kind: 'siteAdmin' },
    responses: { 200: { description: 'Firms, by name', schema: adminOrganisationListSchema }, ...refused },
    handler: async ({ services }) => ({ organisations: await services.organisations.list() }),
  }),
  defineRoute({
    method: 'put',
    path: '/admin/organisations/:orgId/verification',
    summary:
      'Verify a firm (you have confirmed it is who its name says) or withdraw that; its sheets and the verification page show it (site administrators)',
    tag: 'Administration',
    access: { kind: 'siteAdmin' },
    params: z.object({ orgId: z.uuid() }),
    body: organisationVerificationSchema,
    example: { verified: true },
    responses: {
      200: { description: 'The firm as it now stands', schema: adminOrganisationSchema },
      400: errorResponse('Invalid id or body'),
      ...refused,
      404: errorResponse('No such firm'),
    },
    handler: ({ params, body, user, services }) =>
      services.organisations.setVerified(params.orgId, user.id, body.verified),
  }),
];
