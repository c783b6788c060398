import { libraryKeys } from '../../../lib/query-keys';
import { useDeleteFromFirmList } from './firm-list';

/** `DELETE /api/organisations/:orgId/materials/:itemId` (firm administrators) → 204. */
export const useDeleteFirmMaterial = () => useDeleteFromFirmList('materials', libraryKeys.materials);
