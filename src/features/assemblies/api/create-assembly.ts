import { type Assembly, type AssemblyInput, assemblySchema } from '@shared/schemas/assembly';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { assemblyKeys, auditKeys } from '../../../lib/query-keys';

/** After an assembly is made or saved: it kept, its project's list and activity log stale. */
export const assemblySaved = {
  keep: (assembly: Assembly) => assemblyKeys.detail(assembly.id),
  stale: (assembly: Assembly) => [assemblyKeys.list(assembly.projectId), auditKeys.list(assembly.projectId)],
};

/** `POST /api/projects/:id/assemblies` → 201 Assembly at revision 1 (the server stores its own result). */
export const useCreateAssembly = () =>
  useApiMutation(
    ({ projectId, input }: { projectId: string; input: AssemblyInput }) =>
      apiRequest(apiPath`/api/projects/${projectId}/assemblies`, assemblySchema, {
        method: 'POST',
        body: input,
      }),
    assemblySaved,
  );
