import { firmMaterials } from './firm-lists';

/** `GET /api/organisations/:orgId/materials` → the firm's own materials (SI) with their sources. */
export const firmMaterialsQueryOptions = firmMaterials.queryOptions;

/** Disabled (idle) while no firm is known. */
export const useFirmMaterials = firmMaterials.useEntries;
