import { checkRunListSchema } from '@shared/schemas/check-runs';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { checkRunKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id/check-runs?assemblyId=` → stored runs, newest first. */
export const getCheckRuns = (projectId: string, assemblyId: string | null, signal?: AbortSignal) =>
  apiRequest(
    `/api/projects/${encodeURIComponent(projectId)}/check-runs${assemblyId ? `?assemblyId=${encodeURIComponent(assemblyId)}` : ''}`,
    checkRunListSchema,
    { signal },
  ).then((r) => r.checkRuns);

export const checkRunsQueryOptions = (projectId: string, assemblyId: string | null) =>
  queryOptions({
    queryKey: checkRunKeys.list(projectId, assemblyId),
    queryFn: ({ signal }) => getCheckRuns(projectId, assemblyId, signal),
  });

export const useCheckRuns = (projectId: string, assemblyId: string | null) =>
  useQuery(checkRunsQueryOptions(projectId, assemblyId));
