import { criteriaDiffSchema } from '@shared/schemas/criteria';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/criteria-sets/:setId/diff?from=&to=` → rows added, removed and changed between two versions. */
export const getCriteriaDiff = (setId: string, from: number, to: number, signal?: AbortSignal) =>
  apiRequest(
    `/api/criteria-sets/${encodeURIComponent(setId)}/diff?from=${from}&to=${to}`,
    criteriaDiffSchema,
    { signal },
  );

export const criteriaDiffQueryOptions = (setId: string, from: number, to: number) =>
  queryOptions({
    queryKey: criteriaKeys.diff(setId, from, to),
    queryFn: ({ signal }) => getCriteriaDiff(setId, from, to, signal),
  });

export const useCriteriaDiff = (setId: string, from: number, to: number) =>
  useQuery(criteriaDiffQueryOptions(setId, from, to));
