import { criteriaVersionListSchema } from '@shared/schemas/criteria';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/criteria-sets/:setId/versions` → every version of the table, newest first. */
export const getCriteriaVersions = (setId: string, signal?: AbortSignal) =>
  apiRequest(`/api/criteria-sets/${encodeURIComponent(setId)}/versions`, criteriaVersionListSchema, {
    signal,
  }).then((r) => r.versions);

export const criteriaVersionsQueryOptions = (setId: string) =>
  queryOptions({
    queryKey: criteriaKeys.versions(setId),
    queryFn: ({ signal }) => getCriteriaVersions(setId, signal),
  });

export const useCriteriaVersions = (setId: string) => useQuery(criteriaVersionsQueryOptions(setId));
