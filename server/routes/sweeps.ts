import {
  savedSweepListSchema,
  savedSweepSchema,
  sweepCompareQuerySchema,
  sweepComparisonSchema,
  sweepCostInputSchema,
  sweepCostListSchema,
  sweepCostSchema,
  sweepCostUpdateSchema,
  sweepSaveSchema,
} from '@shared/schemas/sweeps';
import { errorResponse, refusals } from '../http/responses';
import { member, routeGroup } from '../http/route-group';
import { firmLibraryRoutes } from './firm-library';

/*
 * A firm's sweep costs (library entries: read by its members, written by its editors and administrators,
 * removed by its administrators) and an assembly's saved sweeps (read and written as the assembly is).
 */

const route = routeGroup('Sweeps', refusals('project', 'project, assembly, sweep or code table'));
const costExample = {
  kind: 'insulation',
  name: 'Mineral wool board 45 kg/m³ (example)',
  cost: 4.5,
  currency: 'EUR',
  source: 'Supplier quote, example',
  notes: '',
};

export const sweepRoutes = [
  ...firmLibraryRoutes({
    segment: 'sweep-costs',
    entry: 'entry',
    list: {
      summary: 'The firm’s costs of what a sweep varies (insulation per m² per 25 mm, clips, girts, sealant)',
      description: 'Cost entries',
      schema: sweepCostListSchema,
      read: async (services, orgId) => ({ costs: await services.sweepCosts.list(orgId) }),
    },
    add: {
      summary: 'Add a cost entry to the firm library (a sealant price names its movement class)',
      description: 'The entry',
      schema: sweepCostSchema,
      body: sweepCostInputSchema,
      example: costExample,
      write: (services, orgId, body, userId) => services.sweepCosts.add(orgId, userId, body),
    },
    update: {
      summary:
        'Change a cost entry (the whole entry with the `version` read; saved sweeps keep the prices they used)',
      body: sweepCostUpdateSchema,
      example: { ...costExample, cost: 4.8, version: 1 },
      write: (services, orgId, itemId, body) => services.sweepCosts.update(orgId, itemId, body),
    },
    remove: {
      summary: 'Remove a cost entry (saved sweeps keep the prices they used)',
      write: (services, orgId, itemId) => services.sweepCosts.remove(orgId, itemId),
    },
  }),

  route.get('/assemblies/:assemblyId/sweeps', member('assembly.read'), {
    summary: 'Saved sweeps of an assembly, newest first; `stale` when the assembly has changed since',
    responses: { 200: { description: 'Saved sweeps', schema: savedSweepListSchema } },
    handler: async ({ params, services }) => ({ sweeps: await services.sweeps.list(params.assemblyId) }),
  }),
  route.post('/assemblies/:assemblyId/sweeps', member('assembly.write'), {
    summary:
      'Run a sweep of the assembly’s current revision against a code table version (frozen by it) on the server and save it with its costs and a summary of its results; more variants than `SWEEP_MAX_VARIANTS` are searched within that many',
    body: sweepSaveSchema,
    example: {
      name: 'Insulation × clip spacing',
      criteriaSetId: '00000000-0000-4000-8000-000000000000',
      parameters: [
        { kind: 'insulationThickness', layer: 3, range: { start: 0.05, stop: 0.15, step: 0.025 } },
      ],
      costs: { insulation: 4.5 },
    },
    responses: {
      201: { description: 'The saved sweep', schema: savedSweepSchema },
      409: errorResponse('The project is archived'),
      422: errorResponse(
        'A parameter the assembly does not have, a bad range or list, a deleted or foreign cost entry, library material or χ value (`parameters.<i>.products.<j>.libraryEntryId`, `parameters.<i>.entries.<j>.source.libraryEntryId`), or a varied thing without a cost — the field named, before anything runs',
      ),
    },
    handler: ({ params, body, user, services }) => services.sweeps.create(params.assemblyId, user.id, body),
  }),
  route.get('/assemblies/:assemblyId/sweeps/compare', member('assembly.read'), {
    summary: 'Two saved sweeps of the assembly side by side (`?from=&to=`), with what changed between them',
    query: sweepCompareQuerySchema,
    responses: { 200: { description: 'The comparison', schema: sweepComparisonSchema } },
    handler: ({ params, query, services }) =>
      services.sweeps.compare(params.assemblyId, query.from, query.to),
  }),
  route.get('/sweeps/:sweepId', member('assembly.read'), {
    summary:
      'One saved sweep: parameters, costs, the revision and code table version it ran against, its summary, and `stale`',
    responses: { 200: { description: 'The saved sweep', schema: savedSweepSchema } },
    handler: ({ params, services }) => services.sweeps.get(params.sweepId),
  }),
  route.delete('/sweeps/:sweepId', member('assembly.write'), {
    summary: 'Delete a saved sweep',
    responses: {
      204: { description: 'Deleted' },
      409: errorResponse('The project is archived'),
    },
    handler: async ({ params, user, services }) => {
      await services.sweeps.remove(params.sweepId, user.id);
      return undefined;
    },
  }),
];
