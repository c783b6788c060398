import { invitationPreviewSchema } from '@shared/schemas/members';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { invitationKeys } from '../../../lib/query-keys';

/** `GET /api/invitations/:token` — readable without signing in. */
export const getInvitation = (token: string, signal?: AbortSignal) =>
  apiRequest(`/api/invitations/${encodeURIComponent(token)}`, invitationPreviewSchema, { signal });

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: invitationKeys.detail(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
