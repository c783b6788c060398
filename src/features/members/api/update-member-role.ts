import type { ProjectRole } from '@shared/auth/permissions';
import { memberSchema } from '@shared/schemas/members';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { auditKeys, memberKeys, projectKeys } from '../../../lib/query-keys';

/** `PUT /api/projects/:id/members/:memberId` `{ role }` → Member. */
export const updateMemberRole = ({
  projectId,
  memberId,
  role,
}: {
  projectId: string;
  memberId: string;
  role: ProjectRole;
}) =>
  apiRequest(
    `/api/projects/${encodeURIComponent(projectId)}/members/${encodeURIComponent(memberId)}`,
    memberSchema,
    { method: 'PUT', body: { role } },
  );

export function useUpdateMemberRole(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { memberId: string; role: ProjectRole }) => updateMemberRole({ projectId, ...v }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: memberKeys.list(projectId) });
      void qc.invalidateQueries({ queryKey: auditKeys.list(projectId) });
      // One's own role may have changed, and with it what the project pages show.
      void qc.invalidateQueries({ queryKey: projectKeys.detail(projectId) });
    },
  });
}
