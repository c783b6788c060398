import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestEmpty } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

/** `DELETE /api/organisations/:orgId/bridge-values/:itemId` (firm administrators) → 204. */
export const deleteBridgeValue = ({ orgId, itemId }: { orgId: string; itemId: string }) =>
  apiRequestEmpty(
    `/api/organisations/${encodeURIComponent(orgId)}/bridge-values/${encodeURIComponent(itemId)}`,
    { method: 'DELETE' },
  );

export function useDeleteBridgeValue() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteBridgeValue,
    onSuccess: (_data, { orgId }) => qc.invalidateQueries({ queryKey: libraryKeys.bridgeValues(orgId) }),
  });
}
