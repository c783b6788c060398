import { projectSchema } from '@shared/schemas/project';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { projectKeys } from '../../../lib/query-keys';

/** `POST /api/projects/:id/duplicate` `{ name, number }` → 201 the copy, with the caller as its only member (owner). */
export const useDuplicateProject = () =>
  useApiMutation(
    ({ id, ...body }: { id: string; name: string; number: string }) =>
      apiRequest(apiPath`/api/projects/${id}/duplicate`, projectSchema, {
        method: 'POST',
        body,
      }),
    { keep: (project) => projectKeys.detail(project.id), stale: () => [projectKeys.lists()] },
  );
