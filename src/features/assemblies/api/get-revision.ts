import { assemblyRevisionSchema } from '@shared/schemas/assembly';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/revisions/:n` → one stored revision (never changes once saved). */
export const getRevision = (assemblyId: string, revision: number, signal?: AbortSignal) =>
  apiRequest(
    `/api/assemblies/${encodeURIComponent(assemblyId)}/revisions/${revision}`,
    assemblyRevisionSchema,
    { signal },
  );

export const revisionQueryOptions = (assemblyId: string, revision: number) =>
  queryOptions({
    queryKey: assemblyKeys.revision(assemblyId, revision),
    queryFn: ({ signal }) => getRevision(assemblyId, revision, signal),
    // A saved revision is immutable.
    staleTime: Number.POSITIVE_INFINITY,
  });

export const useRevision = (assemblyId: string, revision: number) =>
  useQuery(revisionQueryOptions(assemblyId, revision));
