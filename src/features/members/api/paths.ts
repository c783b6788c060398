/** A project's people (server/routes/members.ts): `members` or `invitations`, or one member. */
export const projectPeoplePath = (projectId: string, list: 'members' | 'invitations', memberId?: string) =>
  `/api/projects/${encodeURIComponent(projectId)}/${list}${memberId ? `/${encodeURIComponent(memberId)}` : ''}`;
