import { bridgeValueSchema } from '@shared/schemas/assembly';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

const bridgeValueListSchema = z.object({ bridgeValues: z.array(bridgeValueSchema) });

/** `GET /api/organisations/:orgId/bridge-values` → the firm's χ and ψ values with where each came from. */
export const getBridgeValues = (orgId: string, signal?: AbortSignal) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/bridge-values`, bridgeValueListSchema, {
    signal,
  }).then((r) => r.bridgeValues);

export const bridgeValuesQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: libraryKeys.bridgeValues(orgId),
    queryFn: ({ signal }) => getBridgeValues(orgId, signal),
  });

/** Disabled (idle) while no firm is known. */
export const useBridgeValues = (orgId: string | undefined) =>
  useQuery({ ...bridgeValuesQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
