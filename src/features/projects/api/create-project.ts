import { type ProjectInput, projectSchema } from '@shared/schemas/project';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { projectKeys } from '../../../lib/query-keys';

/** `POST /api/projects` → 201 Project; the creator's firm owns it and the creator becomes owner. */
export const createProject = (input: ProjectInput) =>
  apiRequest('/api/projects', projectSchema, { method: 'POST', body: input });

export function useCreateProject() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: (project) => {
      qc.setQueryData(projectKeys.detail(project.id), project);
      return qc.invalidateQueries({ queryKey: projectKeys.lists() });
    },
  });
}
