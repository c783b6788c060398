import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/db/seed';
import { apiRoutes } from '../../server/routes';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

const newProject = {
  name: 'Test depot',
  number: 'T-1',
  siteAddress: 'Somewhere',
  climateZone: '6A',
  elevationM: 300,
  buildingHeightM: 9,
  planLengthM: 80,
  planWidthM: 40,
  indoorTempC: 20,
  indoorRh: 0.35,
  winterDesignTempC: -25,
  summerDesignTempC: 29,
};

/** The site data of a project record: what `PUT /projects/:projectId` takes as `changes`. */
function siteData(project: Record<string, unknown>) {
  const {
    id: _i,
    organisationId: _o,
    organisationName: _n,
    archivedAt: _a,
    version: _v,
    createdAt: _c,
    updatedAt: _u,
    myRole: _r,
    wind: _w,
    climate: _cl,
    ...fields
  } = project;
  return fields;
}

describe.each(testDatabases())('foundation API on %s', (kind) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp(kind);
  });
  afterAll(async () => {
    await t?.close();
  });

  it('answers health with the database kind', async () => {
    const res = await t.anonymous().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: kind });
  });

  it('answers unknown API paths with a JSON 404 and refuses signed-out callers with 401', async () => {
    const nope = await t.anonymous().get('/api/no-such-thing');
    expect(nope.status).toBe(404);
    expect(nope.body.error.code).toBe('not_found');
    const me = await t.anonymous().get('/api/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthenticated');
  });

  it('refuses malformed JSON with 400 and never leaks a stack trace', async () => {
    const agent = await t.as(demoEmail('architect'));
    const res = await agent.post('/api/projects').set('content-type', 'application/json').send('{"name": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_json');
    expect(res.text).not.toMatch(/at .*\.ts:\d+/);
  });

  it('lists only the projects the caller is a member of', async () => {
    const mine = await (await t.as(demoEmail('architect'))).get('/api/projects');
    expect(mine.body.projects.map((p: { name: string }) => p.name)).toEqual(['Corvid Lane Cold Store']);
    expect(mine.body.projects[0].myRole).toBe('architect');
    const theirs = await (await t.as(demoEmail('outsider'))).get('/api/projects');
    expect(theirs.body.projects.map((p: { name: string }) => p.name)).toEqual([
      'Harwick Street Depot (other firm)',
    ]);
    const peek = await (await t.as(demoEmail('outsider'))).get(`/api/projects/${await t.demoProjectId()}`);
    expect(peek.status).toBe(404);
  });

  it('creates a project with the caller as owner and records it in the audit log', async () => {
    const agent = await t.as(demoEmail('consultant'));
    const res = await agent.post('/api/projects').send(newProject);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: 'Test depot',
      myRole: 'owner',
      version: 1,
      organisationName: 'Tidewell Envelope Consulting (demo)',
    });
    const audit = await agent.get(`/api/projects/${res.body.id}/audit`);
    expect(audit.body.entries[0]).toMatchObject({
      entity: 'project',
      action: 'create',
      actorName: 'Tobias Fenwright',
    });
  });

  it('refuses an invalid project with 400 naming each field and its reason', async () => {
    const agent = await t.as(demoEmail('architect'));
    const res = await agent
      .post('/api/projects')
      .send({ ...newProject, name: '', indoorRh: 45, planWidthM: -3, buildingHeightM: 'tall' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'buildingHeightM',
      'indoorRh',
      'name',
      'planWidthM',
    ]);
  });

  it('applies an update to the version read and answers a stale one with 409 and the current record', async () => {
    const id = await t.demoProjectId();
    const agent = await t.as(demoEmail('architect'));
    const current = (await agent.get(`/api/projects/${id}`)).body;
    const { version } = current;
    const fields = siteData(current);
    const first = await agent
      .put(`/api/projects/${id}`)
      .send({ version, changes: { ...fields, number: 'LA-2611-R1' } });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(version + 1);
    const stale = await (await t.as(demoEmail('admin')))
      .put(`/api/projects/${id}`)
      .send({ version, changes: { ...fields, number: 'LOST' } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(stale.body.current.number).toBe('LA-2611-R1');
  });

  it('lets colleagues save different parts of a project from the same version; the same part conflicts', async () => {
    const id = await t.demoProjectId();
    const [architect, engineer, consultant] = await Promise.all(
      ['architect', 'engineer', 'consultant'].map((r) => t.as(demoEmail(r))),
    );
    const current = (await architect.get(`/api/projects/${id}`)).body;
    const { version } = current;
    const example = (path: string) =>
      apiRoutes.find((r) => r.method === 'put' && r.path === path)!.example as object;
    const wind = { ...(example('/projects/:projectId/wind') as { wind: object }).wind, basicWindSpeed: 53 };
    const { climate } = example('/projects/:projectId/climate') as { climate: object };
    const changes = { ...siteData(current), number: 'LA-2611-R2' };

    const site = await architect.put(`/api/projects/${id}`).send({ version, changes });
    expect(site.status).toBe(200);
    const windSaved = await engineer.put(`/api/projects/${id}/wind`).send({ version, wind });
    expect(windSaved.status).toBe(200);
    expect(windSaved.body.version).toBe(version + 2);
    const climateSaved = await consultant.put(`/api/projects/${id}/climate`).send({ version, climate });
    expect(climateSaved.status).toBe(200);
    expect(climateSaved.body).toMatchObject({ version: version + 3, wind: { basicWindSpeed: 53 } });

    // The same part, saved again from the version read before the engineer's save: 409 with their record.
    const stale = await engineer
      .put(`/api/projects/${id}/wind`)
      .send({ version, wind: { ...wind, basicWindSpeed: 60 } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/wind data/);
    expect(stale.body.current).toMatchObject({ version: version + 3, wind: { basicWindSpeed: 53 } });
    // From the version that saved it, it applies; a version that does not exist yet never does.
    const again = await engineer
      .put(`/api/projects/${id}/wind`)
      .send({ version: version + 2, wind: { ...wind, basicWindSpeed: 60 } });
    expect(again.status).toBe(200);
    expect((await architect.put(`/api/projects/${id}`).send({ version: version + 99, changes })).status).toBe(
      409,
    );
    const audit = (await architect.get(`/api/projects/${id}/audit`)).body.entries as { action: string }[];
    expect(audit.slice(0, 4).map((e) => e.action)).toEqual([
      'update_wind',
      'update_climate',
      'update_wind',
      'update',
    ]);
  });

  it('invites by e-mail; the invitee signs up and accepts; the accept link works once', async () => {
    const id = await t.demoProjectId();
    const owner = await t.as(demoEmail('admin'));
    const invite = await owner
      .post(`/api/projects/${id}/invitations`)
      .send({ email: 'New.Engineer@Example.com', role: 'engineer' });
    expect(invite.status).toBe(201);
    const mail = (await t.mail()).find((m) => m.to.includes('new.engineer@example.com'));
    expect(mail?.subject).toContain('Corvid Lane Cold Store');
    const token = mail!.text.match(/\/invite\/([A-Za-z0-9_-]+)/)![1]!;
    const preview = await t.anonymous().get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({
      projectName: 'Corvid Lane Cold Store',
      role: 'engineer',
      accepted: false,
    });

    // Signing up sends a confirmation link to the address; opening it signs the invitee in.
    const invitee = await t.signUp(request.agent(t.app), {
      name: 'New Engineer',
      email: 'new.engineer@example.com',
      password: 'a-long-password-1',
    });
    const wrong = await (await t.as(demoEmail('viewer'))).post(`/api/invitations/${token}/accept`);
    expect(wrong.status).toBe(403);
    const accept = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accept.status).toBe(200);
    expect(accept.body.projectId).toBe(id);
    expect((await invitee.get(`/api/projects/${id}`)).body.myRole).toBe('engineer');
    expect((await invitee.post(`/api/invitations/${token}/accept`)).status).toBe(409);
  });

  it('resets a password through the e-mailed link', async () => {
    const anon = request.agent(t.app);
    const ask = await anon
      .post('/api/auth/request-password-reset')
      .send({ email: demoEmail('viewer'), redirectTo: '/reset-password' });
    expect(ask.status).toBe(200);
    const mail = await t.mailTo(demoEmail('viewer'), 'Reset');
    const url = mail.text.match(/https?:\/\/\S+/)![0];
    const token = new URL(url).pathname.split('/').pop()!;
    const reset = await anon
      .post('/api/auth/reset-password')
      .send({ newPassword: 'a-brand-new-password', token });
    expect(reset.status).toBe(200);
    const signIn = await request(t.app)
      .post('/api/auth/sign-in/email')
      .send({ email: demoEmail('viewer'), password: 'a-brand-new-password' });
    expect(signIn.status).toBe(200);
  });

  it('keeps the unit preference per user', async () => {
    const agent = await t.as(demoEmail('engineer'));
    const res = await agent.put('/api/me/preferences').send({ unitSystem: 'IP' });
    expect(res.body.unitSystem).toBe('IP');
    expect((await agent.get('/api/me')).body.unitSystem).toBe('IP');
    expect((await agent.put('/api/me/preferences').send({ unitSystem: 'imperial' })).status).toBe(400);
  });

  it('refuses a cookie-authenticated write from a foreign origin', async () => {
    const agent = await t.as(demoEmail('architect'));
    const res = await agent.post('/api/projects').set('origin', 'https://evil.example').send(newProject);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('bad_origin');
  });

  it('seeds the demo only once', async () => {
    expect(await seedDemo(t.database.db, t.services.auth.instance)).toBe(false);
  });

  it('serves the OpenAPI document and its reference page', async () => {
    const doc = await t.anonymous().get('/api/openapi.json');
    expect(doc.body.openapi).toBe('3.1.0');
    expect(doc.body.paths['/api/projects/{projectId}'].put.requestBody).toBeDefined();
    const page = await t.anonymous().get('/api/docs/');
    expect(page.status).toBe(200);
    expect(page.text).toContain('swagger');
  });
});

describe('rate limit on sign-in', () => {
  it('answers 429 after the configured number of attempts per minute', async () => {
    const t = await createTestApp('pglite', { authRateLimit: 3 });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++)
        statuses.push(
          (
            await t
              .anonymous()
              .post('/api/auth/sign-in/email')
              .send({ email: demoEmail('viewer'), password: 'wrong-password' })
          ).status,
        );
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await t.close();
    }
  });
});
