import { type Me, meSchema } from '@shared/schemas/me';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { meKeys } from '../../../lib/query-keys';

/**
 * `GET /api/session`: the signed-in user, or `null` when signed out — a 200 either way, so a signed-out page
 * logs no failed request in the browser's console (`GET /api/me` answers 401 then).
 */
export const getMe = (signal?: AbortSignal): Promise<Me | null> =>
  apiRequest('/api/session', meSchema.nullable(), { signal });

export const meQueryOptions = () =>
  queryOptions({
    queryKey: meKeys.current(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
