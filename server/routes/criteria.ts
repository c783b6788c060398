import { CSV_COLUMNS } from '@shared/checks/criteria-csv';
import { projectParams, versionConflictSchema } from '@shared/schemas/common';
import {
  criteriaDiffQuerySchema,
  criteriaDiffSchema,
  criteriaExportQuerySchema,
  criteriaImportBodySchema,
  criteriaImportQuerySchema,
  criteriaRowsUpdateSchema,
  criteriaSaveSchema,
  criteriaSetCreateSchema,
  criteriaSetListSchema,
  criteriaSetMetaUpdateSchema,
  criteriaSetSchema,
  criteriaVersionListSchema,
  csvImportErrorSchema,
} from '@shared/schemas/criteria';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { defineRoute } from '../http/route';

const orgParams = z.object({ orgId: z.uuid() });
const setParams = z.object({ setId: z.uuid() });
const errors = refusals('criteria', 'firm or code table');
const conflict = {
  409: {
    description:
      'Someone saved first, or a newer version exists; `current` holds the table as it now stands. Nothing was written.',
    schema: versionConflictSchema(criteriaSetSchema),
  },
};

const exampleRows = [
  { climateZone: '5A', wallCategory: 'steel_framed', criterion: 'max_u_factor', value: 0.35, note: '' },
  { climateZone: '*', wallCategory: 'steel_framed', criterion: 'max_surface_rh', value: 0.8, note: '' },
];
const exampleMeta = {
  name: 'Example table (invented values)',
  jurisdiction: 'Example jurisdiction',
  edition: 'Edition and amendments as adopted',
  effectiveDate: '2026-01-01',
  notes: 'Values invented for the API example.',
  sourceReference: 'Section and table numbers of the adopted code',
  categoryLabels: {},
};
const exampleCsv = `${CSV_COLUMNS.join(',')}\r\n5A,steel_framed,max_u_factor,0.35,W/(m²·K),\r\n`;

export const criteriaRoutes = [
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/criteria-sets',
    summary: 'The firm’s code tables (latest version of each)',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'read' },
    params: orgParams,
    responses: { 200: { description: 'Code tables', schema: criteriaSetListSchema }, ...errors },
    handler: async ({ params, services }) => ({ criteriaSets: await services.criteria.list(params.orgId) }),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/criteria-sets',
    summary: 'Create a code table (version 1) with its rows; values in SI',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'write' },
    params: orgParams,
    body: criteriaSetCreateSchema,
    example: { ...exampleMeta, rows: exampleRows },
    responses: { 201: { description: 'The new table', schema: criteriaSetSchema }, ...errors },
    handler: ({ params, user, body, criteria, services }) =>
      services.criteria.create(params.orgId, user.id, body, criteria.access),
  }),
  defineRoute({
    method: 'get',
    path: '/criteria-sets/:setId',
    summary: 'One version of a code table with its rows',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'read' },
    params: setParams,
    responses: { 200: { description: 'The table', schema: criteriaSetSchema }, ...errors },
    handler: ({ params, criteria, services }) => services.criteria.get(params.setId, criteria.access),
  }),
  defineRoute({
    method: 'put',
    path: '/criteria-sets/:setId',
    summary:
      'Change the name, jurisdiction, edition, dates, notes or category names (a frozen version becomes a new version)',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'write' },
    params: setParams,
    body: criteriaSetMetaUpdateSchema,
    example: { revision: 1, changes: exampleMeta },
    responses: {
      200: { description: 'The table as saved', schema: criteriaSaveSchema },
      ...errors,
      ...conflict,
    },
    handler: ({ params, user, body, criteria, services }) =>
      services.criteria.updateMeta(params.setId, user.id, body.revision, body.changes, criteria.access),
  }),
  defineRoute({
    method: 'delete',
    path: '/criteria-sets/:setId',
    summary: 'Delete a version that no check run used and no newer version is based on (firm administrators)',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'admin' },
    params: setParams,
    responses: {
      204: { description: 'Deleted' },
      ...errors,
      409: errorResponse('Used by a stored check run, or a newer version exists'),
    },
    handler: async ({ params, user, services }) => {
      await services.criteria.remove(params.setId, user.id);
      return undefined;
    },
  }),
  defineRoute({
    method: 'put',
    path: '/criteria-sets/:setId/rows',
    summary:
      'Replace every row of the table (the grid saves all rows at once; a frozen version becomes a new version)',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'write' },
    params: setParams,
    body: criteriaRowsUpdateSchema,
    example: { revision: 1, rows: exampleRows },
    responses: {
      200: { description: 'The table as saved', schema: criteriaSaveSchema },
      ...errors,
      ...conflict,
    },
    handler: ({ params, user, body, criteria, services }) =>
      services.criteria.replaceRows(params.setId, user.id, body.revision, body.rows, criteria.access),
  }),
  defineRoute({
    method: 'post',
    path: '/criteria-sets/:setId/import',
    summary: `Replace the rows from CSV (text/csv body, or JSON { csv }), all or nothing; columns ${CSV_COLUMNS.join(', ')}`,
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'write' },
    params: setParams,
    query: criteriaImportQuerySchema,
    body: criteriaImportBodySchema,
    example: { csv: exampleCsv },
    responses: {
      200: { description: 'The table as saved', schema: criteriaSaveSchema },
      ...errors,
      ...conflict,
      422: {
        description: 'The CSV has problems (each with its line); nothing was written',
        schema: csvImportErrorSchema,
      },
    },
    handler: ({ params, query, user, body, criteria, services }) =>
      services.criteria.importCsv(
        params.setId,
        user.id,
        typeof body === 'string' ? body : body.csv,
        query.revision,
        criteria.access,
      ),
  }),
  defineRoute({
    method: 'get',
    path: '/criteria-sets/:setId/export.csv',
    summary: 'The rows as CSV (`?units=IP` for IP values; SI by default)',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'read' },
    params: setParams,
    query: criteriaExportQuerySchema,
    responses: {
      200: { description: 'CSV (RFC 4180)', schema: z.string(), contentType: 'text/csv' },
      ...errors,
    },
    handler: async ({ params, query, res, services }) => {
      const { csv, filename } = await services.criteria.exportCsv(params.setId, query.units);
      res.type('text/csv; charset=utf-8').attachment(filename).send(csv);
      return undefined;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/criteria-sets/:setId/versions',
    summary: 'Every version of the table, newest first',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'read' },
    params: setParams,
    responses: { 200: { description: 'Versions', schema: criteriaVersionListSchema }, ...errors },
    handler: async ({ params, services }) => ({ versions: await services.criteria.versions(params.setId) }),
  }),
  defineRoute({
    method: 'get',
    path: '/criteria-sets/:setId/diff',
    summary: 'What changed between two versions of the table (`?from=1&to=2`): rows added, removed, changed',
    tag: 'Code tables',
    access: { kind: 'criteria', need: 'read' },
    params: setParams,
    query: criteriaDiffQuerySchema,
    responses: { 200: { description: 'The differences', schema: criteriaDiffSchema }, ...errors },
    handler: ({ params, query, services }) => services.criteria.diff(params.setId, query.from, query.to),
  }),
  defineRoute({
    method: 'get',
    path: '/projects/:projectId/criteria-sets',
    summary: 'Code tables a project member may check against: the project firm’s and the caller’s own firms’',
    tag: 'Code tables',
    access: { kind: 'project', action: 'project.read' },
    params: projectParams,
    responses: { 200: { description: 'Code tables', schema: criteriaSetListSchema }, ...errors },
    handler: async ({ project, user, services }) => ({
      criteriaSets: await services.criteria.forProject(project.id, user.id),
    }),
  }),
];
