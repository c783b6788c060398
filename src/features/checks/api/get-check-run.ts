import { checkRunSchema } from '@shared/schemas/check-runs';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { checkRunKeys } from '../../../lib/query-keys';

/** `GET /api/check-runs/:runId` → one stored run with its inputs, outputs and hash (immutable). */
export const getCheckRun = (runId: string, signal?: AbortSignal) =>
  apiRequest(`/api/check-runs/${encodeURIComponent(runId)}`, checkRunSchema, { signal });

export const checkRunQueryOptions = (runId: string) =>
  queryOptions({
    queryKey: checkRunKeys.detail(runId),
    queryFn: ({ signal }) => getCheckRun(runId, signal),
    staleTime: Number.POSITIVE_INFINITY,
  });

/** Idle while no run is chosen. */
export const useCheckRun = (runId: string | null) =>
  useQuery({ ...checkRunQueryOptions(runId ?? ''), enabled: Boolean(runId) });
