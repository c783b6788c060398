import { can } from '@shared/auth/permissions';
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
import { anyone, member, routeGroup, signedIn } from '../http/route-group';

const errors = refusals('project', 'project, member or invitation', {
  invalid: false,
  forbidden:
    'Your role does not allow this, or does not allow granting that role (`role_not_grantable`: see `mayGrant` in shared/auth)',
});
const route = routeGroup('Members', errors);
/** Invitations as seen by the invited: their own refusals. */
const invited = routeGroup('Members');
// Taking someone's access away (or narrowing it) stays possible on an archived project.
const managing = member('members.manage', { whenArchived: 'allow' });

export const memberRoutes = [
  route.get('/projects/:projectId/members', member('members.read'), {
    summary: 'Members and pending invitations',
    responses: {
      200: {
        description: 'Members',
        schema: z.object({ members: z.array(memberSchema), invitations: z.array(invitationSchema) }),
      },
    },
    handler: async ({ project, services }) => {
      const { members, invitations } = await services.members.list(project.id);
      // Pending invitations (addresses of people not yet on the project) only for those who may invite.
      return { members, invitations: can(project.role, 'members.invite') ? invitations : [] };
    },
  }),
  route.post('/projects/:projectId/invitations', member('members.invite'), {
    summary: 'Invite someone by e-mail with a role on this project',
    body: invitationInputSchema,
    example: { email: 'engineer@example.com', role: 'engineer' },
    responses: {
      201: {
        description: 'The invitation (an e-mail with the accept link was sent)',
        schema: invitationSchema,
      },
      409: errorResponse('Already a member, or the project is archived'),
    },
    handler: ({ user, project, body, services }) =>
      services.members.invite(project.id, { ...user, role: project.role }, body),
  }),
  route.put('/projects/:projectId/members/:memberId', managing, {
    summary: 'Change a member’s role',
    body: memberRoleUpdateSchema,
    responses: {
      200: { description: 'The member', schema: memberSchema },
      409: errorResponse('Would leave the project without an owner'),
    },
    handler: ({ user, project, params, body, services }) =>
      services.members.setRole(project.id, params.memberId, body.role, {
        id: user.id,
        role: project.role,
      }),
  }),
  route.delete('/projects/:projectId/members/:memberId', managing, {
    summary: 'Remove a member from the project',
    responses: {
      204: { description: 'Removed' },
      409: errorResponse('Last owner'),
    },
    handler: async ({ user, project, params, services }) => {
      await services.members.remove(project.id, params.memberId, { id: user.id, role: project.role });
      return undefined;
    },
  }),
  invited.get('/invitations/:token', anyone, {
    summary: 'What an invitation offers (no sign-in needed)',
    params: invitationTokenParam,
    responses: {
      200: { description: 'Invitation preview', schema: invitationPreviewSchema },
      404: errors[404],
    },
    handler: ({ params, services }) => services.members.preview(params.token),
  }),
  invited.post('/invitations/:token/accept', signedIn, {
    summary: 'Accept an invitation (signed in with the invited address)',
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
