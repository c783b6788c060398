import { assemblyRevisionSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { assemblyKeys } from '../../../lib/query-keys';

/** `GET /api/assemblies/:assemblyId/revisions/:n` → one stored revision (never changes once saved). */
export const revisionQueryOptions = (assemblyId: string, revision: number) =>
  getQuery(
    assemblyKeys.revision(assemblyId, revision),
    apiPath`/api/assemblies/${assemblyId}/revisions/${revision}`,
    assemblyRevisionSchema,
    // A saved revision is immutable.
    { staleTime: Number.POSITIVE_INFINITY },
  );

export const useRevision = (assemblyId: string, revision: number) =>
  useQuery(revisionQueryOptions(assemblyId, revision));
