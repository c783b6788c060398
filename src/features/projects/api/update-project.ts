import { type Project, type ProjectInput, projectSchema } from '@shared/schemas/project';
import { apiPath, apiRequest, currentOnConflict } from '../../../lib/api';
import { projectSaved, useApiMutation } from '../../../lib/api-cache';

/** On a 409 `version_conflict`, the server sends the project as it now stands; null for any other error. */
export const conflictingProject = (error: unknown): Project | null => currentOnConflict(error, projectSchema);

/**
 * `PUT /api/projects/:id` with the version the edit was based on. Someone else saved first: their version is
 * shown wherever the project is displayed.
 */
export const useUpdateProject = () =>
  useApiMutation(
    ({ id, ...body }: { id: string; version: number; changes: ProjectInput }) =>
      apiRequest(apiPath`/api/projects/${id}`, projectSchema, { method: 'PUT', body }),
    { ...projectSaved, conflict: conflictingProject },
  );
