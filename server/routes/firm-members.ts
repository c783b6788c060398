import {
  firmMemberAddSchema,
  firmMemberParams,
  firmMemberRoleUpdateSchema,
  firmMemberSchema,
} from '@shared/schemas/firm-members';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { firm, routeGroup } from '../http/route-group';

const route = routeGroup('Firm members', refusals('organisation', 'firm or member'));

/** The firm members page: who is in the firm with which firm role (admin, editor, reader). */
export const firmMemberRoutes = [
  route.get('/organisations/:orgId/members', firm('firm.read'), {
    summary: 'The people of the firm with their firm roles',
    responses: {
      200: { description: 'Members', schema: z.object({ members: z.array(firmMemberSchema) }) },
    },
    handler: async ({ params, services }) => ({ members: await services.firmMembers.list(params.orgId) }),
  }),
  route.post('/organisations/:orgId/members', firm('firm.admin'), {
    summary:
      'Add someone who has an account (by e-mail) to the firm with a firm role; they are told by e-mail',
    body: firmMemberAddSchema,
    example: { email: 'colleague@example.com', role: 'reader' },
    responses: {
      201: { description: 'The new member', schema: firmMemberSchema },
      409: errorResponse('Already in the firm'),
      422: errorResponse('No account uses this address'),
    },
    handler: ({ params, body, user, services }) => services.firmMembers.add(params.orgId, user, body),
  }),
  route.put('/organisations/:orgId/members/:userId', firm('firm.admin'), {
    summary: 'Change a member’s firm role',
    params: firmMemberParams,
    body: firmMemberRoleUpdateSchema,
    example: { role: 'editor' },
    responses: {
      200: { description: 'The member', schema: firmMemberSchema },
      409: errorResponse('Would leave the firm without an administrator'),
    },
    handler: ({ params, body, user, services }) =>
      services.firmMembers.setRole(params.orgId, params.userId, body.role, user.id),
  }),
  route.delete('/organisations/:orgId/members/:userId', firm('firm.admin'), {
    summary: 'Take someone out of the firm',
    params: firmMemberParams,
    responses: {
      204: { description: 'Removed' },
      409: errorResponse('The firm’s last administrator'),
    },
    handler: async ({ params, user, services }) => {
      await services.firmMembers.remove(params.orgId, params.userId, user.id);
      return undefined;
    },
  }),
];
