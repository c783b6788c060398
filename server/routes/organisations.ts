import { capturedMailSchema } from '@shared/schemas/me';
import {
  adminOrganisationListSchema,
  adminOrganisationSchema,
  organisationVerificationSchema,
} from '@shared/schemas/organisations';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { routeGroup, siteAdmin } from '../http/route-group';

const admin = routeGroup('Administration', refusals('siteAdmin', undefined, { invalid: false }));

/**
 * Site administration: a backup of the embedded database, the captured mail, the firms and verifying who a firm
 * is (its sheets show it).
 */
export const adminRoutes = [
  admin.get('/admin/backup', siteAdmin, {
    summary: 'Download a consistent backup of the embedded database (gzip tarball; site administrators)',
    responses: {
      200: {
        description: 'PGlite data folder as .tar.gz (restore with `npm run db:restore -- file`)',
        contentType: 'application/gzip',
      },
      409: errorResponse('Running on a PostgreSQL server: use pg_dump'),
    },
    handler: async ({ res, services }) => {
      const tarball = await services.backup();
      res
        .type('application/gzip')
        .attachment(`skinwright-${new Date().toISOString().slice(0, 10)}.tar.gz`)
        .send(tarball);
      return undefined;
    },
  }),
  admin.get('/admin/mail', siteAdmin, {
    summary: 'Messages captured by the local mail server (site administrators)',
    responses: {
      200: {
        description: 'Captured messages, newest first',
        schema: z.object({ messages: z.array(capturedMailSchema) }),
      },
    },
    handler: async ({ services }) => ({ messages: await services.me.capturedMail() }),
  }),
  admin.get('/admin/organisations', siteAdmin, {
    summary: 'Every firm with its handle, members and whether it is verified (site administrators)',
    responses: { 200: { description: 'Firms, by name', schema: adminOrganisationListSchema } },
    handler: async ({ services }) => ({ organisations: await services.organisations.list() }),
  }),
  admin.put('/admin/organisations/:orgId/verification', siteAdmin, {
    summary:
      'Verify a firm (you have confirmed it is who its name says) or withdraw that; its sheets and the verification page show it (site administrators)',
    body: organisationVerificationSchema,
    example: { verified: true },
    responses: {
      200: { description: 'The firm as it now stands', schema: adminOrganisationSchema },
      400: errorResponse('Invalid id or body'),
      404: errorResponse('No such firm'),
    },
    handler: ({ params, body, user, services }) =>
      services.organisations.setVerified(params.orgId, user.id, body.verified),
  }),
];
