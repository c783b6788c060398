import { type BridgeValue, type bridgeValueInputSchema, bridgeValueSchema } from '@shared/schemas/assembly';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

export type BridgeValueInput = z.input<typeof bridgeValueInputSchema>;

/** `POST /api/organisations/:orgId/bridge-values` → 201 the χ or ψ value (a source is required). */
export const addBridgeValue = ({ orgId, input }: { orgId: string; input: BridgeValueInput }) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/bridge-values`, bridgeValueSchema, {
    method: 'POST',
    body: input,
  });

export function useAddBridgeValue() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: addBridgeValue,
    onSuccess: (value: BridgeValue, { orgId }) => {
      qc.setQueryData<BridgeValue[]>(libraryKeys.bridgeValues(orgId), (list) =>
        list ? [...list, value] : list,
      );
      return qc.invalidateQueries({ queryKey: libraryKeys.bridgeValues(orgId) });
    },
  });
}
