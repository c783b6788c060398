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
import { int4Param, versionConflictSchema } from '@shared/schemas/common';
import { z } from 'zod';
import { forbidden, notFound } from '../http/errors';
import { errorResponse, refusals } from '../http/responses';
import { member, routeGroup } from '../http/route-group';
import { archivedError } from '../services/projects';

const errors = {
  ...refusals('project', 'project or assembly'),
  422: errorResponse('Physically impossible input (e.g. framing fractions not summing to 1)'),
};
const route = routeGroup('Assemblies', errors);
const example = {
  name: 'Insulated metal panel on girts',
  description: '',
  wallCategory: 'metal_building',
  attachment: { girtOrientation: 'horizontal', clipType: 'Thermally broken clip', fastenerType: '#14 screw' },
  thermal: metalPanelWall(),
};

export const assemblyRoutes = [
  route.get('/projects/:projectId/assemblies', member('assembly.read'), {
    summary: 'Assemblies of a project with their effective U-factor',
    responses: {
      200: { description: 'Assemblies', schema: z.object({ assemblies: z.array(assemblySummarySchema) }) },
    },
    handler: async ({ project, services }) => ({ assemblies: await services.assemblies.list(project.id) }),
  }),
  route.post('/projects/:projectId/assemblies', member('assembly.write'), {
    summary:
      'Create an assembly (revision 1; the thermal result is computed and stored with the engine version)',
    body: assemblyCreateSchema,
    example,
    responses: {
      201: { description: 'The new assembly', schema: assemblySchema },
      409: errorResponse('The project is archived'),
    },
    handler: ({ user, project, body, services }) => services.assemblies.create(project.id, user.id, body),
  }),
  route.get('/assemblies/:assemblyId', member('assembly.read'), {
    summary: 'One assembly with its current revision and result',
    responses: { 200: { description: 'The assembly', schema: assemblySchema } },
    handler: ({ params, services }) => services.assemblies.get(params.assemblyId),
  }),
  route.put('/assemblies/:assemblyId', member('assembly.write'), {
    summary:
      'Save a new revision (name the version you read; a stale version gets 409 and nothing is overwritten)',
    body: assemblyUpdateSchema,
    example: { version: 1, note: 'clip spacing revised', input: example },
    responses: {
      200: { description: 'The assembly at its new revision', schema: assemblySchema },
      409: {
        description:
          'Someone saved first (`current` holds their revision), or the project is archived (`archived`)',
        schema: versionConflictSchema(assemblySchema),
      },
    },
    handler: ({ user, params, body, services }) =>
      services.assemblies.update(params.assemblyId, user.id, body.version, body.input, body.note),
  }),
  // Reading the assembly is enough here; writing is checked on the target project below.
  route.post('/assemblies/:assemblyId/duplicate', member('assembly.read'), {
    summary:
      'Copy the current revision as revision 1 of a new assembly, in this project or another one you may edit (`projectId`)',
    body: assemblyDuplicateSchema,
    example: { name: 'Insulated metal panel on girts — north' },
    responses: {
      201: { description: 'The copy', schema: assemblySchema },
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
  route.get('/assemblies/:assemblyId/revisions', member('assembly.read'), {
    summary: 'Revision history of an assembly',
    responses: { 200: { description: 'Revisions, newest first', schema: revisionListSchema } },
    handler: async ({ params, services }) => ({
      revisions: await services.assemblies.revisions(params.assemblyId),
    }),
  }),
  route.get('/assemblies/:assemblyId/revisions/:revision', member('assembly.read'), {
    summary: 'One stored revision with its input and result',
    params: z.object({ assemblyId: z.uuid(), revision: int4Param() }),
    responses: { 200: { description: 'The revision', schema: assemblyRevisionSchema } },
    handler: ({ params, services }) => services.assemblies.revision(params.assemblyId, params.revision),
  }),
];
