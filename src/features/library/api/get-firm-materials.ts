import { orgMaterialSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { libraryKeys } from '../../../lib/query-keys';
import { firmLibraryPath } from './firm-list';

const firmMaterialListSchema = z.object({ materials: z.array(orgMaterialSchema) });

/** `GET /api/organisations/:orgId/materials` → the firm's own materials (SI) with their sources. */
export const firmMaterialsQueryOptions = (orgId: string) =>
  getQuery(libraryKeys.materials(orgId), firmLibraryPath(orgId, 'materials'), firmMaterialListSchema, {
    pick: (r) => r.materials,
  });

/** Disabled (idle) while no firm is known. */
export const useFirmMaterials = (orgId: string | undefined) =>
  useQuery({ ...firmMaterialsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
