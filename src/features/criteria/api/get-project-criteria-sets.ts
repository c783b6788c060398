import { criteriaSetListSchema } from '@shared/schemas/criteria';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id/criteria-sets` → the tables a project member may check against. */
export const getProjectCriteriaSets = (projectId: string, signal?: AbortSignal) =>
  apiRequest(`/api/projects/${encodeURIComponent(projectId)}/criteria-sets`, criteriaSetListSchema, {
    signal,
  }).then((r) => r.criteriaSets);

export const projectCriteriaSetsQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: criteriaKeys.forProject(projectId),
    queryFn: ({ signal }) => getProjectCriteriaSets(projectId, signal),
  });

export const useProjectCriteriaSets = (projectId: string) =>
  useQuery(projectCriteriaSetsQueryOptions(projectId));
