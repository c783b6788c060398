import type { ProjectRole } from '@shared/auth/permissions';
import { memberSchema } from '@shared/schemas/members';
import { apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { auditKeys, memberKeys, projectKeys } from '../../../lib/query-keys';
import { projectPeoplePath } from './paths';

/** `PUT /api/projects/:id/members/:memberId` `{ role }` → Member. */
export const useUpdateMemberRole = (projectId: string) =>
  useApiMutation(
    ({ memberId, role }: { memberId: string; role: ProjectRole }) =>
      apiRequest(projectPeoplePath(projectId, 'members', memberId), memberSchema, {
        method: 'PUT',
        body: { role },
      }),
    // One's own role may have changed, and with it what the project pages show.
    { stale: () => [memberKeys.list(projectId), auditKeys.list(projectId), projectKeys.detail(projectId)] },
  );
