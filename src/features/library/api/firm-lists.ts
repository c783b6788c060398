import {
  bridgeValueInputSchema,
  bridgeValueSchema,
  orgMaterialInputSchema,
  orgMaterialSchema,
} from '@shared/schemas/assembly';
import type { z } from 'zod';
import { firmList } from './firm-list';

/** `…/organisations/:orgId/materials`: the firm's own materials (SI), each with its source. */
export const firmMaterials = firmList('materials', orgMaterialSchema, orgMaterialInputSchema);

/** `…/organisations/:orgId/bridge-values`: the firm's χ and ψ values, each with where it came from. */
export const bridgeValues = firmList('bridgeValues', bridgeValueSchema, bridgeValueInputSchema);

/** `GET /api/organisations/:orgId/materials` → the firm's own materials (SI) with their sources. */
export const firmMaterialsQueryOptions = firmMaterials.queryOptions;

/** Disabled (idle) while no firm is known. */
export const useFirmMaterials = firmMaterials.useEntries;

export type FirmMaterialInput = z.infer<typeof orgMaterialInputSchema>;

/** `POST /api/organisations/:orgId/materials` → 201 the material (a source is required). */
export const useAddFirmMaterial = firmMaterials.useAdd;

/** `DELETE /api/organisations/:orgId/materials/:itemId` (firm administrators) → 204. */
export const useDeleteFirmMaterial = firmMaterials.useDelete;

/** `GET /api/organisations/:orgId/bridge-values` → the firm's χ and ψ values with where each came from. */
export const bridgeValuesQueryOptions = bridgeValues.queryOptions;

/** Disabled (idle) while no firm is known. */
export const useBridgeValues = bridgeValues.useEntries;

export type BridgeValueInput = z.input<typeof bridgeValueInputSchema>;

/** `POST /api/organisations/:orgId/bridge-values` → 201 the χ or ψ value (a source is required). */
export const useAddBridgeValue = bridgeValues.useAdd;

/** `DELETE /api/organisations/:orgId/bridge-values/:itemId` (firm administrators) → 204. */
export const useDeleteBridgeValue = bridgeValues.useDelete;
