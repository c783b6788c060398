import {
  checkRunCreateSchema,
  checkRunListQuerySchema,
  checkRunListSchema,
  checkRunSchema,
} from '@shared/schemas/check-runs';
import { errorResponse, refusals } from '../http/responses';
import { member, routeGroup } from '../http/route-group';

const route = routeGroup('Check runs', refusals('project', 'project, assembly, code table or run'));

export const checkRunRoutes = [
  route.post('/assemblies/:assemblyId/check-runs', member('checkrun.create'), {
    summary:
      'Run every check of the assembly’s current revision against a code table version and store the run (freezes that version)',
    body: checkRunCreateSchema,
    example: { criteriaSetId: '00000000-0000-4000-8000-000000000000' },
    responses: {
      201: { description: 'The stored run with its inputs, outputs and hash', schema: checkRunSchema },
      409: errorResponse('The project is archived'),
    },
    handler: ({ params, user, body, services }) =>
      services.checkRuns.create(params.assemblyId, user.id, body.criteriaSetId),
  }),
  route.get('/projects/:projectId/check-runs', member('assembly.read'), {
    summary: 'Stored check runs of a project, newest first (`?assemblyId=` for one assembly)',
    query: checkRunListQuerySchema,
    responses: { 200: { description: 'Runs', schema: checkRunListSchema } },
    handler: async ({ project, query, services }) => ({
      checkRuns: await services.checkRuns.list(project.id, query.assemblyId),
    }),
  }),
  route.get('/check-runs/:runId', member('assembly.read'), {
    summary: 'One stored check run: inputs snapshot, module results with traces, checks, verdict, hashes',
    responses: { 200: { description: 'The run', schema: checkRunSchema } },
    handler: ({ params, services }) => services.checkRuns.get(params.runId),
  }),
];
