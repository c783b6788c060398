import { bridgeValues } from './firm-lists';

/** `DELETE /api/organisations/:orgId/bridge-values/:itemId` (firm administrators) → 204. */
export const useDeleteBridgeValue = bridgeValues.useDelete;
