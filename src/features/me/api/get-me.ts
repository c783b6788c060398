import { type Me, meSchema } from '@shared/schemas/me';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiRequestError, apiRequest } from '../../../lib/api';
import { meKeys } from '../../../lib/query-keys';

/** `GET /api/me`; a 401 is not an error here: it means "signed out" and resolves to `null`. */
export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    return await apiRequest('/api/me', meSchema, { signal });
  } catch (e) {
    if (e instanceof ApiRequestError && e.status === 401) return null;
    throw e;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: meKeys.current(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
