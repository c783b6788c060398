import { assemblyRevisionSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { getQuery } from '../../../lib/api-cache';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/revisions/:n` → one stored revision (never changes once saved). */
export const revisionQueryOptions = (assemblyId: string, revision: number) =>
  getQuery(
    assemblyKeys.revision(assemblyId, revision),
    `/api/assemblies/${encodeURIComponent(assemblyId)}/revisions/${revision}`,
    assemblyRevisionSchema,
    // A saved revision is immutable.
    { staleTime: Number.POSITIVE_INFINITY },
  );

export const useRevision = (assemblyId: string, revision: number) =>
  useQuery(revisionQueryOptions(assemblyId, revision));
