import { type Project, type ProjectInput, projectSchema } from '@shared/schemas/project';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest, currentOnConflict } from '../../../lib/api';
import { auditKeys, projectKeys } from '../../../lib/query-keys';

/** `PUT /api/projects/:id` with the version the edit was based on. */
export const updateProject = ({
  id,
  version,
  changes,
}: {
  id: string;
  version: number;
  changes: ProjectInput;
}) =>
  apiRequest(`/api/projects/${encodeURIComponent(id)}`, projectSchema, {
    method: 'PUT',
    body: { version, changes },
  });

/** On a 409 `version_conflict`, the server sends the project as it now stands; null for any other error. */
export const conflictingProject = (error: unknown): Project | null => currentOnConflict(error, projectSchema);

export function useUpdateProject() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateProject,
    onSuccess: (project) => {
      qc.setQueryData(projectKeys.detail(project.id), project);
      void qc.invalidateQueries({ queryKey: projectKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.list(project.id) });
    },
    onError: (error) => {
      // Someone else saved first: show their version wherever the project is displayed.
      const current = conflictingProject(error);
      if (current) qc.setQueryData(projectKeys.detail(current.id), current);
    },
  });
}
