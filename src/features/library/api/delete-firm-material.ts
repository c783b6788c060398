import { firmMaterials } from './firm-lists';

/** `DELETE /api/organisations/:orgId/materials/:itemId` (firm administrators) → 204. */
export const useDeleteFirmMaterial = firmMaterials.useDelete;
