import { apiErrorSchema, versionConflictSchema } from '@shared/schemas/common';
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
import { z } from 'zod';
import { defineRoute } from '../http/route';
import type { Services } from '../services';

/*
 * A firm's sweep costs (library entries: read by its members, written by its editors and administrators,
 * removed by its administrators) and an assembly's saved sweeps (read and written as the assembly is).
 */

const orgParams = z.object({ orgId: z.uuid() });
const costParams = orgParams.extend({ itemId: z.uuid() });
const assemblyParams = z.object({ assemblyId: z.uuid() });
const sweepParams = z.object({ sweepId: z.uuid() });
const firmErrors = {
  400: { description: 'Invalid fields', schema: apiErrorSchema },
  401: { description: 'Not signed in', schema: apiErrorSchema },
  403: {
    description:
      'Your firm role does not allow this (writing: editors and administrators; deleting: administrators)',
    schema: apiErrorSchema,
  },
  404: { description: 'No such firm or entry, or you are not a member', schema: apiErrorSchema },
};
const errors = {
  400: { description: 'Invalid fields', schema: apiErrorSchema },
  401: { description: 'Not signed in', schema: apiErrorSchema },
  403: { description: 'Your role does not allow this', schema: apiErrorSchema },
  404: {
    description: 'No such project, assembly, sweep or code table, or you are not a member',
    schema: apiErrorSchema,
  },
};
type Ctx = { params: Record<string, string>; services: Services };
const uuid = (x: string | undefined) => z.uuid().safeParse(x).success;
const viaAssembly = {
  projectId: ({ params, services }: Ctx) =>
    uuid(params.assemblyId) ? services.assemblies.projectOf(params.assemblyId) : Promise.resolve(null),
};
const viaSweep = {
  projectId: ({ params, services }: Ctx) =>
    uuid(params.sweepId) ? services.sweeps.projectOf(params.sweepId) : Promise.resolve(null),
};
const costExample = {
  kind: 'insulation',
  name: 'Mineral wool board 45 kg/m³ (example)',
  cost: 4.5,
  currency: 'EUR',
  source: 'Supplier quote, example',
  notes: '',
};

export const sweepRoutes = [
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/sweep-costs',
    summary: 'The firm’s costs of what a sweep varies (insulation per m² per 25 mm, clips, girts, sealant)',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.read' },
    params: orgParams,
    responses: { 200: { description: 'Cost entries', schema: sweepCostListSchema }, ...firmErrors },
    handler: async ({ params, services }) => ({ costs: await services.sweepCosts.list(params.orgId) }),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/sweep-costs',
    summary: 'Add a cost entry to the firm library (a sealant price names its movement class)',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.write' },
    params: orgParams,
    body: sweepCostInputSchema,
    example: costExample,
    responses: { 201: { description: 'The entry', schema: sweepCostSchema }, ...firmErrors },
    handler: ({ params, body, user, services }) => services.sweepCosts.add(params.orgId, user.id, body),
  }),
  defineRoute({
    method: 'put',
    path: '/organisations/:orgId/sweep-costs/:itemId',
    summary:
      'Change a cost entry (the whole entry with the `version` read; saved sweeps keep the prices they used)',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.write' },
    params: costParams,
    body: sweepCostUpdateSchema,
    example: { ...costExample, cost: 4.8, version: 1 },
    responses: {
      200: { description: 'The entry', schema: sweepCostSchema },
      ...firmErrors,
      409: {
        description: 'Changed by someone else since: `current` is the entry now',
        schema: versionConflictSchema(sweepCostSchema),
      },
    },
    handler: ({ params, body, services }) => services.sweepCosts.update(params.orgId, params.itemId, body),
  }),
  defineRoute({
    method: 'delete',
    path: '/organisations/:orgId/sweep-costs/:itemId',
    summary: 'Remove a cost entry (saved sweeps keep the prices they used)',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.admin' },
    params: costParams,
    responses: { 204: { description: 'Removed' }, ...firmErrors },
    handler: async ({ params, services }) => {
      await services.sweepCosts.remove(params.orgId, params.itemId);
      return undefined;
    },
  }),

  defineRoute({
    method: 'get',
    path: '/assemblies/:assemblyId/sweeps',
    summary: 'Saved sweeps of an assembly, newest first; `stale` when the assembly has changed since',
    tag: 'Sweeps',
    access: { kind: 'project', action: 'assembly.read', ...viaAssembly },
    params: assemblyParams,
    responses: { 200: { description: 'Saved sweeps', schema: savedSweepListSchema }, ...errors },
    handler: async ({ params, services }) => ({ sweeps: await services.sweeps.list(params.assemblyId) }),
  }),
  defineRoute({
    method: 'post',
    path: '/assemblies/:assemblyId/sweeps',
    summary:
      'Run a sweep of the assembly’s current revision against a code table version (frozen by it) on the server and save it with its costs and a summary of its results; more variants than `SWEEP_MAX_VARIANTS` are searched within that many',
    tag: 'Sweeps',
    access: { kind: 'project', action: 'assembly.write', ...viaAssembly },
    params: assemblyParams,
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
      ...errors,
      409: { description: 'The project is archived', schema: apiErrorSchema },
      422: {
        description:
          'A parameter the assembly does not have, a bad range or list, a deleted or foreign cost entry, or a varied thing without a cost — the field named, before anything runs',
        schema: apiErrorSchema,
      },
    },
    handler: ({ params, body, user, services }) => services.sweeps.create(params.assemblyId, user.id, body),
  }),
  defineRoute({
    method: 'get',
    path: '/assemblies/:assemblyId/sweeps/compare',
    summary: 'Two saved sweeps of the assembly side by side (`?from=&to=`), with what changed between them',
    tag: 'Sweeps',
    access: { kind: 'project', action: 'assembly.read', ...viaAssembly },
    params: assemblyParams,
    query: sweepCompareQuerySchema,
    responses: { 200: { description: 'The comparison', schema: sweepComparisonSchema }, ...errors },
    handler: ({ params, query, services }) =>
      services.sweeps.compare(params.assemblyId, query.from, query.to),
  }),
  defineRoute({
    method: 'get',
    path: '/sweeps/:sweepId',
    summary:
      'One saved sweep: parameters, costs, the revision and code table version it ran against, its summary, and `stale`',
    tag: 'Sweeps',
    access: { kind: 'project', action: 'assembly.read', ...viaSweep },
    params: sweepParams,
    responses: { 200: { description: 'The saved sweep', schema: savedSweepSchema }, ...errors },
    handler: ({ params, services }) => services.sweeps.get(params.sweepId),
  }),
  defineRoute({
    method: 'delete',
    path: '/sweeps/:sweepId',
    summary: 'Delete a saved sweep',
    tag: 'Sweeps',
    access: { kind: 'project', action: 'assembly.write', ...viaSweep },
    params: sweepParams,
    responses: {
      204: { description: 'Deleted' },
      ...errors,
      409: { description: 'The project is archived', schema: apiErrorSchema },
    },
    handler: async ({ params, user, services }) => {
      await services.sweeps.remove(params.sweepId, user.id);
      return undefined;
    },
  }),
];
