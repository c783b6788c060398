import { criteriaVersionListSchema } from '@shared/schemas/criteria';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/criteria-sets/:setId/versions` → every version of the table, newest first. */
export const criteriaVersionsQueryOptions = (setId: string) =>
  getQuery(
    criteriaKeys.versions(setId),
    apiPath`/api/criteria-sets/${setId}/versions`,
    criteriaVersionListSchema,
    {
      pick: (r) => r.versions,
    },
  );

export const useCriteriaVersions = (setId: string) => useQuery(criteriaVersionsQueryOptions(setId));
