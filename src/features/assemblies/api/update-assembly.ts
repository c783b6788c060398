import { type Assembly, type AssemblyInput, assemblySchema } from '@shared/schemas/assembly';
import { useQueryClient } from '@tanstack/react-query';
import { apiPath, apiRequest, currentOnConflict, errorMessage } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { assemblyKeys } from '../../../lib/query-keys';
import type { RevisionApi } from '../../../lib/use-revision-editing';
import { assemblySaved } from './create-assembly';

/** On a 409 `version_conflict` the server sends the assembly as it now stands; null for any other error. */
export const conflictingAssembly = (error: unknown): Assembly | null =>
  currentOnConflict(error, assemblySchema);

/**
 * `PUT /api/assemblies/:assemblyId` `{version, note, input}` → the assembly at its new revision. On a conflict
 * the cached detail is NOT replaced: the builder still holds the person's edits and decides with them whether
 * to load the saved revision or carry the edits over.
 */
export const useUpdateAssembly = () =>
  useApiMutation(
    ({ assemblyId, ...body }: { assemblyId: string; version: number; note: string; input: AssemblyInput }) =>
      apiRequest(apiPath`/api/assemblies/${assemblyId}`, assemblySchema, {
        method: 'PUT',
        body,
      }),
    {
      keep: assemblySaved.keep,
      stale: (assembly) => [assemblyKeys.revisions(assembly.id), ...assemblySaved.stale(assembly)],
    },
  );

/** What every assembly page hands to the shared revision editing (src/lib/use-revision-editing.ts) to save. */
export function useAssemblyRevisionApi(): RevisionApi {
  const qc = useQueryClient();
  const update = useUpdateAssembly();
  return {
    save: (args) => update.mutateAsync(args),
    conflictOf: conflictingAssembly,
    onLoadTheirs: (theirs) => {
      qc.setQueryData(assemblyKeys.detail(theirs.id), theirs);
      void qc.invalidateQueries({ queryKey: assemblyKeys.revisions(theirs.id) });
    },
    errorText: errorMessage,
  };
}
