import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiRequestError } from '../lib/api';
import { meKeys } from '../lib/query-keys';

/**
 * One QueryClient for the app. A 401 from any call means the session ended: mark "signed out" in the
 * cache and the session guard sends the person to sign-in (with `next` back to where they were).
 * Client errors (4xx) are not retried — asking again will not change the answer.
 */
export function createQueryClient(): QueryClient {
  const onError = (error: unknown, key?: readonly unknown[]) => {
    if (isApiRequestError(error) && error.status === 401 && key?.[0] !== meKeys.all[0]) {
      client.setQueryData(meKeys.current(), null);
    }
  };
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => onError(error, query.queryKey) }),
    mutationCache: new MutationCache({ onError: (error) => onError(error) }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, error) => {
          if (isApiRequestError(error) && error.status >= 400 && error.status < 500) return false;
          return count < 2;
        },
      },
      mutations: { retry: false },
    },
  });
  return client;
}
