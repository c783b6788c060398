import { takeoffToCsv } from '@shared/calc/takeoff/csv';
import { demoElevation } from '@shared/calc/takeoff/examples';
import { calculateTakeoff } from '@shared/calc/takeoff/takeoff';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../server/routes';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

const newProject = (name: string) => ({
  ...(apiRoutes.find((r) => r.method === 'post' && r.path === '/projects')!.example as object),
  name,
});

const assembly = () => ({
  name: 'Note-only wall',
  description: 'test',
  wallCategory: 'metal_building',
  attachment: { girtOrientation: 'horizontal', clipType: 'clip', fastenerType: 'screw' },
  thermal: metalPanelWall(),
});

describe.each(testDatabases())('everyday use of the API on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('a save that changes only the note puts it on the current revision instead of a copy of it', async () => {
    const architect = await t.as(demoEmail('architect'));
    const created = await architect.post(`/api/projects/${projectId}/assemblies`).send(assembly());
    expect(created.status).toBe(201);
    const id = created.body.id as string;

    // Same values (in another key order: the comparison is of the canonical input), a new note.
    const { thermal, ...rest } = assembly();
    const noted = await architect
      .put(`/api/assemblies/${id}`)
      .send({ version: 1, note: 'issued for tender', input: { thermal, ...rest } });
    expect(noted.status).toBe(200);
    expect(noted.body).toMatchObject({ revision: 1, version: 1 });
    expect(noted.body.current.note).toBe('issued for tender');
    const revisions = await architect.get(`/api/assemblies/${id}/revisions`);
    expect(revisions.body.revisions.map((r: { revision: number }) => r.revision)).toEqual([1]);

    // The note's change is in the activity log with the note before it.
    const log = await architect.get(`/api/projects/${projectId}/audit`);
    const entry = log.body.entries.find(
      (e: { entityId: string; action: string }) => e.entityId === id && e.action === 'note',
    );
    expect(entry).toMatchObject({
      entityName: 'Note-only wall',
      before: { note: 'first issue' },
      after: { note: 'issued for tender' },
    });

    // A stale version is still refused; a real change still makes revision 2.
    const stale = await architect
      .put(`/api/assemblies/${id}`)
      .send({ version: 5, note: 'x', input: assembly() });
    expect(stale.status).toBe(409);
    const changed = assembly();
    changed.name = 'Note-only wall, renamed';
    const revised = await architect
      .put(`/api/assemblies/${id}`)
      .send({ version: 1, note: 'renamed', input: changed });
    expect(revised.body).toMatchObject({ revision: 2, version: 2 });
  });

  it('the takeoff CSV follows the unit choice (`units=IP`: ft, ft², US gal) and refuses another with 400', async () => {
    const ip = await t.anonymous().post('/api/v1/calc/takeoff.csv?units=IP').send(demoElevation());
    expect(ip.status).toBe(200);
    expect(ip.text).toBe(takeoffToCsv(calculateTakeoff(demoElevation()), 'IP'));
    expect(ip.text).toMatch(/,ft,/);
    expect(ip.text).not.toMatch(/,m,/);
    const si = await t.anonymous().post('/api/v1/calc/takeoff.csv').send(demoElevation());
    expect(si.text).toBe(takeoffToCsv(calculateTakeoff(demoElevation())));
    const bad = await t.anonymous().post('/api/v1/calc/takeoff.csv?units=furlongs').send(demoElevation());
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields ?? {}).join()).toMatch(/units/);
  });

  it('`GET /api/session` answers 200 with null to a signed-out caller and the same as `GET /api/me` to a signed-in one', async () => {
    const out = await t.anonymous().get('/api/session');
    expect(out.status).toBe(200);
    expect(out.body).toBeNull();
    const architect = await t.as(demoEmail('architect'));
    const me = await architect.get('/api/me');
    const session = await architect.get('/api/session');
    expect(session.status).toBe(200);
    expect(session.body).toEqual(me.body);
  });

  it('duplicates an assembly as revision 1 into this project or another the caller edits; refuses others', async () => {
    const architect = await t.as(demoEmail('architect'));
    const created = await architect
      .post(`/api/projects/${projectId}/assemblies`)
      .send({ ...assembly(), name: 'Copied wall' });
    const id = created.body.id as string;
    const changed = assembly();
    changed.name = 'Copied wall';
    changed.description = 'second';
    await architect.put(`/api/assemblies/${id}`).send({ version: 1, note: 'second', input: changed });

    const copy = await architect.post(`/api/assemblies/${id}/duplicate`).send({});
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ projectId, name: 'Copied wall (copy)', revision: 1, version: 1 });
    expect(copy.body.current.note).toBe('copied from Corvid Lane Cold Store rev 2');
    expect(copy.body.current.input.description).toBe('second');
    expect(copy.body.id).not.toBe(id);
    const log = await architect.get(`/api/projects/${projectId}/audit`);
    expect(log.body.entries.find((e: { entityId: string }) => e.entityId === copy.body.id)).toMatchObject({
      action: 'create',
      after: { copiedFrom: { revision: 2 } },
    });

    // Into a project of the architect's own: named as asked.
    const own = await architect.post('/api/projects').send(newProject('Copy target'));
    expect(own.status).toBe(201);
    const moved = await architect
      .post(`/api/assemblies/${id}/duplicate`)
      .send({ projectId: own.body.id, name: 'Borrowed wall' });
    expect(moved.status).toBe(201);
    expect(moved.body).toMatchObject({ projectId: own.body.id, name: 'Borrowed wall' });

    // A viewer of the source may read it but not write into it; a project the caller is not on is 404.
    const viewer = await t.as(demoEmail('viewer'));
    expect((await viewer.post(`/api/assemblies/${id}/duplicate`).send({})).status).toBe(403);
    const engineer = await t.as(demoEmail('engineer'));
    expect(
      (await engineer.post(`/api/assemblies/${id}/duplicate`).send({ projectId: own.body.id })).status,
    ).toBe(404);

    // An archived target is refused with 409 archived.
    const archived = await architect.post('/api/projects').send(newProject('Archived target'));
    const arch = await architect.post(`/api/projects/${archived.body.id}/archive`).send({});
    expect(arch.status, JSON.stringify(arch.body)).toBeLessThan(300);
    const refused = await architect
      .post(`/api/assemblies/${id}/duplicate`)
      .send({ projectId: archived.body.id });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('archived');
    const bad = await architect.post(`/api/assemblies/${id}/duplicate`).send({ projectId: 'nope', name: '' });
    expect(bad.status).toBe(400);
  });

  it('duplicates a project without its members: site, wind, climate and each assembly’s current revision', async () => {
    const architect = await t.as(demoEmail('architect'));
    const source = (await architect.get(`/api/projects/${projectId}`)).body;
    const sourceAssemblies = (await architect.get(`/api/projects/${projectId}/assemblies`)).body
      .assemblies as {
      name: string;
      revision: number;
    }[];
    const res = await architect.post(`/api/projects/${projectId}/duplicate`).send({});
    expect(res.status).toBe(201);
    const copy = res.body;
    expect(copy).toMatchObject({
      name: `${source.name} (copy)`,
      number: source.number,
      climateZone: source.climateZone,
      wind: source.wind,
      climate: source.climate,
      myRole: 'owner',
      archivedAt: null,
      version: 1,
    });
    const members = await architect.get(`/api/projects/${copy.id}/members`);
    expect(members.status).toBe(200);
    expect(JSON.stringify(members.body)).not.toContain('engineer@skinwright.demo');
    const copies = (await architect.get(`/api/projects/${copy.id}/assemblies`)).body.assemblies as {
      id: string;
      name: string;
      revision: number;
    }[];
    expect(copies.map((a) => a.name).sort()).toEqual(sourceAssemblies.map((a) => a.name).sort());
    for (const a of copies) {
      expect(a.revision).toBe(1);
      const from = sourceAssemblies.find((s) => s.name === a.name)!;
      const full = (await architect.get(`/api/assemblies/${a.id}`)).body;
      expect(full.current.note).toBe(`copied from ${source.name} rev ${from.revision}`);
    }
    // The source's other members do not see the copy.
    expect((await (await t.as(demoEmail('engineer'))).get(`/api/projects/${copy.id}`)).status).toBe(404);
    const audit = (await architect.get(`/api/projects/${copy.id}/audit`)).body.entries;
    expect(audit[0]).toMatchObject({
      entity: 'project',
      action: 'create',
      after: { copiedFrom: { project: source.name } },
    });

    const named = await architect
      .post(`/api/projects/${projectId}/duplicate`)
      .send({ name: 'Phase 2', number: 'P-2' });
    expect(named.body).toMatchObject({ name: 'Phase 2', number: 'P-2' });
    const engineer = await t.as(demoEmail('engineer'));
    expect((await engineer.post(`/api/projects/${projectId}/duplicate`).send({})).status).toBe(403);
    expect((await architect.post(`/api/projects/${projectId}/duplicate`).send({ name: '' })).status).toBe(
      400,
    );
  });
});
