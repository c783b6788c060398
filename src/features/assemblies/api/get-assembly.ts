import { assemblySchema } from '@shared/schemas/assembly';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId` → the assembly with its current revision (input and stored result). */
export const getAssembly = (assemblyId: string, signal?: AbortSignal) =>
  apiRequest(`/api/assemblies/${encodeURIComponent(assemblyId)}`, assemblySchema, { signal });

export const assemblyQueryOptions = (assemblyId: string) =>
  queryOptions({
    queryKey: assemblyKeys.detail(assemblyId),
    queryFn: ({ signal }) => getAssembly(assemblyId, signal),
  });

export const useAssembly = (assemblyId: string) => useQuery(assemblyQueryOptions(assemblyId));
