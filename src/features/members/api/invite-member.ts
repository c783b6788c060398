import { type InvitationInput, invitationSchema } from '@shared/schemas/members';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { auditKeys, memberKeys } from '../../../lib/query-keys';

/** `POST /api/projects/:id/invitations` → 201 Invitation; the server e-mails an accept link. */
export const inviteMember = ({ projectId, input }: { projectId: string; input: InvitationInput }) =>
  apiRequest(`/api/projects/${encodeURIComponent(projectId)}/invitations`, invitationSchema, {
    method: 'POST',
    body: input,
  });

export function useInviteMember(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationInput) => inviteMember({ projectId, input }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: memberKeys.list(projectId) });
      void qc.invalidateQueries({ queryKey: auditKeys.list(projectId) });
    },
  });
}
