import { apiPath } from '../../../lib/api';

/** The firm's people (server/routes/firm-members.ts): the list, or one of them. */
export const firmMembersPath = (orgId: string, userId?: string) =>
  apiPath`/api/organisations/${orgId}/members` + (userId ? apiPath`/${userId}` : '');
