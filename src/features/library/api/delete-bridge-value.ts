import { libraryKeys } from '../../../lib/query-keys';
import { useDeleteFromFirmList } from './firm-list';

/** `DELETE /api/organisations/:orgId/bridge-values/:itemId` (firm administrators) → 204. */
export const useDeleteBridgeValue = () => useDeleteFromFirmList('bridge-values', libraryKeys.bridgeValues);
