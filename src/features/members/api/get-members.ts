import { invitationSchema, memberSchema } from '@shared/schemas/members';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { memberKeys } from '../../../lib/query-keys';

const membersResponseSchema = z.object({
  members: z.array(memberSchema),
  invitations: z.array(invitationSchema),
});
export type MembersResponse = z.infer<typeof membersResponseSchema>;

/** `GET /api/projects/:id/members` → members and invitations. */
export const getMembers = (projectId: string, signal?: AbortSignal) =>
  apiRequest(`/api/projects/${encodeURIComponent(projectId)}/members`, membersResponseSchema, { signal });

export const membersQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: memberKeys.list(projectId),
    queryFn: ({ signal }) => getMembers(projectId, signal),
  });

export const useMembers = (projectId: string) => useQuery(membersQueryOptions(projectId));
