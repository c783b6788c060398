import { invitationPreviewSchema } from '@shared/schemas/members';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { invitationKeys } from '../../../lib/query-keys';

/** `GET /api/invitations/:token` — readable without signing in. */
export const invitationQueryOptions = (token: string) =>
  getQuery(invitationKeys.detail(token), apiPath`/api/invitations/${token}`, invitationPreviewSchema);

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
