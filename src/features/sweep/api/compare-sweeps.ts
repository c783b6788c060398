import { sweepComparisonSchema } from '@shared/schemas/sweeps';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { sweepKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/sweeps/compare?from=&to=` → two saved sweeps and what changed between them. */
export const compareSweeps = (assemblyId: string, from: string, to: string, signal?: AbortSignal) =>
  apiRequest(
    `/api/assemblies/${encodeURIComponent(assemblyId)}/sweeps/compare?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`,
    sweepComparisonSchema,
    { signal },
  );

export const sweepComparisonQueryOptions = (assemblyId: string, from: string, to: string) =>
  queryOptions({
    queryKey: sweepKeys.compare(assemblyId, from, to),
    queryFn: ({ signal }) => compareSweeps(assemblyId, from, to, signal),
  });

/** Idle until two different sweeps are picked. */
export const useSweepComparison = (assemblyId: string, from: string, to: string) =>
  useQuery({
    ...sweepComparisonQueryOptions(assemblyId, from, to),
    enabled: from !== '' && to !== '' && from !== to,
  });
