import { revisionListSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/revisions` → revisions, newest first. */
export const revisionsQueryOptions = (assemblyId: string) =>
  getQuery(
    assemblyKeys.revisions(assemblyId),
    apiPath`/api/assemblies/${assemblyId}/revisions`,
    revisionListSchema,
    {
      pick: (r) => r.revisions,
    },
  );

export const useRevisions = (assemblyId: string, enabled = true) =>
  useQuery({ ...revisionsQueryOptions(assemblyId), enabled });
