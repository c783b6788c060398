import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestEmpty } from '../../../lib/api';
import { auditKeys, memberKeys, projectKeys } from '../../../lib/query-keys';

/** `DELETE /api/projects/:id/members/:memberId` → 204. */
export const removeMember = ({ projectId, memberId }: { projectId: string; memberId: string }) =>
  apiRequestEmpty(`/api/projects/${encodeURIComponent(projectId)}/members/${encodeURIComponent(memberId)}`, {
    method: 'DELETE',
  });

export function useRemoveMember(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (memberId: string) => removeMember({ projectId, memberId }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: memberKeys.list(projectId) });
      void qc.invalidateQueries({ queryKey: auditKeys.list(projectId) });
      void qc.invalidateQueries({ queryKey: projectKeys.all });
    },
  });
}
