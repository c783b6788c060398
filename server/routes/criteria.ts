import { CSV_COLUMNS } from '@shared/checks/criteria-csv';
import { versionConflictSchema } from '@shared/schemas/common';
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
import { codeTables, member, routeGroup } from '../http/route-group';

const route = routeGroup('Code tables', refusals('criteria', 'firm or code table'));
/** The answer of a save: the table as saved, or 409 with the table as it now stands. */
const saved = {
  200: { description: 'The table as saved', schema: criteriaSaveSchema },
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
  route.get('/organisations/:orgId/criteria-sets', codeTables('read'), {
    summary: 'The firm’s code tables (latest version of each)',
    responses: { 200: { description: 'Code tables', schema: criteriaSetListSchema } },
    handler: async ({ params, services }) => ({ criteriaSets: await services.criteria.list(params.orgId) }),
  }),
  route.post('/organisations/:orgId/criteria-sets', codeTables('write'), {
    summary: 'Create a code table (version 1) with its rows; values in SI',
    body: criteriaSetCreateSchema,
    example: { ...exampleMeta, rows: exampleRows },
    responses: { 201: { description: 'The new table', schema: criteriaSetSchema } },
    handler: ({ params, user, body, criteria, services }) =>
      services.criteria.create(params.orgId, user.id, body, criteria.access),
  }),
  route.get('/criteria-sets/:setId', codeTables('read'), {
    summary: 'One version of a code table with its rows',
    responses: { 200: { description: 'The table', schema: criteriaSetSchema } },
    handler: ({ params, criteria, services }) => services.criteria.get(params.setId, criteria.access),
  }),
  route.put('/criteria-sets/:setId', codeTables('write'), {
    summary:
      'Change the name, jurisdiction, edition, dates, notes or category names (a frozen version becomes a new version)',
    body: criteriaSetMetaUpdateSchema,
    example: { revision: 1, changes: exampleMeta },
    responses: saved,
    handler: ({ params, user, body, criteria, services }) =>
      services.criteria.updateMeta(params.setId, user.id, body.revision, body.changes, criteria.access),
  }),
  route.delete('/criteria-sets/:setId', codeTables('admin'), {
    summary: 'Delete a version that no check run used and no newer version is based on (firm administrators)',
    responses: {
      204: { description: 'Deleted' },
      409: errorResponse('Used by a stored check run, or a newer version exists'),
    },
    handler: async ({ params, user, services }) => {
      await services.criteria.remove(params.setId, user.id);
      return undefined;
    },
  }),
  route.put('/criteria-sets/:setId/rows', codeTables('write'), {
    summary:
      'Replace every row of the table (the grid saves all rows at once; a frozen version becomes a new version)',
    body: criteriaRowsUpdateSchema,
    example: { revision: 1, rows: exampleRows },
    responses: saved,
    handler: ({ params, user, body, criteria, services }) =>
      services.criteria.replaceRows(params.setId, user.id, body.revision, body.rows, criteria.access),
  }),
  route.post('/criteria-sets/:setId/import', codeTables('write'), {
    summary: `Replace the rows from CSV (text/csv body, or JSON { csv }), all or nothing; columns ${CSV_COLUMNS.join(', ')}`,
    query: criteriaImportQuerySchema,
    body: criteriaImportBodySchema,
    example: { csv: exampleCsv },
    responses: {
      ...saved,
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
  route.get('/criteria-sets/:setId/export.csv', codeTables('read'), {
    summary: 'The rows as CSV (`?units=IP` for IP values; SI by default)',
    query: criteriaExportQuerySchema,
    responses: {
      200: { description: 'CSV (RFC 4180)', schema: z.string(), contentType: 'text/csv' },
    },
    handler: async ({ params, query, res, services }) => {
      const { csv, filename } = await services.criteria.exportCsv(params.setId, query.units);
      res.type('text/csv; charset=utf-8').attachment(filename).send(csv);
      return undefined;
    },
  }),
  route.get('/criteria-sets/:setId/versions', codeTables('read'), {
    summary: 'Every version of the table, newest first',
    responses: { 200: { description: 'Versions', schema: criteriaVersionListSchema } },
    handler: async ({ params, services }) => ({ versions: await services.criteria.versions(params.setId) }),
  }),
  route.get('/criteria-sets/:setId/diff', codeTables('read'), {
    summary: 'What changed between two versions of the table (`?from=1&to=2`): rows added, removed, changed',
    query: criteriaDiffQuerySchema,
    responses: { 200: { description: 'The differences', schema: criteriaDiffSchema } },
    handler: ({ params, query, services }) => services.criteria.diff(params.setId, query.from, query.to),
  }),
  route.get('/projects/:projectId/criteria-sets', member('project.read'), {
    summary: 'Code tables a project member may check against: the project firm’s and the caller’s own firms’',
    responses: { 200: { description: 'Code tables', schema: criteriaSetListSchema } },
    handler: async ({ project, user, services }) => ({
      criteriaSets: await services.criteria.forProject(project.id, user.id),
    }),
  }),
];
