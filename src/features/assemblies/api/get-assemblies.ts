import { assemblySummarySchema } from '@shared/schemas/assembly';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { assemblyKeys } from '../../../lib/query-keys';

const assemblyListSchema = z.object({ assemblies: z.array(assemblySummarySchema) });

/** `GET /api/projects/:id/assemblies` → the project's assemblies with their effective R and U. */
export const getAssemblies = (projectId: string, signal?: AbortSignal) =>
  apiRequest(`/api/projects/${encodeURIComponent(projectId)}/assemblies`, assemblyListSchema, {
    signal,
  }).then((r) => r.assemblies);

export const assembliesQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: assemblyKeys.list(projectId),
    queryFn: ({ signal }) => getAssemblies(projectId, signal),
  });

export const useAssemblies = (projectId: string) => useQuery(assembliesQueryOptions(projectId));
