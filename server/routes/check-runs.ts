import {
  checkRunCreateSchema,
  checkRunListQuerySchema,
  checkRunListSchema,
  checkRunSchema,
} from '@shared/schemas/check-runs';
import { projectParams } from '@shared/schemas/common';
import { z } from 'zod';
import { errorResponse, refusals, via } from '../http/responses';
import { defineRoute } from '../http/route';

const errors = refusals('project', 'project, assembly, code table or run');
const viaAssembly = via('assemblyId', (s, id) => s.assemblies.projectOf(id));
const viaRun = via('runId', (s, id) => s.checkRuns.projectOf(id));

export const checkRunRoutes = [
  defineRoute({
    method: 'post',
    path: '/assemblies/:assemblyId/check-runs',
    summary:
      'Run every check of the assembly’s current revision against a code table version and store the run (freezes that version)',
    tag: 'Check runs',
    access: { kind: 'project', action: 'checkrun.create', ...viaAssembly },
    params: z.object({ assemblyId: z.uuid() }),
    body: checkRunCreateSchema,
    example: { criteriaSetId: '00000000-0000-4000-8000-000000000000' },
    responses: {
      201: { description: 'The stored run with its inputs, outputs and hash', schema: checkRunSchema },
      ...errors,
      409: errorResponse('The project is archived'),
    },
    handler: ({ params, user, body, services }) =>
      services.checkRuns.create(params.assemblyId, user.id, body.criteriaSetId),
  }),
  defineRoute({
    method: 'get',
    path: '/projects/:projectId/check-runs',
    summary: 'Stored check runs of a project, newest first (`?assemblyId=` for one assembly)',
    tag: 'Check runs',
    access: { kind: 'project', action: 'assembly.read' },
    params: projectParams,
    query: checkRunListQuerySchema,
    responses: { 200: { description: 'Runs', schema: checkRunListSchema }, ...errors },
    handler: async ({ project, query, services }) => ({
      checkRuns: await services.checkRuns.list(project.id, query.assemblyId),
    }),
  }),
  defineRoute({
    method: 'get',
    path: '/check-runs/:runId',
    summary: 'One stored check run: inputs snapshot, module results with traces, checks, verdict, hashes',
    tag: 'Check runs',
    access: { kind: 'project', action: 'assembly.read', ...viaRun },
    params: z.object({ runId: z.uuid() }),
    responses: { 200: { description: 'The run', schema: checkRunSchema }, ...errors },
    handler: ({ params, services }) => services.checkRuns.get(params.runId),
  }),
];
