import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestEmpty } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

/** `DELETE /api/organisations/:orgId/materials/:itemId` (firm administrators) → 204. */
export const deleteFirmMaterial = ({ orgId, itemId }: { orgId: string; itemId: string }) =>
  apiRequestEmpty(`/api/organisations/${encodeURIComponent(orgId)}/materials/${encodeURIComponent(itemId)}`, {
    method: 'DELETE',
  });

export function useDeleteFirmMaterial() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteFirmMaterial,
    onSuccess: (_data, { orgId }) => qc.invalidateQueries({ queryKey: libraryKeys.materials(orgId) }),
  });
}
