import { criteriaSetListSchema } from '@shared/schemas/criteria';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/organisations/:orgId/criteria-sets` → the firm's code tables (latest version of each). */
export const criteriaSetsQueryOptions = (orgId: string) =>
  getQuery(
    criteriaKeys.list(orgId),
    apiPath`/api/organisations/${orgId}/criteria-sets`,
    criteriaSetListSchema,
    {
      pick: (r) => r.criteriaSets,
    },
  );

/** Idle while no firm is known. */
export const useCriteriaSets = (orgId: string | undefined) =>
  useQuery({ ...criteriaSetsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
