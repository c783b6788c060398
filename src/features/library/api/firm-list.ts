import { type QueryKey, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest, apiRequestEmpty } from '../../../lib/api';
import { getQuery, useApiMutation } from '../../../lib/api-cache';
import { libraryKeys } from '../../../lib/query-keys';

/*
 * A firm's library lists kept one entry at a time (server/routes/firm-library.ts): its own materials and its χ
 * and ψ values. Only firm administrators delete; a source is required to add.
 */

/** Each list by the answer's field (also its `libraryKeys` key) → the list's address. */
const LISTS = { materials: 'materials', bridgeValues: 'bridge-values' } as const;
type FirmList = keyof typeof LISTS;

/** The list's address, or one entry's. */
const firmLibraryPath = (orgId: string, list: FirmList, itemId?: string) =>
  `/api/organisations/${encodeURIComponent(orgId)}/${LISTS[list]}${itemId ? `/${encodeURIComponent(itemId)}` : ''}`;

/** `POST …/<list>` → 201 the entry: shown at the end of the cached list at once, the list then fetched again. */
function useAddToFirmList<S extends z.ZodType, I>(list: FirmList, schema: S) {
  const qc = useQueryClient();
  const keyOf: (orgId: string) => QueryKey = libraryKeys[list];
  return useMutation({
    mutationFn: ({ orgId, input }: { orgId: string; input: I }) =>
      apiRequest(firmLibraryPath(orgId, list), schema, { method: 'POST', body: input }),
    onSuccess: (entry, { orgId }) => {
      qc.setQueryData<z.output<S>[]>(keyOf(orgId), (entries) => (entries ? [...entries, entry] : entries));
      return qc.invalidateQueries({ queryKey: keyOf(orgId) });
    },
  });
}

/** `DELETE …/<list>/:itemId` → 204, the list then fetched again. */
const useDeleteFromFirmList = (list: FirmList) =>
  useApiMutation(
    ({ orgId, itemId }: { orgId: string; itemId: string }) =>
      apiRequestEmpty(firmLibraryPath(orgId, list, itemId), { method: 'DELETE' }),
    { stale: (_done, { orgId }) => [libraryKeys[list](orgId)], awaitStale: true },
  );

/**
 * One firm list's reads and changes: `GET …/<list>` → `{ [list]: entries }`, kept under `libraryKeys[list]`
 * (the hook idles while no firm is known); add (typed by the `input` schema) and remove.
 */
export function firmList<S extends z.ZodType, I extends z.ZodType>(list: FirmList, entry: S, _input: I) {
  const queryOptions = (orgId: string) =>
    getQuery(libraryKeys[list](orgId), firmLibraryPath(orgId, list), z.object({ [list]: z.array(entry) }), {
      pick: (answer) => (answer as Record<FirmList, z.output<S>[]>)[list],
    });
  return {
    queryOptions,
    useEntries: (orgId: string | undefined) =>
      useQuery({ ...queryOptions(orgId ?? ''), enabled: Boolean(orgId) }),
    useAdd: () => useAddToFirmList<S, z.input<I>>(list, entry),
    useDelete: () => useDeleteFromFirmList(list),
  };
}
