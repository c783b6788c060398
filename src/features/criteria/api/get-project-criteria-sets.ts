import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';
import { criteriaSetListQuery } from './get-criteria-sets';

/** `GET /api/projects/:id/criteria-sets` → the tables a project member may check against. */
export const projectCriteriaSetsQueryOptions = (projectId: string) =>
  criteriaSetListQuery(criteriaKeys.forProject(projectId), apiPath`/api/projects/${projectId}/criteria-sets`);

export const useProjectCriteriaSets = (projectId: string) =>
  useQuery(projectCriteriaSetsQueryOptions(projectId));
