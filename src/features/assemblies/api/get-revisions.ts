import { revisionListSchema } from '@shared/schemas/assembly';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/revisions` → revisions, newest first. */
export const getRevisions = (assemblyId: string, signal?: AbortSignal) =>
  apiRequest(`/api/assemblies/${encodeURIComponent(assemblyId)}/revisions`, revisionListSchema, {
    signal,
  }).then((r) => r.revisions);

export const revisionsQueryOptions = (assemblyId: string) =>
  queryOptions({
    queryKey: assemblyKeys.revisions(assemblyId),
    queryFn: ({ signal }) => getRevisions(assemblyId, signal),
  });

export const useRevisions = (assemblyId: string, enabled = true) =>
  useQuery({ ...revisionsQueryOptions(assemblyId), enabled });
