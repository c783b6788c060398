import { type QueryKey, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiRequest, apiRequestEmpty } from '../../../lib/api';
import { getQuery, useApiMutation } from '../../../lib/api-cache';

/*
 * A firm's library lists kept one entry at a time (server/routes/firm-library.ts): its own materials and its χ
 * and ψ values. Only firm administrators delete; a source is required to add.
 */

type FirmList = 'materials' | 'bridge-values';

/** The list's address, or one entry's. */
export const firmLibraryPath = (orgId: string, list: FirmList, itemId?: string) =>
  `/api/organisations/${encodeURIComponent(orgId)}/${list}${itemId ? `/${encodeURIComponent(itemId)}` : ''}`;

/** `GET …/<list>` → the firm's entries (`pick`ed from the answer read with `schema`), kept under `keyOf(orgId)`. */
export const firmListQuery =
  <S extends z.ZodType, T>(
    list: FirmList,
    keyOf: (orgId: string) => QueryKey,
    schema: S,
    pick: (answer: z.output<S>) => T,
  ) =>
  (orgId: string) =>
    getQuery(keyOf(orgId), firmLibraryPath(orgId, list), schema, { pick });

/** `POST …/<list>` → 201 the entry: shown at the end of the cached list at once, the list then fetched again. */
export function useAddToFirmList<S extends z.ZodType, I>(
  list: FirmList,
  schema: S,
  keyOf: (orgId: string) => QueryKey,
) {
  const qc = useQueryClient();
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
export const useDeleteFromFirmList = (list: FirmList, keyOf: (orgId: string) => QueryKey) =>
  useApiMutation(
    ({ orgId, itemId }: { orgId: string; itemId: string }) =>
      apiRequestEmpty(firmLibraryPath(orgId, list, itemId), { method: 'DELETE' }),
    { stale: (_done, { orgId }) => [keyOf(orgId)], awaitStale: true },
  );
