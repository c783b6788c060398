import { orgMaterialSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { libraryKeys } from '../../../lib/query-keys';
import { firmListQuery } from './firm-list';

/** `GET /api/organisations/:orgId/materials` → the firm's own materials (SI) with their sources. */
export const firmMaterialsQueryOptions = firmListQuery(
  'materials',
  libraryKeys.materials,
  z.object({ materials: z.array(orgMaterialSchema) }),
  (r) => r.materials,
);

/** Disabled (idle) while no firm is known. */
export const useFirmMaterials = (orgId: string | undefined) =>
  useQuery({ ...firmMaterialsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
