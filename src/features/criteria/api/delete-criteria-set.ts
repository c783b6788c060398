import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPath, apiRequestEmpty } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `DELETE /api/criteria-sets/:setId` (firm administrators; only a version no check run used) → 204. */
export const deleteCriteriaSet = (setId: string) =>
  apiRequestEmpty(apiPath`/api/criteria-sets/${setId}`, { method: 'DELETE' });

export function useDeleteCriteriaSet() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteCriteriaSet,
    onSuccess: (_d, setId) => {
      qc.removeQueries({ queryKey: criteriaKeys.detail(setId) });
      return qc.invalidateQueries({ queryKey: criteriaKeys.lists() });
    },
  });
}
