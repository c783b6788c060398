import { checkRunSchema } from '@shared/schemas/check-runs';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { checkRunKeys } from '../../../lib/query-keys';

/** `GET /api/check-runs/:runId` → one stored run with its inputs, outputs and hash (immutable). */
export const checkRunQueryOptions = (runId: string) =>
  getQuery(checkRunKeys.detail(runId), apiPath`/api/check-runs/${runId}`, checkRunSchema, {
    staleTime: Number.POSITIVE_INFINITY,
  });

/** Idle while no run is chosen. */
export const useCheckRun = (runId: string | null) =>
  useQuery({ ...checkRunQueryOptions(runId ?? ''), enabled: Boolean(runId) });
