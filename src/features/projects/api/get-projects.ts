import { can } from '@shared/auth/permissions';
import { projectSchema } from '@shared/schemas/project';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { type ProjectListFilter, projectKeys } from '../../../lib/query-keys';

const projectListSchema = z.object({ projects: z.array(projectSchema) });

/** `GET /api/projects?archived=…` */
export const projectsQueryOptions = (filter: ProjectListFilter) =>
  getQuery(projectKeys.list(filter), `/api/projects?archived=${filter.archived}`, projectListSchema, {
    pick: (r) => r.projects,
  });

export const useProjects = (filter: ProjectListFilter) => useQuery(projectsQueryOptions(filter));

/** The projects a copy of an assembly may go to: unarchived ones whose role allows `assembly.write`. */
export function useAssemblyCopyTargets() {
  const projects = useProjects({ archived: false }).data ?? [];
  return projects.filter((p) => can(p.myRole, 'assembly.write') && p.archivedAt === null);
}
