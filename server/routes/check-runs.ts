import {
  checkRunCreateSchema,
  checkRunListQuerySchema,
  checkRunListSchema,
  checkRunSchema,
} from '@shared/schemas/check-runs';
import { apiErrorSchema, projectParams } from '@shared/schemas/common';
import { z } from 'zod';
import { defineRoute } from '../http/route';
import type { Services } from '../services';

const errors = {
  400: { description: 'Invalid fields', schema: apiErrorSchema },
  401: { description: 'Not signed in', schema: apiErrorSchema },
  403: { description: 'Your role does not allow this', schema: apiErrorSchema },
  404: {
    description: 'No such project, assembly, code table or run, or you are not a member',
    schema: apiErrorSchema,
  },
};
const uuid = (x: string | undefined) => z.uuid().safeParse(x).success;
type Ctx = { params: Record<string, string>; services: Services };
const viaAssembly = {
  projectId: ({ params, services }: Ctx) =>
    uuid(params.assemblyId) ? services.assemblies.projectOf(params.assemblyId) : Promise.resolve(null),
};
const viaRun = {
  projectId: ({ params, services }: Ctx) =>
    uuid(params.runId) ? services.checkRuns.projectOf(params.runId) : Promise.resolve(null),
};

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
      409: { description: 'The project is archived', schema: apiErrorSchema },
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
