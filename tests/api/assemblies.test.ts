import { demoComputedGirt } from '@shared/calc/bridge/examples';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

const assembly = () => ({
  name: 'IMP on girts with clips',
  description: 'test',
  wallCategory: 'metal_building',
  attachment: { girtOrientation: 'horizontal', clipType: 'clip', fastenerType: 'screw' },
  thermal: metalPanelWall(),
});

describe.each(testDatabases())('assemblies and the thermal calculation API on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('stores each save as a revision with the engine version and the result, and refuses a stale save with 409', async () => {
    const architect = await t.as(demoEmail('architect'));
    const created = await architect.post(`/api/projects/${projectId}/assemblies`).send(assembly());
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ revision: 1, version: 1 });
    expect(created.body.current.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(created.body.current.thermalResult.Ueff).toBeGreaterThan(created.body.current.thermalResult.U0);

    const closer = assembly();
    const clip = closer.thermal.bridges.find((b) => b.kind === 'point' && 'spacingHorizontal' in b)!;
    if ('spacingHorizontal' in clip) clip.spacingHorizontal /= 2;
    const saved = await architect
      .put(`/api/assemblies/${created.body.id}`)
      .send({ version: 1, note: 'clips doubled', input: closer });
    expect(saved.status).toBe(200);
    expect(saved.body.revision).toBe(2);
    expect(saved.body.Ueff).toBeGreaterThan(created.body.Ueff);

    const engineer = await t.as(demoEmail('engineer'));
    const stale = await engineer
      .put(`/api/assemblies/${created.body.id}`)
      .send({ version: 1, note: 'mine', input: assembly() });
    expect(stale.status).toBe(409);
    expect(stale.body.current.revision).toBe(2);

    const revisions = await engineer.get(`/api/assemblies/${created.body.id}/revisions`);
    expect(revisions.body.revisions.map((r: { revision: number }) => r.revision)).toEqual([2, 1]);
    const first = await engineer.get(`/api/assemblies/${created.body.id}/revisions/1`);
    expect(first.body.input.thermal.bridges).toEqual(assembly().thermal.bridges);
    const list = await engineer.get(`/api/projects/${projectId}/assemblies`);
    expect(list.body.assemblies[0]).toMatchObject({ id: created.body.id, revision: 2 });
  });

  it('refuses framing fractions that do not sum to 1 with 422 naming the field', async () => {
    const bad = assembly();
    const framed = bad.thermal.layers.find((l) => l.kind === 'framed')!;
    if (framed.kind === 'framed') framed.sections[0]!.fraction = 0.5;
    const res = await (await t.as(demoEmail('architect')))
      .post(`/api/projects/${projectId}/assemblies`)
      .send(bad);
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields)[0]).toMatch(/^layers\.\d+\.sections/);
  });

  it('computes statelessly at /api/v1/calc/thermal and refuses bad input with the field and the reason', async () => {
    const ok = await t.anonymous().post('/api/v1/calc/thermal').send(metalPanelWall());
    expect(ok.status).toBe(200);
    expect(ok.body.Ueff).toBeGreaterThan(0);
    const negative = metalPanelWall();
    (negative.layers[3] as { thickness: number }).thickness = -0.1;
    const bad = await t.anonymous().post('/api/v1/calc/thermal').send(negative);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['layers.3.thickness']).toMatch(/>=?|greater|positive|at least/i);
    const huge = await t
      .anonymous()
      .post('/api/v1/calc/thermal')
      .send({ ...metalPanelWall(), heatFlow: 1e308 });
    expect(huge.status).toBe(400);
    expect(huge.body.error.fields.heatFlow).toBeDefined();
  });

  it('keeps each firm’s own χ/ψ values and materials with their source', async () => {
    const admin = await t.as(demoEmail('admin'));
    const orgId = (await admin.get('/api/me')).body.organisations[0].id;
    const noSource = await admin
      .post(`/api/organisations/${orgId}/bridge-values`)
      .send({ name: 'clip', kind: 'point', value: 0.01, sourceType: 'catalogue', source: '' });
    expect(noSource.status).toBe(400);
    expect(noSource.body.error.fields.source).toContain('source');
    const ok = await admin
      .post(`/api/organisations/${orgId}/bridge-values`)
      .send({ name: 'clip', kind: 'point', value: 0.01, sourceType: 'catalogue', source: 'Catalogue p. 4' });
    expect(ok.status).toBe(201);
    const seen = await (await t.as(demoEmail('outsider'))).get(`/api/organisations/${orgId}/bridge-values`);
    expect(seen.status).toBe(404);
  });

  it('keeps a computed ψ with its detail, solve and map; a firm reader may not save one', async () => {
    const computed = demoComputedGirt(ENGINE_VERSION);
    const entry = {
      name: 'Z girt 1.5 mm at 600 mm (computed)',
      kind: 'linear',
      value: computed.value,
      sourceType: 'calculation',
      source: `computed by Skinwright ${ENGINE_VERSION}, mesh ${computed.cells} cells, ${computed.date}`,
      computed,
    };
    // The architect is an editor of the demo firm, the viewer a reader (README, demo accounts).
    const editor = await t.as(demoEmail('architect'));
    const orgId = (await editor.get('/api/me')).body.organisations[0].id;
    const saved = await editor.post(`/api/organisations/${orgId}/bridge-values`).send(entry);
    expect(saved.status).toBe(201);
    const list = await editor.get(`/api/organisations/${orgId}/bridge-values`);
    const back = list.body.bridgeValues.find((b: { id: string }) => b.id === saved.body.id);
    expect(back.computed).toEqual(computed);
    expect(back.computed.detail.input.layers).toHaveLength(3);
    // Entered values carry no computed record.
    expect(
      list.body.bridgeValues.every(
        (b: { id: string; computed?: unknown }) => b.id === saved.body.id || !b.computed,
      ),
    ).toBe(true);
    const reader = await t.as(demoEmail('viewer'));
    expect((await reader.post(`/api/organisations/${orgId}/bridge-values`).send(entry)).status).toBe(403);
    // A map whose values do not fill its grid is refused with the field named.
    const bad = await editor
      .post(`/api/organisations/${orgId}/bridge-values`)
      .send({ ...entry, computed: { ...computed, map: { ...computed.map, values: [1] } } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toContain('computed.map.values');
  });
});
