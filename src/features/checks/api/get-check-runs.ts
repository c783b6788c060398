import { checkRunListSchema } from '@shared/schemas/check-runs';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { checkRunKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id/check-runs?assemblyId=` → stored runs, newest first. */
export const checkRunsQueryOptions = (projectId: string, assemblyId: string | null) =>
  getQuery(
    checkRunKeys.list(projectId, assemblyId),
    apiPath`/api/projects/${projectId}/check-runs` + (assemblyId ? apiPath`?assemblyId=${assemblyId}` : ''),
    checkRunListSchema,
    { pick: (r) => r.checkRuns },
  );

export const useCheckRuns = (projectId: string, assemblyId: string | null) =>
  useQuery(checkRunsQueryOptions(projectId, assemblyId));
