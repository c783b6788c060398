import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { invitationKeys, projectKeys } from '../../../lib/query-keys';

const acceptedSchema = z.object({ projectId: z.uuid() });

/** `POST /api/invitations/:token/accept` → `{ projectId }`; 403 unless signed in with the invited address. */
export const acceptInvitation = (token: string) =>
  apiRequest(`/api/invitations/${encodeURIComponent(token)}/accept`, acceptedSchema, { method: 'POST' });

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => acceptInvitation(token),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: projectKeys.lists() });
      void qc.invalidateQueries({ queryKey: invitationKeys.detail(token) });
    },
  });
}
