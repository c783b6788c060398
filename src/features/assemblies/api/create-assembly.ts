import { type AssemblyInput, assemblySchema } from '@shared/schemas/assembly';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { assemblyKeys, auditKeys } from '../../../lib/query-keys';

/** `POST /api/projects/:id/assemblies` → 201 Assembly at revision 1 (the server stores its own result). */
export const createAssembly = ({ projectId, input }: { projectId: string; input: AssemblyInput }) =>
  apiRequest(`/api/projects/${encodeURIComponent(projectId)}/assemblies`, assemblySchema, {
    method: 'POST',
    body: input,
  });

export function useCreateAssembly() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createAssembly,
    onSuccess: (assembly) => {
      qc.setQueryData(assemblyKeys.detail(assembly.id), assembly);
      void qc.invalidateQueries({ queryKey: assemblyKeys.list(assembly.projectId) });
      void qc.invalidateQueries({ queryKey: auditKeys.list(assembly.projectId) });
    },
  });
}
