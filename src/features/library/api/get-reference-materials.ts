import { materialSchema } from '@shared/calc/thermal/materials';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { libraryKeys } from '../../../lib/query-keys';

const referenceListSchema = z.object({ materials: z.array(materialSchema) });

/** `GET /api/reference/materials` → the generic library (λ, ρ, μ) with the table each value comes from. */
export const referenceMaterialsQueryOptions = () =>
  getQuery(libraryKeys.reference(), '/api/reference/materials', referenceListSchema, {
    pick: (r) => r.materials,
    // Shipped with the release; it does not change while the app is open.
    staleTime: Number.POSITIVE_INFINITY,
  });

export const useReferenceMaterials = () => useQuery(referenceMaterialsQueryOptions());
