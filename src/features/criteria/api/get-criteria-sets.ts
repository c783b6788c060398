import { criteriaSetListSchema } from '@shared/schemas/criteria';
import { type QueryKey, useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** A list of code tables (latest version of each) read from `path`, kept under `key`. */
export const criteriaSetListQuery = <K extends QueryKey>(key: K, path: string) =>
  getQuery(key, path, criteriaSetListSchema, { pick: (r) => r.criteriaSets });

/** `GET /api/organisations/:orgId/criteria-sets` → the firm's code tables. */
export const criteriaSetsQueryOptions = (orgId: string) =>
  criteriaSetListQuery(criteriaKeys.list(orgId), apiPath`/api/organisations/${orgId}/criteria-sets`);

/** Idle while no firm is known. */
export const useCriteriaSets = (orgId: string | undefined) =>
  useQuery({ ...criteriaSetsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
