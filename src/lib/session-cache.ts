import type { QueryClient } from '@tanstack/react-query';
import { meKeys } from './query-keys';

/*
 * Changing who is signed in must not leave the previous person's answers in the cache. `queryClient.clear()`
 * would also detach components that stay mounted (the shell observes "me"), so instead: drop every other
 * query and refresh or blank "me" in place, which mounted observers do see.
 */
const notMe = { predicate: (q: { queryKey: readonly unknown[] }) => q.queryKey[0] !== meKeys.all[0] };

/** After a successful sign-in or sign-up. */
export async function startSessionCache(qc: QueryClient) {
  qc.removeQueries(notMe);
  await qc.invalidateQueries({ queryKey: meKeys.all, refetchType: 'all' });
}

/** After signing out (call once the page has left any signed-in screen). */
export function endSessionCache(qc: QueryClient) {
  qc.setQueryData(meKeys.current(), null);
  qc.removeQueries(notMe);
}
