import {
  type QueryKey,
  queryOptions,
  type UseQueryOptions,
  useMutation,
  useQueryClient,
} from '@tanstack/react-query';
import type { z } from 'zod';
import { apiRequest } from './api';
import { auditKeys, projectKeys } from './query-keys';

/** What a query keeps of the answer (`pick`; the whole answer by default) and its own options, if any. */
export type GetQueryOptions<S extends z.ZodType, T, K extends QueryKey> = {
  pick?: (answer: z.output<S>) => T;
} & Partial<
  Pick<UseQueryOptions<T, Error, T, K>, 'staleTime' | 'retry' | 'refetchInterval' | 'placeholderData'>
>;

/**
 * The `queryOptions` of one `GET`: the answer of `path` read with `schema` (and `pick`ed), kept under `queryKey`
 * — one object for the page's hook and the route's loader (D-016).
 */
export function getQuery<K extends QueryKey, S extends z.ZodType, T = z.output<S>>(
  queryKey: K,
  path: string,
  schema: S,
  { pick = (answer) => answer as T, ...options }: GetQueryOptions<S, T, K> = {},
) {
  return queryOptions({
    queryKey,
    queryFn: ({ signal }) => apiRequest(path, schema, { signal }).then(pick),
    ...options,
  });
}

/** What a change does to the cache once the server has answered (`saved`) the call made with `vars`. */
export interface CacheEffects<R, V> {
  /** The key the answered record is kept under, so a page showing it draws it at once. */
  keep?: (saved: R, vars: V) => QueryKey;
  /** The keys (prefixes) the change makes stale: fetched again where a page shows them. */
  stale?: (saved: R, vars: V) => readonly QueryKey[];
  /** The mutation is done only once the stale queries on screen are fetched again (e.g. before leaving). */
  awaitStale?: boolean;
  /** On a 409 carrying the record as it now stands (`currentOnConflict`): kept under `keep`'s key. */
  conflict?: (error: unknown) => R | null;
}

/** A mutation with its cache effects: the call, then what it keeps and what it makes stale. */
export function useApiMutation<V, R>(mutationFn: (vars: V) => Promise<R>, effects: CacheEffects<R, V>) {
  const qc = useQueryClient();
  const { keep, stale, awaitStale, conflict } = effects;
  return useMutation({
    mutationFn,
    onSuccess: (saved, vars) => {
      if (keep) qc.setQueryData(keep(saved, vars), saved);
      const refreshed = Promise.all(
        (stale?.(saved, vars) ?? []).map((queryKey) => qc.invalidateQueries({ queryKey })),
      );
      return awaitStale ? refreshed : undefined;
    },
    onError: (error, vars) => {
      const current = conflict?.(error);
      if (current && keep) qc.setQueryData(keep(current, vars), current);
    },
  });
}

/**
 * After a project's own fields change (details, climate, wind, archived) — one cache effect for the three
 * features that save them: the project kept, the lists and its activity log stale.
 */
export const projectSaved = {
  keep: (project: { id: string }) => projectKeys.detail(project.id),
  stale: (project: { id: string }) => [projectKeys.lists(), auditKeys.list(project.id)],
};
