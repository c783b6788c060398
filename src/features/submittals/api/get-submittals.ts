import { type SubmittalStatus, submittalListSchema } from '@shared/schemas/submittals';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { submittalKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id/submittals?status=` → the latest revision of each submittal. */
export const getSubmittals = (projectId: string, status: SubmittalStatus | null, signal?: AbortSignal) =>
  apiRequest(
    `/api/projects/${encodeURIComponent(projectId)}/submittals${status ? `?status=${status}` : ''}`,
    submittalListSchema,
    { signal },
  ).then((r) => r.submittals);

export const submittalsQueryOptions = (projectId: string, status: SubmittalStatus | null) =>
  queryOptions({
    queryKey: submittalKeys.list(projectId, { status }),
    queryFn: ({ signal }) => getSubmittals(projectId, status, signal),
    placeholderData: keepPreviousData,
  });

export const useSubmittals = (projectId: string, status: SubmittalStatus | null) =>
  useQuery(submittalsQueryOptions(projectId, status));
