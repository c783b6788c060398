import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { openDatabase } from '../../server/db/client';
import { createTestApp, DEMO_PASSWORD, demoEmail, type TestApp, testDatabases } from '../setup/app';

/**
 * Membership and role changes take effect on the very next request in the process that made them, although
 * reads are cached; a second server process sharing the PostgreSQL database (its own pool and cache) sees
 * them as soon as PostgreSQL's write notice reaches it (polled here for up to two seconds).
 */
/** How long another process may take to see a change: the arrival of PostgreSQL's write notice. */
const NOTICE = { timeout: 2000 };

describe.each(testDatabases())('membership changes on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let other: { app: ReturnType<typeof createApp>['app']; close: () => Promise<void> };
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const database = t.databaseUrl
      ? await openDatabase({ databaseUrl: t.databaseUrl, pgliteDir: 'memory://' })
      : t.database;
    const { app } = createApp({ database, config: t.config, mailer: { send: async () => {} } });
    other = { app, close: async () => (database === t.database ? undefined : database.close()) };
  });
  afterAll(async () => {
    await other?.close();
    await t?.close();
  });

  async function signedIn(app: typeof other.app, email: string) {
    const agent = request.agent(app);
    const res = await agent.post('/api/auth/sign-in/email').send({ email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    return agent;
  }

  it('applies a changed role, a project edit and a removal on the next request, in every process', async () => {
    const owner = await t.as(demoEmail('admin'));
    const here = await t.as(demoEmail('engineer'));
    const there = await signedIn(other.app, demoEmail('engineer'));
    for (const agent of [here, there]) {
      const res = await agent.get(`/api/projects/${projectId}`);
      expect(res.status).toBe(200);
      expect(res.body.myRole).toBe('engineer');
    }
    const members = (await owner.get(`/api/projects/${projectId}/members`)).body.members as {
      id: string;
      email: string;
    }[];
    const memberId = members.find((m) => m.email === demoEmail('engineer'))!.id;

    const changed = await owner
      .put(`/api/projects/${projectId}/members/${memberId}`)
      .send({ role: 'viewer' });
    expect(changed.status).toBe(200);
    expect((await here.get(`/api/projects/${projectId}`)).body.myRole).toBe('viewer');
    await expect
      .poll(async () => (await there.get(`/api/projects/${projectId}`)).body.myRole, NOTICE)
      .toBe('viewer');
    for (const agent of [here, there])
      expect((await agent.get(`/api/projects/${projectId}/audit`)).status).toBe(403);

    const read = await owner.get(`/api/projects/${projectId}`);
    const project = read.body;
    // A conditional GET of an unchanged project answers 304; once it changes, the new record.
    const etag = read.headers.etag as string;
    expect(etag).toMatch(/^W\/"/);
    expect((await owner.get(`/api/projects/${projectId}`).set('if-none-match', etag)).status).toBe(304);
    const {
      id,
      organisationId,
      organisationName,
      wind,
      climate,
      archivedAt,
      version,
      createdAt,
      updatedAt,
      myRole,
      ...input
    } = project;
    const renamed = await owner
      .put(`/api/projects/${projectId}`)
      .send({ version, changes: { ...input, name: `${input.name} (renamed)` } });
    expect(renamed.status).toBe(200);
    const fresh = await owner.get(`/api/projects/${projectId}`).set('if-none-match', etag);
    expect(fresh.status).toBe(200);
    expect(fresh.body.name).toBe(`${input.name} (renamed)`);
    expect((await here.get(`/api/projects/${projectId}`)).body.version).toBe(version + 1);
    await expect
      .poll(async () => (await there.get(`/api/projects/${projectId}`)).body.version, NOTICE)
      .toBe(version + 1);
    for (const agent of [here, there])
      expect((await agent.get(`/api/projects/${projectId}`)).body.name).toBe(`${input.name} (renamed)`);

    expect((await owner.delete(`/api/projects/${projectId}/members/${memberId}`)).status).toBe(204);
    expect((await here.get(`/api/projects/${projectId}`)).status).toBe(404);
    await expect.poll(async () => (await there.get(`/api/projects/${projectId}`)).status, NOTICE).toBe(404);
    for (const agent of [here, there]) {
      expect((await agent.get(`/api/projects/${projectId}`)).status).toBe(404);
      expect((await agent.get('/api/projects')).body.projects).toEqual([]);
    }
  });
});
