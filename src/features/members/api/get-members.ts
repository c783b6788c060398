import { invitationSchema, memberSchema } from '@shared/schemas/members';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { memberKeys } from '../../../lib/query-keys';
import { projectPeoplePath } from './paths';

const membersResponseSchema = z.object({
  members: z.array(memberSchema),
  invitations: z.array(invitationSchema),
});
export type MembersResponse = z.infer<typeof membersResponseSchema>;

/** `GET /api/projects/:id/members` → members and invitations. */
export const membersQueryOptions = (projectId: string) =>
  getQuery(memberKeys.list(projectId), projectPeoplePath(projectId, 'members'), membersResponseSchema);

export const useMembers = (projectId: string) => useQuery(membersQueryOptions(projectId));
