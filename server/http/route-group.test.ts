import { describe, expect, it } from 'vitest';
import type { Services } from '../services';
import { errorResponse } from './responses';
import type { Access } from './route';
import { anyone, member, routeGroup } from './route-group';

const UUID = '3f1c2b9e-8a4d-4f6e-9b1a-2c3d4e5f6a7b';

describe('routeGroup', () => {
  const route = routeGroup('Things', { 401: errorResponse('Not signed in') });
  const handler = async () => null;

  it('takes the group’s tag and refusals (the route’s own responses win) and the path’s ids as uuids', () => {
    const r = route.get('/submittals/:submittalId/items/:submittalItemId', member('submittal.read'), {
      summary: 'x',
      responses: { 200: { description: 'ok' }, 401: { description: 'mine' } },
      handler,
    });
    expect(r.tag).toBe('Things');
    expect(r.responses).toEqual({ 200: { description: 'ok' }, 401: { description: 'mine' } });
    expect(r.params?.safeParse({ submittalId: UUID, submittalItemId: UUID }).success).toBe(true);
    expect(r.params?.safeParse({ submittalId: UUID, submittalItemId: 'nope' }).success).toBe(false);
    expect(route.get('/things', anyone, { summary: 'x', responses: {}, handler }).params).toBeUndefined();
  });

  it('finds the project of a record the path names, null for a malformed id', async () => {
    const r = route.get('/assemblies/:assemblyId', member('assembly.read'), {
      summary: 'x',
      responses: {},
      handler,
    });
    const services = {
      assemblies: { projectOf: async (id: string) => `project of ${id}` },
    } as unknown as Services;
    const access: Access = r.access;
    const projectId = access.kind === 'project' ? access.projectId : undefined;
    expect(await projectId?.({ params: { assemblyId: UUID }, services })).toBe(`project of ${UUID}`);
    expect(await projectId?.({ params: { assemblyId: 'x' }, services })).toBeNull();
    const direct = route.get('/projects/:projectId/things', member('project.read'), {
      summary: 'x',
      responses: {},
      handler,
    });
    expect(direct.access).toEqual({ kind: 'project', action: 'project.read' });
  });

  it('refuses a project route whose path names no project and no record of one', () => {
    expect(() =>
      route.get('/widgets/:widgetId', member('project.read'), { summary: 'x', responses: {}, handler }),
    ).toThrow(/names :projectId or a record of a project/);
  });
});
