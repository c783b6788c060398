import { projectSchema } from '@shared/schemas/project';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { auditKeys, projectKeys } from '../../../lib/query-keys';

/** `POST /api/projects/:id/archive` or `/unarchive`. */
export const setProjectArchived = ({ id, archived }: { id: string; archived: boolean }) =>
  apiRequest(`/api/projects/${encodeURIComponent(id)}/${archived ? 'archive' : 'unarchive'}`, projectSchema, {
    method: 'POST',
  });

export function useSetProjectArchived() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: setProjectArchived,
    onSuccess: (project) => {
      qc.setQueryData(projectKeys.detail(project.id), project);
      void qc.invalidateQueries({ queryKey: projectKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.list(project.id) });
    },
  });
}
