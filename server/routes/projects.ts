import type { ProjectAction } from '@shared/auth/permissions';
import { versionConflictSchema } from '@shared/schemas/common';
import { auditEntrySchema } from '@shared/schemas/me';
import {
  projectClimateUpdateSchema,
  projectDuplicateSchema,
  projectInputSchema,
  projectListQuerySchema,
  projectSchema,
  projectUpdateSchema,
  projectWindUpdateSchema,
} from '@shared/schemas/project';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { member, routeGroup, signedIn } from '../http/route-group';
import type { ProjectPartChange } from '../services/projects';

const route = routeGroup('Projects', refusals('project', 'project', { invalid: false }));
/** A project route with a body: invalid fields are refused too. */
const edit = routeGroup('Projects', refusals('project', 'project'));
/** The caller's own projects: no project to refuse yet. */
const own = routeGroup('Projects', refusals('user', undefined, { invalid: false }));

const example = {
  name: 'Example distribution centre',
  number: 'EX-01',
  description: '',
  siteAddress: '1 Example Road',
  climateZone: '5A',
  elevationM: 200,
  buildingHeightM: 12,
  planLengthM: 120,
  planWidthM: 60,
  indoorTempC: 20,
  indoorRh: 0.4,
  winterDesignTempC: -18,
  summerDesignTempC: 31,
};

/** A PUT of the wind data or the climate: that part with the project `version` read (D-009). */
function partRoute<B extends { version: number }>(def: {
  part: 'wind' | 'climate';
  summary: string;
  action: ProjectAction;
  body: z.ZodType<B>;
  example: unknown;
  change: (body: B) => ProjectPartChange;
}) {
  return edit.put(`/projects/:projectId/${def.part}`, member(def.action), {
    summary: def.summary,
    body: def.body,
    example: def.example,
    responses: {
      200: { description: 'The updated project', schema: projectSchema },
      409: {
        description: 'Someone saved the same part first, or archived',
        schema: versionConflictSchema(projectSchema),
      },
    },
    handler: ({ user, project, body, services }) =>
      services.projects.update(project.id, user.id, body.version, def.change(body)),
  });
}

export const projectRoutes = [
  own.get('/projects', signedIn, {
    summary: 'Projects the caller is a member of',
    query: projectListQuerySchema,
    responses: {
      200: { description: 'Projects', schema: z.object({ projects: z.array(projectSchema) }) },
    },
    handler: async ({ user, query, services }) => ({
      projects: await services.projects.list(user.id, query.archived === 'true'),
    }),
  }),
  own.post('/projects', signedIn, {
    summary: 'Create a project (the caller becomes its owner)',
    body: projectInputSchema,
    example,
    responses: {
      201: { description: 'The new project', schema: projectSchema },
      400: errorResponse('Invalid fields'),
      422: errorResponse('The caller has no firm'),
    },
    handler: ({ user, body, services }) => services.projects.create(user.id, body),
  }),
  route.get('/projects/:projectId', member('project.read'), {
    summary: 'One project with its site data and the caller’s role',
    responses: { 200: { description: 'The project', schema: projectSchema } },
    // The access check has read the project with the caller's role.
    handler: async ({ project }) => project.record,
  }),
  edit.put('/projects/:projectId', member('project.update'), {
    summary:
      'Update the project’s site data (name the version you read; 409 if someone saved the site data after it)',
    body: projectUpdateSchema,
    example: { version: 1, changes: example },
    responses: {
      200: { description: 'The updated project', schema: projectSchema },
      409: {
        description:
          'Someone saved the site data after the version you read (or the project is archived); `current` holds their version',
        schema: versionConflictSchema(projectSchema),
      },
    },
    handler: ({ user, project, body, services }) =>
      services.projects.update(project.id, user.id, body.version, { part: 'site', changes: body.changes }),
  }),
  partRoute({
    part: 'wind',
    summary: 'Set the project’s wind data (ASCE 7 edition, basic wind speed, exposure, K_zt, enclosure…)',
    action: 'project.wind.update',
    body: projectWindUpdateSchema,
    example: {
      version: 1,
      wind: {
        edition: 'ASCE 7-16',
        basicWindSpeed: 51,
        riskCategory: 'II',
        exposure: 'C',
        Kzt: 1,
        enclosure: 'enclosed',
        roofSlopeDeg: 2,
      },
    },
    change: (body) => ({ part: 'wind', changes: { wind: body.wind } }),
  }),
  partRoute({
    part: 'climate',
    summary: 'Set the project’s 12 monthly exterior climates (for the moisture check) with their source',
    action: 'project.climate.update',
    body: projectClimateUpdateSchema,
    example: {
      version: 1,
      climate: {
        source: 'Example values',
        months: Array.from({ length: 12 }, (_, i) => ({
          exteriorTemperature: -8 + 12 * Math.sin(((i - 3) * Math.PI) / 6),
          exteriorRelativeHumidity: 0.8,
        })),
      },
    },
    change: (body) => ({ part: 'climate', changes: { climate: body.climate } }),
  }),
  edit.post('/projects/:projectId/duplicate', member('project.update'), {
    summary:
      'Copy the project — site data, wind, climate and every assembly’s current revision as revision 1 — with you as its only member (owner)',
    body: projectDuplicateSchema,
    example: { name: 'Example distribution centre, phase 2', number: 'EX-02' },
    responses: {
      201: { description: 'The copy', schema: projectSchema },
      409: errorResponse('The project is archived'),
    },
    handler: ({ user, project, body, services }) => services.projects.duplicate(project.id, user.id, body),
  }),
  route.post('/projects/:projectId/archive', member('project.archive', { whenArchived: 'allow' }), {
    summary: 'Archive a project',
    responses: { 200: { description: 'The archived project', schema: projectSchema } },
    handler: ({ user, project, services }) => services.projects.setArchived(project.id, user.id, true),
  }),
  route.post('/projects/:projectId/unarchive', member('project.archive', { whenArchived: 'allow' }), {
    summary: 'Bring an archived project back',
    responses: { 200: { description: 'The project', schema: projectSchema } },
    handler: ({ user, project, services }) => services.projects.setArchived(project.id, user.id, false),
  }),
  route.get('/projects/:projectId/audit', member('audit.read'), {
    summary: 'Who changed what on this project',
    responses: {
      200: {
        description: 'Audit entries, newest first',
        schema: z.object({ entries: z.array(auditEntrySchema) }),
      },
    },
    handler: async ({ project, services }) => ({ entries: await services.audit.forProject(project.id) }),
  }),
];
