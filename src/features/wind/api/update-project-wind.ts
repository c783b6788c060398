import { type Project, type ProjectWind, projectSchema } from '@shared/schemas/project';
import { apiPath, apiRequest, currentOnConflict } from '../../../lib/api';
import { projectSaved, useApiMutation } from '../../../lib/api-cache';

/**
 * `PUT /api/projects/:id/wind` `{version, wind}` → the project at its new version. On a conflict the cache is
 * not replaced: the form still holds the person's edits and asks first.
 */
export const useUpdateProjectWind = () =>
  useApiMutation(
    ({ id, ...body }: { id: string; version: number; wind: ProjectWind }) =>
      apiRequest(apiPath`/api/projects/${id}/wind`, projectSchema, { method: 'PUT', body }),
    projectSaved,
  );

/** On a 409 `version_conflict` the server sends the project as it now stands; null for any other error. */
export const conflictingProjectWind = (error: unknown): Project | null =>
  currentOnConflict(error, projectSchema);
