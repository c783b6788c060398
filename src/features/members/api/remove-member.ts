import { apiRequestEmpty } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { auditKeys, memberKeys, projectKeys } from '../../../lib/query-keys';
import { projectPeoplePath } from './paths';

/** `DELETE /api/projects/:id/members/:memberId` → 204. */
export const useRemoveMember = (projectId: string) =>
  useApiMutation(
    (memberId: string) =>
      apiRequestEmpty(projectPeoplePath(projectId, 'members', memberId), { method: 'DELETE' }),
    { stale: () => [memberKeys.list(projectId), auditKeys.list(projectId), projectKeys.all] },
  );
