import {
  bridgeValueInputSchema,
  bridgeValueSchema,
  orgMaterialInputSchema,
  orgMaterialSchema,
} from '@shared/schemas/assembly';
import { firmList } from './firm-list';

/** `…/organisations/:orgId/materials`: the firm's own materials (SI), each with its source. */
export const firmMaterials = firmList('materials', orgMaterialSchema, orgMaterialInputSchema);

/** `…/organisations/:orgId/bridge-values`: the firm's χ and ψ values, each with where it came from. */
export const bridgeValues = firmList('bridgeValues', bridgeValueSchema, bridgeValueInputSchema);
