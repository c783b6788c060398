import { type CriteriaSetCreate, criteriaSetSchema } from '@shared/schemas/criteria';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** `POST /api/organisations/:orgId/criteria-sets` → 201 the new table (version 1). */
export const useCreateCriteriaSet = () =>
  useApiMutation(
    ({ orgId, input }: { orgId: string; input: Partial<CriteriaSetCreate> }) =>
      apiRequest(apiPath`/api/organisations/${orgId}/criteria-sets`, criteriaSetSchema, {
        method: 'POST',
        body: input,
      }),
    { keep: (set) => criteriaKeys.detail(set.id), stale: () => [criteriaKeys.lists()], awaitStale: true },
  );
