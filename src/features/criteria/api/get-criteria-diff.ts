import { criteriaDiffSchema } from '@shared/schemas/criteria';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/criteria-sets/:setId/diff?from=&to=` → rows added, removed and changed between two versions. */
export const criteriaDiffQueryOptions = (setId: string, from: number, to: number) =>
  getQuery(
    criteriaKeys.diff(setId, from, to),
    apiPath`/api/criteria-sets/${setId}/diff?from=${from}&to=${to}`,
    criteriaDiffSchema,
  );

export const useCriteriaDiff = (setId: string, from: number, to: number) =>
  useQuery(criteriaDiffQueryOptions(setId, from, to));
