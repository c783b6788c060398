import { projectSchema } from '@shared/schemas/project';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { projectKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id` (includes `myRole`). */
export const projectQueryOptions = (id: string) =>
  getQuery(projectKeys.detail(id), apiPath`/api/projects/${id}`, projectSchema);

export const useProject = (id: string) => useQuery(projectQueryOptions(id));
