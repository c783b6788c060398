import { meSchema } from '@shared/schemas/me';
import { useQuery } from '@tanstack/react-query';
import { getQuery } from '../../../lib/api-cache';
import { meKeys } from '../../../lib/query-keys';

/**
 * `GET /api/session`: the signed-in user, or `null` when signed out — a 200 either way, so a signed-out page
 * logs no failed request in the browser's console (`GET /api/me` answers 401 then).
 */
export const meQueryOptions = () =>
  getQuery(meKeys.current(), '/api/session', meSchema.nullable(), { staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQueryOptions());
