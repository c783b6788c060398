import { type SubmittalStatus, submittalListSchema } from '@shared/schemas/submittals';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { submittalKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id/submittals?status=` → the latest revision of each submittal. */
export const submittalsQueryOptions = (projectId: string, status: SubmittalStatus | null) =>
  getQuery(
    submittalKeys.list(projectId, { status }),
    apiPath`/api/projects/${projectId}/submittals` + (status ? `?status=${status}` : ''),
    submittalListSchema,
    { pick: (r) => r.submittals, placeholderData: keepPreviousData },
  );

export const useSubmittals = (projectId: string, status: SubmittalStatus | null) =>
  useQuery(submittalsQueryOptions(projectId, status));
