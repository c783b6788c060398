import { assemblySchema } from '@shared/schemas/assembly';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { assemblySaved } from './create-assembly';

/** `POST /api/assemblies/:assemblyId/duplicate` `{ projectId, name }` → 201 the copy (revision 1) in that project. */
export const useDuplicateAssembly = () =>
  useApiMutation(
    ({ assemblyId, ...body }: { assemblyId: string; projectId: string; name: string }) =>
      apiRequest(apiPath`/api/assemblies/${assemblyId}/duplicate`, assemblySchema, {
        method: 'POST',
        body,
      }),
    assemblySaved,
  );
