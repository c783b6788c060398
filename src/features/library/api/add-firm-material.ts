import { type orgMaterialInputSchema, orgMaterialSchema } from '@shared/schemas/assembly';
import type { z } from 'zod';
import { libraryKeys } from '../../../lib/query-keys';
import { useAddToFirmList } from './firm-list';

export type FirmMaterialInput = z.infer<typeof orgMaterialInputSchema>;

/** `POST /api/organisations/:orgId/materials` → 201 the material (a source is required). */
export const useAddFirmMaterial = () =>
  useAddToFirmList<typeof orgMaterialSchema, FirmMaterialInput>(
    'materials',
    orgMaterialSchema,
    libraryKeys.materials,
  );
