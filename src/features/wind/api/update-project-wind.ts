import { type Project, type ProjectWind, projectSchema } from '@shared/schemas/project';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest, currentOnConflict } from '../../../lib/api';
import { auditKeys, projectKeys } from '../../../lib/query-keys';

/** `PUT /api/projects/:id/wind` `{version, wind}` → the project at its new version. */
export const updateProjectWind = ({
  id,
  version,
  wind,
}: {
  id: string;
  version: number;
  wind: ProjectWind;
}) =>
  apiRequest(`/api/projects/${encodeURIComponent(id)}/wind`, projectSchema, {
    method: 'PUT',
    body: { version, wind },
  });

/** On a 409 `version_conflict` the server sends the project as it now stands; null for any other error. */
export const conflictingProjectWind = (error: unknown): Project | null =>
  currentOnConflict(error, projectSchema);

export function useUpdateProjectWind() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateProjectWind,
    onSuccess: (project) => {
      qc.setQueryData(projectKeys.detail(project.id), project);
      void qc.invalidateQueries({ queryKey: projectKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.list(project.id) });
    },
    // On a conflict the cache is not replaced here: the form still holds the person's edits and asks first.
  });
}
