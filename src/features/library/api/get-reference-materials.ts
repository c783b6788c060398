import { materialSchema } from '@shared/calc/thermal/materials';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

const referenceListSchema = z.object({ materials: z.array(materialSchema) });

/** `GET /api/reference/materials` → the generic library (λ, ρ, μ) with the table each value comes from. */
export const getReferenceMaterials = (signal?: AbortSignal) =>
  apiRequest('/api/reference/materials', referenceListSchema, { signal }).then((r) => r.materials);

export const referenceMaterialsQueryOptions = () =>
  queryOptions({
    queryKey: libraryKeys.reference(),
    queryFn: ({ signal }) => getReferenceMaterials(signal),
    // Shipped with the release; it does not change while the app is open.
    staleTime: Number.POSITIVE_INFINITY,
  });

export const useReferenceMaterials = () => useQuery(referenceMaterialsQueryOptions());
