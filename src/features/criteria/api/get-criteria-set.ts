import { criteriaSetSchema } from '@shared/schemas/criteria';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/criteria-sets/:setId` → one version with its rows (SI) and what the caller may do. */
export const criteriaSetQueryOptions = (setId: string) =>
  getQuery(criteriaKeys.detail(setId), apiPath`/api/criteria-sets/${setId}`, criteriaSetSchema);

export const useCriteriaSet = (setId: string) => useQuery(criteriaSetQueryOptions(setId));
