import { criteriaSetListSchema } from '@shared/schemas/criteria';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/organisations/:orgId/criteria-sets` → the firm's code tables (latest version of each). */
export const getCriteriaSets = (orgId: string, signal?: AbortSignal) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/criteria-sets`, criteriaSetListSchema, {
    signal,
  }).then((r) => r.criteriaSets);

export const criteriaSetsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: criteriaKeys.list(orgId),
    queryFn: ({ signal }) => getCriteriaSets(orgId, signal),
  });

/** Idle while no firm is known. */
export const useCriteriaSets = (orgId: string | undefined) =>
  useQuery({ ...criteriaSetsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
