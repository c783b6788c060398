import { projectSchema } from '@shared/schemas/project';
import { apiRequest } from '../../../lib/api';
import { projectSaved, useApiMutation } from '../../../lib/api-cache';

/** `POST /api/projects/:id/archive` or `/unarchive`. */
export const useSetProjectArchived = () =>
  useApiMutation(
    ({ id, archived }: { id: string; archived: boolean }) =>
      apiRequest(
        `/api/projects/${encodeURIComponent(id)}/${archived ? 'archive' : 'unarchive'}`,
        projectSchema,
        {
          method: 'POST',
        },
      ),
    projectSaved,
  );
