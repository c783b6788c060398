import { PERMISSIONS, type ProjectRole } from '@shared/auth/permissions';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../server/routes';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { inspectionParams } from '../setup/inspections';

/**
 * An archived project is a closed record: every write under it answers 409 `archived` — the project's parts,
 * its assemblies, check runs, submittals, invitations — until an owner restores it. Reads go on; restoring
 * it, and taking someone's access away, stay possible.
 */
const key = (r: { method: string; path: string }) => `${r.method.toUpperCase()} ${r.path}`;

/** The routes that still work on an archived project (decided in DEVELOPERS.md, "API conventions"). */
const ALLOWED_WHEN_ARCHIVED = [
  'POST /projects/:projectId/archive',
  'POST /projects/:projectId/unarchive',
  'PUT /projects/:projectId/members/:memberId',
  'DELETE /projects/:projectId/members/:memberId',
];

/** The demo account of each project role. */
const ACCOUNT: Record<ProjectRole, string> = {
  owner: 'admin',
  architect: 'architect',
  envelope_consultant: 'consultant',
  engineer: 'engineer',
  subcontractor: 'subcontractor',
  viewer: 'viewer',
};

describe.each(testDatabases())('writes to an archived project on %s', (kind) => {
  let t: TestApp;
  const params: Record<string, string> = {};
  let assembly: { id: string; version: number; current: { input: { name: string } } };
  let token: string;
  beforeAll(async () => {
    t = await createTestApp(kind);
    const owner = await t.as(demoEmail('admin'));
    params.projectId = await t.demoProjectId();
    const assemblies = (await owner.get(`/api/projects/${params.projectId}/assemblies`)).body.assemblies;
    assembly = (await owner.get(`/api/assemblies/${assemblies[0].id}`)).body;
    params.assemblyId = assembly.id;
    const example = (k: string) => apiRoutes.find((r) => key(r) === k)!.example as object;
    const submittal = await owner
      .post(`/api/projects/${params.projectId}/submittals`)
      .send(example('POST /projects/:projectId/submittals'));
    expect(submittal.status).toBe(201);
    params.submittalId = submittal.body.id;
    params.submittalItemId = '00000000-0000-4000-8000-000000000000';
    params.memberId = '00000000-0000-4000-8000-000000000000';
    await owner
      .post(`/api/projects/${params.projectId}/invitations`)
      .send({ email: 'late.joiner@example.com', role: 'engineer' });
    token = (await t.mail())
      .find((m) => m.to.includes('late.joiner@example.com'))!
      .text.match(/\/invite\/([\w-]+)/)![1]!;
    Object.assign(params, await inspectionParams(t, params.projectId));
    const sets = (await owner.get(`/api/projects/${params.projectId}/criteria-sets`)).body.criteriaSets;
    params.sweepId = (
      await owner.post(`/api/assemblies/${assembly.id}/sweeps`).send({
        name: 'Saved before archiving',
        criteriaSetId: sets[0].id,
        parameters: [{ kind: 'sealantClass', list: ['25'] }],
      })
    ).body.id;
    expect(params.sweepId).toBeDefined();
    expect((await owner.post(`/api/projects/${params.projectId}/archive`)).status).toBe(200);
  });
  afterAll(async () => {
    await t?.close();
  });

  it('refuses a new assembly and a new revision with 409 archived, and stores nothing', async () => {
    const engineer = await t.as(demoEmail('engineer'));
    const created = await engineer
      .post(`/api/projects/${params.projectId}/assemblies`)
      .send({ ...assembly.current.input, name: 'Written after archiving' });
    expect(created.status).toBe(409);
    expect(created.body.error.code).toBe('archived');
    const saved = await engineer
      .put(`/api/assemblies/${assembly.id}`)
      .send({ version: assembly.version, note: 'after archiving', input: assembly.current.input });
    expect(saved.status).toBe(409);
    expect(saved.body.error.code).toBe('archived');
    // Reads go on, and nothing was written.
    const list = await engineer.get(`/api/projects/${params.projectId}/assemblies`);
    expect(list.status).toBe(200);
    expect(list.body.assemblies.map((a: { name: string }) => a.name)).not.toContain(
      'Written after archiving',
    );
    expect((await engineer.get(`/api/assemblies/${assembly.id}`)).body.version).toBe(assembly.version);
  });

  it.each(
    apiRoutes
      .filter(
        (r) => r.access.kind === 'project' && r.method !== 'get' && !ALLOWED_WHEN_ARCHIVED.includes(key(r)),
      )
      .map((r) => [key(r), r] as const),
  )('%s answers 409 archived', async (_name, route) => {
    if (route.access.kind !== 'project') throw new Error('not a project route');
    // Someone whose role allows the action: the refusal is about the archive, not the role.
    const role = PERMISSIONS[route.access.action][0]!;
    const agent = (await t.as(demoEmail(ACCOUNT[role]))) as unknown as Record<
      string,
      (p: string) => request.Test
    >;
    const path = `/api${route.path.replace(/:(\w+)/g, (_m, p: string) => params[p]!)}`;
    const res = await agent[route.method]!(path).send(route.example ?? {});
    expect(res.status, res.text.slice(0, 200)).toBe(409);
    expect(res.body.error.code).toBe('archived');
  });

  it('lists exactly the routes that still work on an archived project', () => {
    const allowed = apiRoutes.filter((r) => r.access.kind === 'project' && r.access.whenArchived === 'allow');
    expect(allowed.map(key).sort()).toEqual([...ALLOWED_WHEN_ARCHIVED].sort());
  });

  it('does not let a pending invitation add anyone to an archived project', async () => {
    const invitee = await t.signUp(request.agent(t.app), {
      name: 'Late Joiner',
      email: 'late.joiner@example.com',
      password: 'late-joiner-password',
    });
    const accept = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accept.status).toBe(409);
    expect(accept.body.error.code).toBe('archived');
    expect((await invitee.get(`/api/projects/${params.projectId}`)).status).toBe(404);
  });

  it('still lets an owner take someone off the project, and restore it; then writes apply again', async () => {
    const owner = await t.as(demoEmail('admin'));
    const members = (await owner.get(`/api/projects/${params.projectId}/members`)).body.members as {
      id: string;
      email: string;
    }[];
    const viewer = members.find((m) => m.email === demoEmail('viewer'))!;
    expect((await owner.delete(`/api/projects/${params.projectId}/members/${viewer.id}`)).status).toBe(204);
    expect((await owner.post(`/api/projects/${params.projectId}/unarchive`)).status).toBe(200);
    const saved = await (await t.as(demoEmail('engineer'))).put(`/api/assemblies/${assembly.id}`).send({
      version: assembly.version,
      note: 'after restoring',
      input: { ...assembly.current.input, name: 'Renamed after restoring' },
    });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ version: assembly.version + 1, name: 'Renamed after restoring' });
  });
});
