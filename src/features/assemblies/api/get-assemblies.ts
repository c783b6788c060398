import { assemblySummarySchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { assemblyKeys } from '../../../lib/query-keys';

const assemblyListSchema = z.object({ assemblies: z.array(assemblySummarySchema) });

/** `GET /api/projects/:id/assemblies` → the project's assemblies with their effective R and U. */
export const assembliesQueryOptions = (projectId: string) =>
  getQuery(assemblyKeys.list(projectId), apiPath`/api/projects/${projectId}/assemblies`, assemblyListSchema, {
    pick: (r) => r.assemblies,
  });

export const useAssemblies = (projectId: string) => useQuery(assembliesQueryOptions(projectId));
