import { bridgeValueSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { libraryKeys } from '../../../lib/query-keys';
import { firmLibraryPath } from './firm-list';

const bridgeValueListSchema = z.object({ bridgeValues: z.array(bridgeValueSchema) });

/** `GET /api/organisations/:orgId/bridge-values` → the firm's χ and ψ values with where each came from. */
export const bridgeValuesQueryOptions = (orgId: string) =>
  getQuery(libraryKeys.bridgeValues(orgId), firmLibraryPath(orgId, 'bridge-values'), bridgeValueListSchema, {
    pick: (r) => r.bridgeValues,
  });

/** Disabled (idle) while no firm is known. */
export const useBridgeValues = (orgId: string | undefined) =>
  useQuery({ ...bridgeValuesQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
