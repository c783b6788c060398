import { firmMemberSchema } from '@shared/schemas/firm-members';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { firmMemberKeys } from '../../../lib/query-keys';

const responseSchema = z.object({ members: z.array(firmMemberSchema) });

/** `GET /api/organisations/:orgId/members` → the firm's people with their firm roles. */
export const getFirmMembers = (orgId: string, signal?: AbortSignal) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/members`, responseSchema, { signal });

export const firmMembersQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: firmMemberKeys.list(orgId),
    queryFn: async ({ signal }) => (await getFirmMembers(orgId, signal)).members,
  });

export const useFirmMembers = (orgId: string | undefined) =>
  useQuery({ ...firmMembersQueryOptions(orgId ?? ''), enabled: orgId !== undefined });
