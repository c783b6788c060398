import { inspectionListSchema } from '@shared/inspections/schema';
import { useQuery } from '@tanstack/react-query';
import { getQuery } from '../../../lib/api-cache';
import { inspectionKeys } from '../../../lib/query-keys';
import { inspectionPaths } from './paths';

/** `GET /api/projects/:projectId/inspections` → the project's inspections, newest first. */
export const inspectionsQueryOptions = (projectId: string) =>
  getQuery(inspectionKeys.list(projectId), inspectionPaths.list(projectId), inspectionListSchema, {
    pick: (r) => r.inspections,
  });

export const useInspections = (projectId: string) => useQuery(inspectionsQueryOptions(projectId));
