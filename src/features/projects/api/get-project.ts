import { projectSchema } from '@shared/schemas/project';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { projectKeys } from '../../../lib/query-keys';

/** `GET /api/projects/:id` (includes `myRole`). */
export const getProject = (id: string, signal?: AbortSignal) =>
  apiRequest(`/api/projects/${encodeURIComponent(id)}`, projectSchema, { signal });

export const projectQueryOptions = (id: string) =>
  queryOptions({ queryKey: projectKeys.detail(id), queryFn: ({ signal }) => getProject(id, signal) });

export const useProject = (id: string) => useQuery(projectQueryOptions(id));
