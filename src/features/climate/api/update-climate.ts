import { type Project, type ProjectClimate, projectSchema } from '@shared/schemas/project';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest, currentOnConflict } from '../../../lib/api';
import { auditKeys, projectKeys } from '../../../lib/query-keys';

/** `PUT /api/projects/:id/climate` `{version, climate}` → the project at its new version. */
export const updateClimate = ({
  id,
  version,
  climate,
}: {
  id: string;
  version: number;
  climate: ProjectClimate;
}) =>
  apiRequest(`/api/projects/${encodeURIComponent(id)}/climate`, projectSchema, {
    method: 'PUT',
    body: { version, climate },
  });

/** On a 409 `version_conflict` the server sends the project as it now stands; null for any other error. */
export const conflictingProject = (error: unknown): Project | null => currentOnConflict(error, projectSchema);

export function useUpdateClimate() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateClimate,
    onSuccess: (project) => {
      qc.setQueryData(projectKeys.detail(project.id), project);
      void qc.invalidateQueries({ queryKey: projectKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.list(project.id) });
    },
    // On a conflict the cache is not replaced here: the editor still holds the person's entries and lets
    // them carry the entries over or load the saved climate.
  });
}
