import { assemblySchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId` → the assembly with its current revision (input and stored result). */
export const assemblyQueryOptions = (assemblyId: string) =>
  getQuery(assemblyKeys.detail(assemblyId), apiPath`/api/assemblies/${assemblyId}`, assemblySchema);

export const useAssembly = (assemblyId: string) => useQuery(assemblyQueryOptions(assemblyId));
