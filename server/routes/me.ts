import { capturedMailSchema, meSchema, preferencesSchema } from '@shared/schemas/me';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { defineRoute } from '../http/route';

const unauth = refusals('user', undefined, { invalid: false });

export const meRoutes = [
  defineRoute({
    method: 'get',
    path: '/me',
    summary: 'The signed-in user, firms and preferences',
    tag: 'Account',
    access: { kind: 'user' },
    responses: { 200: { description: 'The signed-in user', schema: meSchema }, ...unauth },
    handler: ({ user, services }) => services.me.me(user.id),
  }),
  defineRoute({
    method: 'get',
    path: '/session',
    summary:
      'The signed-in user as `GET /me` gives it, or `null` when signed out (200 either way: for pages that may be seen signed out)',
    tag: 'Account',
    access: { kind: 'public' },
    responses: { 200: { description: 'The signed-in user, or null', schema: meSchema.nullable() } },
    handler: async ({ req, res, services }) => {
      const user = await services.auth.currentUser(req, res);
      return user ? services.me.me(user.id) : null;
    },
  }),
  defineRoute({
    method: 'put',
    path: '/me/preferences',
    summary: 'Set the display unit system (SI or IP)',
    tag: 'Account',
    access: { kind: 'user' },
    body: preferencesSchema,
    responses: { 200: { description: 'Updated user', schema: meSchema }, ...unauth },
    handler: ({ user, body, services }) => services.me.setUnitSystem(user.id, body.unitSystem),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations',
    summary: 'Create a firm with the caller as its administrator',
    tag: 'Account',
    access: { kind: 'user' },
    body: z.object({ name: z.string().trim().min(2).max(200) }),
    responses: { 201: { description: 'Updated user with the new firm', schema: meSchema }, ...unauth },
    handler: ({ user, body, services }) => services.me.createOrganisation(user.id, body.name),
  }),
  defineRoute({
    method: 'get',
    path: '/admin/backup',
    summary: 'Download a consistent backup of the embedded database (gzip tarball; site administrators)',
    tag: 'Administration',
    access: { kind: 'siteAdmin' },
    responses: {
      200: {
        description: 'PGlite data folder as .tar.gz (restore with `npm run db:restore -- file`)',
        contentType: 'application/gzip',
      },
      ...refusals('siteAdmin', undefined, { invalid: false }),
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
  defineRoute({
    method: 'get',
    path: '/admin/mail',
    summary: 'Messages captured by the local mail server (site administrators)',
    tag: 'Administration',
    access: { kind: 'siteAdmin' },
    responses: {
      200: {
        description: 'Captured messages, newest first',
        schema: z.object({ messages: z.array(capturedMailSchema) }),
      },
      ...refusals('siteAdmin', undefined, { invalid: false }),
    },
    handler: async ({ services }) => ({ messages: await services.me.capturedMail() }),
  }),
];
