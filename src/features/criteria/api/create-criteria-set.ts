import { type CriteriaSetCreate, criteriaSetSchema } from '@shared/schemas/criteria';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `POST /api/organisations/:orgId/criteria-sets` → 201 the new table (version 1). */
export const createCriteriaSet = ({ orgId, input }: { orgId: string; input: Partial<CriteriaSetCreate> }) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/criteria-sets`, criteriaSetSchema, {
    method: 'POST',
    body: input,
  });

export function useCreateCriteriaSet() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createCriteriaSet,
    onSuccess: (set) => {
      qc.setQueryData(criteriaKeys.detail(set.id), set);
      return qc.invalidateQueries({ queryKey: criteriaKeys.lists() });
    },
  });
}
