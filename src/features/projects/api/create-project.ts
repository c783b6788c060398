import { type ProjectInput, projectSchema } from '@shared/schemas/project';
import { apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { projectKeys } from '../../../lib/query-keys';

/** `POST /api/projects` → 201 Project; the creator's firm owns it and the creator becomes owner. */
export const useCreateProject = () =>
  useApiMutation(
    (input: ProjectInput) => apiRequest('/api/projects', projectSchema, { method: 'POST', body: input }),
    {
      keep: (project) => projectKeys.detail(project.id),
      stale: () => [projectKeys.lists()],
      awaitStale: true,
    },
  );
