import { auditEntrySchema } from '@shared/schemas/me';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { auditKeys } from '../../../lib/query-keys';

const auditResponseSchema = z.object({ entries: z.array(auditEntrySchema) });

/** `GET /api/projects/:id/audit` */
export const getAudit = (projectId: string, signal?: AbortSignal) =>
  apiRequest(`/api/projects/${encodeURIComponent(projectId)}/audit`, auditResponseSchema, { signal }).then(
    (r) => r.entries,
  );

export const auditQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: auditKeys.list(projectId), queryFn: ({ signal }) => getAudit(projectId, signal) });

export const useAudit = (projectId: string) => useQuery(auditQueryOptions(projectId));
