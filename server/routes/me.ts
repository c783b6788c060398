import { meSchema, preferencesSchema } from '@shared/schemas/me';
import { z } from 'zod';
import { refusals } from '../http/responses';
import { anyone, routeGroup, signedIn } from '../http/route-group';

const route = routeGroup('Account', refusals('user', undefined, { invalid: false }));

export const meRoutes = [
  route.get('/me', signedIn, {
    summary: 'The signed-in user, firms and preferences',
    responses: { 200: { description: 'The signed-in user', schema: meSchema } },
    handler: ({ user, services }) => services.me.me(user.id),
  }),
  routeGroup('Account').get('/session', anyone, {
    summary:
      'The signed-in user as `GET /me` gives it, or `null` when signed out (200 either way: for pages that may be seen signed out)',
    responses: { 200: { description: 'The signed-in user, or null', schema: meSchema.nullable() } },
    handler: async ({ req, res, services }) => {
      const user = await services.auth.currentUser(req, res);
      return user ? services.me.me(user.id) : null;
    },
  }),
  route.put('/me/preferences', signedIn, {
    summary: 'Set the display unit system (SI or IP)',
    body: preferencesSchema,
    responses: { 200: { description: 'Updated user', schema: meSchema } },
    handler: ({ user, body, services }) => services.me.setUnitSystem(user.id, body.unitSystem),
  }),
  route.post('/organisations', signedIn, {
    summary: 'Create a firm with the caller as its administrator',
    body: z.object({ name: z.string().trim().min(2).max(200) }),
    responses: { 201: { description: 'Updated user with the new firm', schema: meSchema } },
    handler: ({ user, body, services }) => services.me.createOrganisation(user.id, body.name),
  }),
];
