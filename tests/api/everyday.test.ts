import { takeoffToCsv } from '@shared/calc/takeoff/csv';
import { demoElevation } from '@shared/calc/takeoff/fixtures';
import { calculateTakeoff } from '@shared/calc/takeoff/takeoff';
import { metalPanelWall } from '@shared/calc/thermal/fixtures';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

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
    const ip = await t.anonymous().post('/api/v1/calc/takeoff?format=csv&units=IP').send(demoElevation());
    expect(ip.status).toBe(200);
    expect(ip.text).toBe(takeoffToCsv(calculateTakeoff(demoElevation()), 'IP'));
    expect(ip.text).toMatch(/,ft,/);
    expect(ip.text).not.toMatch(/,m,/);
    const si = await t.anonymous().post('/api/v1/calc/takeoff?format=csv').send(demoElevation());
    expect(si.text).toBe(takeoffToCsv(calculateTakeoff(demoElevation())));
    const bad = await t
      .anonymous()
      .post('/api/v1/calc/takeoff?format=csv&units=furlongs')
      .send(demoElevation());
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
});
