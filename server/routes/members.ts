import { can } from '@shared/auth/permissions';
import { projectParams } from '@shared/schemas/common';
import {
  invitationInputSchema,
  invitationPreviewSchema,
  invitationSchema,
  invitationTokenParam,
  memberRoleUpdateSchema,
  memberSchema,
} from '@shared/schemas/members';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { defineRoute } from '../http/route';

const errors = refusals('project', 'project, member or invitation', {
  invalid: false,
  forbidden:
    'Your role does not allow this, or does not allow granting that role (`role_not_grantable`: see `mayGrant` in shared/auth)',
});
const memberParams = projectParams.extend({ memberId: z.uuid() });

export const memberRoutes = [
  defineRoute({
    method: 'get',
    path: '/projects/:projectId/members',
    summary: 'Members and pending invitations',
    tag: 'Members',
    access: { kind: 'project', action: 'members.read' },
    params: projectParams,
    responses: {
      200: {
        description: 'Members',
        schema: z.object({ members: z.array(memberSchema), invitations: z.array(invitationSchema) }),
      },
      ...errors,
    },
    handler: async ({ project, services }) => {
      const { members, invitations } = await services.members.list(project.id);
      // Pending invitations (addresses of people not yet on the project) only for those who may invite.
      return { members, invitations: can(project.role, 'members.invite') ? invitations : [] };
    },
  }),
  defineRoute({
    method: 'post',
    path: '/projects/:projectId/invitations',
    summary: 'Invite someone by e-mail with a role on this project',
    tag: 'Members',
    access: { kind: 'project', action: 'members.invite' },
    params: projectParams,
    body: invitationInputSchema,
    example: { email: 'engineer@example.com', role: 'engineer' },
    responses: {
      201: {
        description: 'The invitation (an e-mail with the accept link was sent)',
        schema: invitationSchema,
      },
      ...errors,
      409: errorResponse('Already a member, or the project is archived'),
    },
    handler: ({ user, project, body, services }) =>
      services.members.invite(project.id, { ...user, role: project.role }, body),
  }),
  defineRoute({
    method: 'put',
    path: '/projects/:projectId/members/:memberId',
    summary: 'Change a member’s role',
    tag: 'Members',
    // Taking someone's access away (or narrowing it) stays possible on an archived project.
    access: { kind: 'project', action: 'members.manage', whenArchived: 'allow' },
    params: memberParams,
    body: memberRoleUpdateSchema,
    responses: {
      200: { description: 'The member', schema: memberSchema },
      ...errors,
      409: errorResponse('Would leave the project without an owner'),
    },
    handler: ({ user, project, params, body, services }) =>
      services.members.setRole(project.id, params.memberId, body.role, {
        id: user.id,
        role: project.role,
      }),
  }),
  defineRoute({
    method: 'delete',
    path: '/projects/:projectId/members/:memberId',
    summary: 'Remove a member from the project',
    tag: 'Members',
    // Taking someone's access away (or narrowing it) stays possible on an archived project.
    access: { kind: 'project', action: 'members.manage', whenArchived: 'allow' },
    params: memberParams,
    responses: {
      204: { description: 'Removed' },
      ...errors,
      409: errorResponse('Last owner'),
    },
    handler: async ({ user, project, params, services }) => {
      await services.members.remove(project.id, params.memberId, { id: user.id, role: project.role });
      return undefined;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/invitations/:token',
    summary: 'What an invitation offers (no sign-in needed)',
    tag: 'Members',
    access: { kind: 'public' },
    params: invitationTokenParam,
    responses: {
      200: { description: 'Invitation preview', schema: invitationPreviewSchema },
      404: errors[404],
    },
    handler: ({ params, services }) => services.members.preview(params.token),
  }),
  defineRoute({
    method: 'post',
    path: '/invitations/:token/accept',
    summary: 'Accept an invitation (signed in with the invited address)',
    tag: 'Members',
    access: { kind: 'user' },
    params: invitationTokenParam,
    responses: {
      200: { description: 'Joined', schema: z.object({ projectId: z.uuid() }) },
      401: errors[401],
      403: errorResponse(
        'Signed in with another address, or the sender may no longer grant the role (`inviter_not_allowed`)',
      ),
      404: errors[404],
      409: errorResponse('Already accepted, already a member, or the project is archived'),
      410: errorResponse('Expired'),
    },
    handler: ({ user, params, services }) => services.members.accept(params.token, user),
  }),
];
