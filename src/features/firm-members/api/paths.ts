/** The firm's people (server/routes/firm-members.ts): the list, or one of them. */
export const firmMembersPath = (orgId: string, userId?: string) =>
  `/api/organisations/${encodeURIComponent(orgId)}/members${userId ? `/${encodeURIComponent(userId)}` : ''}`;
