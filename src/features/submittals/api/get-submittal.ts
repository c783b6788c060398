import { submittalSchema } from '@shared/schemas/submittals';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { submittalKeys } from '../../../lib/query-keys';

/** `GET /api/submittals/:submittalId` → one revision with items, reviewers, comments and its chain. */
export const getSubmittal = (submittalId: string, signal?: AbortSignal) =>
  apiRequest(`/api/submittals/${encodeURIComponent(submittalId)}`, submittalSchema, { signal });

export const submittalQueryOptions = (submittalId: string) =>
  queryOptions({
    queryKey: submittalKeys.detail(submittalId),
    queryFn: ({ signal }) => getSubmittal(submittalId, signal),
  });

export const useSubmittal = (submittalId: string) => useQuery(submittalQueryOptions(submittalId));
