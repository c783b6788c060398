import { can } from '@shared/auth/permissions';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import {
  assemblyCreateSchema,
  assemblyDuplicateSchema,
  assemblyRevisionSchema,
  assemblySchema,
  assemblySummarySchema,
  assemblyUpdateSchema,
  revisionListSchema,
} from '@shared/schemas/assembly';
import { int4Param, projectParams, versionConflictSchema } from '@shared/schemas/common';
import { z } from 'zod';
import { forbidden, notFound } from '../http/errors';
import { errorResponse, refusals, via } from '../http/responses';
import { defineRoute } from '../http/route';
import { archivedError } from '../services/projects';

const errors = {
  ...refusals('project', 'project or assembly'),
  422: errorResponse('Physically impossible input (e.g. framing fractions not summing to 1)'),
};
const assemblyParams = z.object({ assemblyId: z.uuid() });
const viaAssembly = via('assemblyId', (s, id) => s.assemblies.projectOf(id));
const example = {
  name: 'Insulated metal panel on girts',
  description: '',
  wallCategory: 'metal_building',
  attachment: { girtOrientation: 'horizontal', clipType: 'Thermally broken clip', fastenerType: '#14 screw' },
  thermal: metalPanelWall(),
};

export const assemblyRoutes = [
  defineRoute({
    method: 'get',
    path: '/projects/:projectId/assemblies',
    summary: 'Assemblies of a project with their effective U-factor',
    tag: 'Assemblies',
    access: { kind: 'project', action: 'assembly.read' },
    params: projectParams,
    responses: {
      200: { description: 'Assemblies', schema: z.object({ assemblies: z.array(assemblySummarySchema) }) },
      ...errors,
    },
    handler: async ({ project, services }) => ({ assemblies: await services.assemblies.list(project.id) }),
  }),
  defineRoute({
    method: 'post',
    path: '/projects/:projectId/assemblies',
    summary:
      'Create an assembly (revision 1; the thermal result is computed and stored with the engine version)',
    tag: 'Assemblies',
    access: { kind: 'project', action: 'assembly.write' },
    params: projectParams,
    body: assemblyCreateSchema,
    example,
    responses: {
      201: { description: 'The new assembly', schema: assemblySchema },
      ...errors,
      409: errorResponse('The project is archived'),
    },
    handler: ({ user, project, body, services }) => services.assemblies.create(project.id, user.id, body),
  }),
  defineRoute({
    method: 'get',
    path: '/assemblies/:assemblyId',
    summary: 'One assembly with its current revision and result',
    tag: 'Assemblies',
    access: { kind: 'project', action: 'assembly.read', ...viaAssembly },
    params: assemblyParams,
    responses: { 200: { description: 'The assembly', schema: assemblySchema }, ...errors },
    handler: ({ params, services }) => services.assemblies.get(params.assemblyId),
  }),
  defineRoute({
    method: 'put',
    path: '/assemblies/:assemblyId',
    summary:
      'Save a new revision (name the version you read; a stale version gets 409 and nothing is overwritten)',
    tag: 'Assemblies',
    access: { kind: 'project', action: 'assembly.write', ...viaAssembly },
    params: assemblyParams,
    body: assemblyUpdateSchema,
    example: { version: 1, note: 'clip spacing revised', input: example },
    responses: {
      200: { description: 'The assembly at its new revision', schema: assemblySchema },
      ...errors,
      409: {
        description:
          'Someone saved first (`current` holds their revision), or the project is archived (`archived`)',
        schema: versionConflictSchema(assemblySchema),
      },
    },
    handler: ({ user, params, body, services }) =>
      services.assemblies.update(params.assemblyId, user.id, body.version, body.input, body.note),
  }),
  defineRoute({
    method: 'post',
    path: '/assemblies/:assemblyId/duplicate',
    summary:
      'Copy the current revision as revision 1 of a new assembly, in this project or another one you may edit (`projectId`)',
    tag: 'Assemblies',
    // Reading the assembly is enough here; writing is checked on the target project below.
    access: { kind: 'project', action: 'assembly.read', ...viaAssembly },
    params: assemblyParams,
    body: assemblyDuplicateSchema,
    example: { name: 'Insulated metal panel on girts — north' },
    responses: {
      201: { description: 'The copy', schema: assemblySchema },
      ...errors,
      409: errorResponse('The source or the target project is archived'),
    },
    handler: async ({ user, project, params, body, services }) => {
      const target =
        body.projectId === undefined || body.projectId === project.id
          ? project.record
          : await services.projects.access(body.projectId, user.id);
      if (!target) throw notFound('project');
      if (!can(target.myRole, 'assembly.write'))
        throw forbidden('your role on the target project does not edit assemblies');
      if (target.archivedAt) throw archivedError();
      return services.assemblies.duplicate(params.assemblyId, target.id, user.id, body.name);
    },
  }),
  defineRoute({
    method: 'get',
    path: '/assemblies/:assemblyId/revisions',
    summary: 'Revision history of an assembly',
    tag: 'Assemblies',
    access: { kind: 'project', action: 'assembly.read', ...viaAssembly },
    params: assemblyParams,
    responses: { 200: { description: 'Revisions, newest first', schema: revisionListSchema }, ...errors },
    handler: async ({ params, services }) => ({
      revisions: await services.assemblies.revisions(params.assemblyId),
    }),
  }),
  defineRoute({
    method: 'get',
    path: '/assemblies/:assemblyId/revisions/:revision',
    summary: 'One stored revision with its input and result',
    tag: 'Assemblies',
    access: { kind: 'project', action: 'assembly.read', ...viaAssembly },
    params: assemblyParams.extend({ revision: int4Param() }),
    responses: { 200: { description: 'The revision', schema: assemblyRevisionSchema }, ...errors },
    handler: ({ params, services }) => services.assemblies.revision(params.assemblyId, params.revision),
  }),
];
