import { z } from 'zod';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { invitationKeys, projectKeys } from '../../../lib/query-keys';

const acceptedSchema = z.object({ projectId: z.uuid() });

/** `POST /api/invitations/:token/accept` → `{ projectId }`; 403 unless signed in with the invited address. */
export const useAcceptInvitation = (token: string) =>
  useApiMutation(
    () => apiRequest(apiPath`/api/invitations/${token}/accept`, acceptedSchema, { method: 'POST' }),
    { stale: () => [projectKeys.lists(), invitationKeys.detail(token)] },
  );
