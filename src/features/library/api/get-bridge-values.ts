import { bridgeValues } from './firm-lists';

/** `GET /api/organisations/:orgId/bridge-values` → the firm's χ and ψ values with where each came from. */
export const bridgeValuesQueryOptions = bridgeValues.queryOptions;

/** Disabled (idle) while no firm is known. */
export const useBridgeValues = bridgeValues.useEntries;
