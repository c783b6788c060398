import {
  firmMemberAddSchema,
  firmMemberParams,
  firmMemberRoleUpdateSchema,
  firmMemberSchema,
} from '@shared/schemas/firm-members';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { defineRoute } from '../http/route';

const orgParams = z.object({ orgId: z.uuid() });
const errors = refusals('organisation', 'firm or member');

/** The firm members page: who is in the firm with which firm role (admin, editor, reader). */
export const firmMemberRoutes = [
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/members',
    summary: 'The people of the firm with their firm roles',
    tag: 'Firm members',
    access: { kind: 'organisation', action: 'firm.read' },
    params: orgParams,
    responses: {
      200: { description: 'Members', schema: z.object({ members: z.array(firmMemberSchema) }) },
      ...errors,
    },
    handler: async ({ params, services }) => ({ members: await services.firmMembers.list(params.orgId) }),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/members',
    summary:
      'Add someone who has an account (by e-mail) to the firm with a firm role; they are told by e-mail',
    tag: 'Firm members',
    access: { kind: 'organisation', action: 'firm.admin' },
    params: orgParams,
    body: firmMemberAddSchema,
    example: { email: 'colleague@example.com', role: 'reader' },
    responses: {
      201: { description: 'The new member', schema: firmMemberSchema },
      ...errors,
      409: errorResponse('Already in the firm'),
      422: errorResponse('No account uses this address'),
    },
    handler: ({ params, body, user, services }) => services.firmMembers.add(params.orgId, user, body),
  }),
  defineRoute({
    method: 'put',
    path: '/organisations/:orgId/members/:userId',
    summary: 'Change a member’s firm role',
    tag: 'Firm members',
    access: { kind: 'organisation', action: 'firm.admin' },
    params: firmMemberParams,
    body: firmMemberRoleUpdateSchema,
    example: { role: 'editor' },
    responses: {
      200: { description: 'The member', schema: firmMemberSchema },
      ...errors,
      409: errorResponse('Would leave the firm without an administrator'),
    },
    handler: ({ params, body, user, services }) =>
      services.firmMembers.setRole(params.orgId, params.userId, body.role, user.id),
  }),
  defineRoute({
    method: 'delete',
    path: '/organisations/:orgId/members/:userId',
    summary: 'Take someone out of the firm',
    tag: 'Firm members',
    access: { kind: 'organisation', action: 'firm.admin' },
    params: firmMemberParams,
    responses: {
      204: { description: 'Removed' },
      ...errors,
      409: errorResponse('The firm’s last administrator'),
    },
    handler: async ({ params, user, services }) => {
      await services.firmMembers.remove(params.orgId, params.userId, user.id);
      return undefined;
    },
  }),
];
