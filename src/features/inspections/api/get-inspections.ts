import { inspectionListSchema } from '@shared/inspections/schema';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { inspectionKeys } from '../../../lib/query-keys';
import { inspectionPaths } from './paths';

/** `GET /api/projects/:projectId/inspections` → the project's inspections, newest first. */
export const inspectionsQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: inspectionKeys.list(projectId),
    queryFn: ({ signal }) =>
      apiRequest(inspectionPaths.list(projectId), inspectionListSchema, { signal }).then(
        (r) => r.inspections,
      ),
  });

export const useInspections = (projectId: string) => useQuery(inspectionsQueryOptions(projectId));
