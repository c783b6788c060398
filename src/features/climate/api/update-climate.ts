import { type Project, type ProjectClimate, projectSchema } from '@shared/schemas/project';
import { apiPath, apiRequest, currentOnConflict } from '../../../lib/api';
import { projectSaved, useApiMutation } from '../../../lib/api-cache';

/**
 * `PUT /api/projects/:id/climate` `{version, climate}` → the project at its new version. On a conflict the
 * cache is not replaced: the editor still holds the person's entries and lets them carry the entries over or
 * load the saved climate.
 */
export const useUpdateClimate = () =>
  useApiMutation(
    ({ id, ...body }: { id: string; version: number; climate: ProjectClimate }) =>
      apiRequest(apiPath`/api/projects/${id}/climate`, projectSchema, { method: 'PUT', body }),
    projectSaved,
  );

/** On a 409 `version_conflict` the server sends the project as it now stands; null for any other error. */
export const conflictingProject = (error: unknown): Project | null => currentOnConflict(error, projectSchema);
