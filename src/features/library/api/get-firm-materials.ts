import { orgMaterialSchema } from '@shared/schemas/assembly';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

const firmMaterialListSchema = z.object({ materials: z.array(orgMaterialSchema) });

/** `GET /api/organisations/:orgId/materials` → the firm's own materials (SI) with their sources. */
export const getFirmMaterials = (orgId: string, signal?: AbortSignal) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/materials`, firmMaterialListSchema, {
    signal,
  }).then((r) => r.materials);

export const firmMaterialsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: libraryKeys.materials(orgId),
    queryFn: ({ signal }) => getFirmMaterials(orgId, signal),
  });

/** Disabled (idle) while no firm is known. */
export const useFirmMaterials = (orgId: string | undefined) =>
  useQuery({ ...firmMaterialsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
