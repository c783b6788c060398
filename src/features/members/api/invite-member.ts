import { type InvitationInput, invitationSchema } from '@shared/schemas/members';
import { apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { auditKeys, memberKeys } from '../../../lib/query-keys';
import { projectPeoplePath } from './paths';

/** `POST /api/projects/:id/invitations` → 201 Invitation; the server e-mails an accept link. */
export const useInviteMember = (projectId: string) =>
  useApiMutation(
    (input: InvitationInput) =>
      apiRequest(projectPeoplePath(projectId, 'invitations'), invitationSchema, {
        method: 'POST',
        body: input,
      }),
    { stale: () => [memberKeys.list(projectId), auditKeys.list(projectId)] },
  );
