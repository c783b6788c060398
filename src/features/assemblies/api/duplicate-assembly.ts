import { assemblySchema } from '@shared/schemas/assembly';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { assemblyKeys, auditKeys } from '../../../lib/query-keys';

/** `POST /api/assemblies/:assemblyId/duplicate` → 201 the copy (revision 1) in the chosen project. */
export const duplicateAssembly = ({
  assemblyId,
  projectId,
  name,
}: {
  assemblyId: string;
  projectId: string;
  name: string;
}) =>
  apiRequest(`/api/assemblies/${encodeURIComponent(assemblyId)}/duplicate`, assemblySchema, {
    method: 'POST',
    body: { projectId, name },
  });

export function useDuplicateAssembly() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: duplicateAssembly,
    onSuccess: (copy) => {
      qc.setQueryData(assemblyKeys.detail(copy.id), copy);
      void qc.invalidateQueries({ queryKey: assemblyKeys.list(copy.projectId) });
      void qc.invalidateQueries({ queryKey: auditKeys.list(copy.projectId) });
    },
  });
}
