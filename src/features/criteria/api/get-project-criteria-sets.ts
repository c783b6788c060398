import { criteriaSetListSchema } from '@shared/schemas/criteria';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { criteriaKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id/criteria-sets` → the tables a project member may check against. */
export const projectCriteriaSetsQueryOptions = (projectId: string) =>
  getQuery(
    criteriaKeys.forProject(projectId),
    apiPath`/api/projects/${projectId}/criteria-sets`,
    criteriaSetListSchema,
    {
      pick: (r) => r.criteriaSets,
    },
  );

export const useProjectCriteriaSets = (projectId: string) =>
  useQuery(projectCriteriaSetsQueryOptions(projectId));
