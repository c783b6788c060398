import { savedSweepListSchema, savedSweepSchema } from '@shared/schemas/sweeps';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { sweepKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/sweeps` → the assembly's saved sweeps, newest first (`stale` on each). */
export const getSavedSweeps = (assemblyId: string, signal?: AbortSignal) =>
  apiRequest(`/api/assemblies/${encodeURIComponent(assemblyId)}/sweeps`, savedSweepListSchema, {
    signal,
  }).then((r) => r.sweeps);

export const savedSweepsQueryOptions = (assemblyId: string) =>
  queryOptions({
    queryKey: sweepKeys.list(assemblyId),
    queryFn: ({ signal }) => getSavedSweeps(assemblyId, signal),
  });

export const useSavedSweeps = (assemblyId: string) => useQuery(savedSweepsQueryOptions(assemblyId));

/** `GET /api/sweeps/:sweepId` → one saved sweep: its parameters, costs and summary. */
export const getSavedSweep = (sweepId: string, signal?: AbortSignal) =>
  apiRequest(`/api/sweeps/${encodeURIComponent(sweepId)}`, savedSweepSchema, { signal });
