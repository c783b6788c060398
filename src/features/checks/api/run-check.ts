import { checkRunSchema } from '@shared/schemas/check-runs';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { auditKeys, checkRunKeys, criteriaKeys } from '../../../lib/query-keys';

/** `POST /api/assemblies/:assemblyId/check-runs` `{ criteriaSetId }` → 201 the stored run. */
export const useRunCheck = () =>
  useApiMutation(
    ({ assemblyId, ...body }: { assemblyId: string; criteriaSetId: string }) =>
      apiRequest(apiPath`/api/assemblies/${assemblyId}/check-runs`, checkRunSchema, {
        method: 'POST',
        body,
      }),
    {
      keep: (run) => checkRunKeys.detail(run.id),
      // The table version it used is frozen now.
      stale: (run) => [checkRunKeys.lists(), criteriaKeys.all, auditKeys.list(run.projectId)],
    },
  );
