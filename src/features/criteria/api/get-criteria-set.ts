import { criteriaSetSchema } from '@shared/schemas/criteria';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/criteria-sets/:setId` → one version with its rows (SI) and what the caller may do. */
export const getCriteriaSet = (setId: string, signal?: AbortSignal) =>
  apiRequest(`/api/criteria-sets/${encodeURIComponent(setId)}`, criteriaSetSchema, { signal });

export const criteriaSetQueryOptions = (setId: string) =>
  queryOptions({
    queryKey: criteriaKeys.detail(setId),
    queryFn: ({ signal }) => getCriteriaSet(setId, signal),
  });

export const useCriteriaSet = (setId: string) => useQuery(criteriaSetQueryOptions(setId));
