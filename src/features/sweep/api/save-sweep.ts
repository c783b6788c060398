import { type SweepSave, savedSweepSchema } from '@shared/schemas/sweeps';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { sweepKeys } from '../../../lib/query-keys';

/**
 * `POST /api/assemblies/:assemblyId/sweeps` → 201 the saved sweep: the server runs it again on the current
 * revision against the code table version (frozen by it) and keeps a summary.
 */
export const saveSweep = ({ assemblyId, body }: { assemblyId: string; body: SweepSave }) =>
  apiRequest(`/api/assemblies/${encodeURIComponent(assemblyId)}/sweeps`, savedSweepSchema, {
    method: 'POST',
    body,
  });

export function useSaveSweep() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: saveSweep,
    onSuccess: (_saved, { assemblyId }) => qc.invalidateQueries({ queryKey: sweepKeys.list(assemblyId) }),
  });
}
