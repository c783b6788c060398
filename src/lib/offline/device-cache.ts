import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import type { Query, QueryClient, QueryKey } from '@tanstack/react-query';
import {
  type PersistedClient,
  type Persister,
  persistQueryClient,
} from '@tanstack/react-query-persist-client';
import { createStore, del, get, set, type UseStore } from 'idb-keyval';

/*
 * What stays on the device (IndexedDB) so that a page opened once works with no signal, and what was done
 * meanwhile is sent later: TanStack Query's cache is saved (the queries of `OFFLINE_QUERY_ROOTS` and every
 * paused mutation) and restored before the first route loads; the queued mutations then resume by their key
 * (`setMutationDefaults` supplies the function a restored mutation runs).
 */

/** How long the device keeps what it saved: a week without opening the app (TanStack's `maxAge`). */
export const DEVICE_CACHE_MAX_AGE_MS = 7 * 24 * 3600_000;
/** Bump when a saved shape changes incompatibly: everything saved under another value is dropped on restore. */
const BUSTER = 'inspections-1';
/** Saves follow changes by at most this long (a reload right after an answer still finds it). */
const SAVE_THROTTLE_MS = 100;

let stores: { cache: UseStore; photos: UseStore } | undefined;
/** The two IndexedDB stores, opened on first use (one database each, as idb-keyval makes them). */
export function deviceStores() {
  stores ??= {
    cache: createStore('skinwright-cache', 'query-client'),
    photos: createStore('skinwright-photos', 'photos'),
  };
  return stores;
}

/**
 * A mutation saved while it was being sent may or may not have reached the server: it is saved as paused, so
 * that it is sent again after a restore (the server refuses a repeated answer with 409 and the item as it
 * is, which the page then compares with what was sent).
 */
export const asPaused = (client: PersistedClient): PersistedClient => ({
  ...client,
  clientState: {
    ...client.clientState,
    mutations: client.clientState.mutations.map((m) => ({ ...m, state: { ...m.state, isPaused: true } })),
  },
});

/** The query client as saved in IndexedDB (one JSON text under one key). */
export const createDevicePersister = (store: UseStore = deviceStores().cache): Persister => {
  const persister = createAsyncStoragePersister({
    storage: {
      getItem: (key) => get<string>(key, store).then((v) => v ?? null),
      setItem: (key, value) => set(key, value, store),
      removeItem: (key) => del(key, store),
    },
    key: 'skinwright-query-client',
    throttleTime: SAVE_THROTTLE_MS,
  });
  return { ...persister, persistClient: (client) => persister.persistClient(asPaused(client)) };
};

/** Whether a query is kept on the device: fetched successfully, under one of `roots`. */
export const isKeptOffline =
  (roots: readonly string[]) =>
  (query: Pick<Query, 'queryKey' | 'state'>): boolean =>
    query.state.status === 'success' && roots.includes(String(query.queryKey[0]));

/**
 * Restore the saved cache into `queryClient`, then keep saving it. Resolves when the restore is done (or
 * failed: a device without IndexedDB, a private window, works as before, online only); the queued
 * mutations are resumed then. `keep` are the query keys whose data is saved and kept a week in memory too
 * (their `gcTime`, which must not be shorter than `maxAge`).
 */
export async function startDeviceCache(
  queryClient: QueryClient,
  keep: readonly QueryKey[],
  persister = createDevicePersister(),
): Promise<() => void> {
  for (const key of keep) queryClient.setQueryDefaults(key, { gcTime: DEVICE_CACHE_MAX_AGE_MS });
  const roots = keep.map((k) => String(k[0]));
  const [stop, restored] = persistQueryClient({
    queryClient,
    persister,
    buster: BUSTER,
    maxAge: DEVICE_CACHE_MAX_AGE_MS,
    dehydrateOptions: {
      shouldDehydrateQuery: isKeptOffline(roots),
      shouldDehydrateMutation: (m) => m.state.status === 'pending',
    },
  });
  await restored.catch(() => undefined);
  // What the device kept is shown at once but never taken as fresh: each restored query is fetched again when a
  // page uses it (with no signal the fetch waits and the kept data stays), so a change made elsewhere — the
  // person's units on another device, an answer by someone else — shows after a reload as it did before.
  void queryClient.invalidateQueries({
    predicate: (q) => roots.includes(String(q.queryKey[0])),
    refetchType: 'none',
  });
  void queryClient.resumePausedMutations();
  return stop;
}
