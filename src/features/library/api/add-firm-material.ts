import type { orgMaterialInputSchema } from '@shared/schemas/assembly';
import type { z } from 'zod';
import { firmMaterials } from './firm-lists';

export type FirmMaterialInput = z.infer<typeof orgMaterialInputSchema>;

/** `POST /api/organisations/:orgId/materials` → 201 the material (a source is required). */
export const useAddFirmMaterial = firmMaterials.useAdd;
