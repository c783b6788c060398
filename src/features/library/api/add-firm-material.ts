import { type OrgMaterial, type orgMaterialInputSchema, orgMaterialSchema } from '@shared/schemas/assembly';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

export type FirmMaterialInput = z.infer<typeof orgMaterialInputSchema>;

/** `POST /api/organisations/:orgId/materials` → 201 the material (a source is required). */
export const addFirmMaterial = ({ orgId, input }: { orgId: string; input: FirmMaterialInput }) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/materials`, orgMaterialSchema, {
    method: 'POST',
    body: input,
  });

export function useAddFirmMaterial() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: addFirmMaterial,
    onSuccess: (material: OrgMaterial, { orgId }) => {
      qc.setQueryData<OrgMaterial[]>(libraryKeys.materials(orgId), (list) =>
        list ? [...list, material] : list,
      );
      return qc.invalidateQueries({ queryKey: libraryKeys.materials(orgId) });
    },
  });
}
