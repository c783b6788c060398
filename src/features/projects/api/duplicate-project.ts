import { projectSchema } from '@shared/schemas/project';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { projectKeys } from '../../../lib/query-keys';

/** `POST /api/projects/:id/duplicate` → 201 the copy, with the caller as its only member (owner). */
export const duplicateProject = ({ id, name, number }: { id: string; name: string; number: string }) =>
  apiRequest(`/api/projects/${encodeURIComponent(id)}/duplicate`, projectSchema, {
    method: 'POST',
    body: { name, number },
  });

export function useDuplicateProject() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: duplicateProject,
    onSuccess: (project) => {
      qc.setQueryData(projectKeys.detail(project.id), project);
      void qc.invalidateQueries({ queryKey: projectKeys.lists() });
    },
  });
}
