import { auditEntrySchema } from '@shared/schemas/me';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { auditKeys } from '../../../lib/query-keys';

const auditResponseSchema = z.object({ entries: z.array(auditEntrySchema) });

/** `GET /api/projects/:id/audit` */
export const auditQueryOptions = (projectId: string) =>
  getQuery(auditKeys.list(projectId), apiPath`/api/projects/${projectId}/audit`, auditResponseSchema, {
    pick: (r) => r.entries,
  });

export const useAudit = (projectId: string) => useQuery(auditQueryOptions(projectId));
