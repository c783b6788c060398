import { checkRunSchema } from '@shared/schemas/check-runs';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { auditKeys, checkRunKeys, criteriaKeys } from '../../../lib/query-keys';

/** `POST /api/assemblies/:assemblyId/check-runs` `{ criteriaSetId }` → 201 the stored run. */
export const runCheck = ({ assemblyId, criteriaSetId }: { assemblyId: string; criteriaSetId: string }) =>
  apiRequest(`/api/assemblies/${encodeURIComponent(assemblyId)}/check-runs`, checkRunSchema, {
    method: 'POST',
    body: { criteriaSetId },
  });

export function useRunCheck() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: runCheck,
    onSuccess: (run) => {
      qc.setQueryData(checkRunKeys.detail(run.id), run);
      void qc.invalidateQueries({ queryKey: checkRunKeys.lists() });
      // The table version it used is frozen now.
      void qc.invalidateQueries({ queryKey: criteriaKeys.all });
      void qc.invalidateQueries({ queryKey: auditKeys.list(run.projectId) });
    },
  });
}
