import { criteriaRow, demoAssembly } from '@shared/checks/fixtures';
import { runChecks } from '@shared/checks/runner';
import { demoSweep } from '@shared/sweep/examples';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

/*
 * Sweep axes from the firm library (D-031): insulation products and clip types. A saved sweep runs the library's
 * own values for the entries it names and refuses a deleted one at its field before anything runs; the public
 * sweep takes the values as sent. The materials and χ values are invented demo entries.
 */

const DELETED = 'no such entry in the firm library (it may have been deleted)';

describe.each(testDatabases())('sweep axes from the firm library on %s', (kind) => {
  let t: TestApp;
  let orgId: string;
  let assemblyId: string;
  let layer: number;
  let clip: number;
  let setId: string;
  const ids: Record<string, string> = {};
  const as = (who: string) => t.as(demoEmail(who));

  beforeAll(async () => {
    t = await createTestApp(kind);
    const projectId = await t.demoProjectId();
    const owner = await as('admin');
    orgId = (await owner.get('/api/me')).body.organisations[0].id;
    const list = (await owner.get(`/api/projects/${projectId}/assemblies`)).body.assemblies as {
      id: string;
    }[];
    assemblyId = list[0]!.id;
    const input = (await owner.get(`/api/assemblies/${assemblyId}`)).body.current.input as {
      thermal: { layers: { kind: string }[]; bridges: { kind: string }[] };
    };
    layer = input.thermal.layers.findIndex((l) => l.kind === 'homogeneous');
    clip = input.thermal.bridges.findIndex((b) => b.kind === 'point');
    setId = (await owner.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets[0].id;
    const editor = await as('architect');
    const material = (name: string, conductivity: number, vapourResistanceFactor: number) =>
      editor
        .post(`/api/organisations/${orgId}/materials`)
        .send({ name, conductivity, vapourResistanceFactor, source: 'Demo data sheet (invented)' });
    ids.pir = (await material('Demo PIR board', 0.022, 60)).body.id;
    ids.wool = (await material('Demo wool slab', 0.034, 1.3)).body.id;
    const bridgeValue = (name: string, k: string, value: number) =>
      editor.post(`/api/organisations/${orgId}/bridge-values`).send({
        name,
        kind: k,
        value,
        sourceType: 'test_report',
        source: 'Demo test report (invented)',
      });
    ids.clip = (await bridgeValue('Demo clip', 'point', 0.02)).body.id;
    ids.girt = (await bridgeValue('Demo girt', 'linear', 0.1)).body.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  /** What a page sends: the entries with its own copy of the values (here deliberately wrong). */
  const parameters = () => [
    {
      kind: 'insulationProduct',
      layer,
      products: [
        { name: 'Stale copy', conductivity: 0.5, source: 'page', libraryEntryId: ids.pir },
        { name: 'Demo wool slab', conductivity: 0.034, source: 'page', libraryEntryId: ids.wool },
      ],
    },
    {
      kind: 'clipChi',
      bridge: clip,
      entries: [{ name: 'Stale clip', chi: 9, source: { text: 'page', libraryEntryId: ids.clip } }],
    },
  ];
  const save = async (body: object) =>
    (await as('engineer'))
      .post(`/api/assemblies/${assemblyId}/sweeps`)
      .send({ name: 'Products × clip', criteriaSetId: setId, parameters: parameters(), ...body });
  const savedCount = async () =>
    (await (await as('engineer')).get(`/api/assemblies/${assemblyId}/sweeps`)).body.sweeps.length;

  it('runs a saved sweep of library products and clip types on the library’s own values', async () => {
    const res = await save({});
    expect(res.status, res.text.slice(0, 300)).toBe(201);
    expect(res.body.summary.count).toBe(2);
    expect(res.body.summary.parameters.map((p: { values: unknown[] }) => p.values)).toEqual([
      ['Demo PIR board', 'Demo wool slab'],
      ['Demo clip'],
    ]);
    const [products, clips] = res.body.parameters;
    expect(products.products[0]).toEqual({
      name: 'Demo PIR board',
      conductivity: 0.022,
      vapourResistanceFactor: 60,
      source: 'Demo data sheet (invented)',
      libraryEntryId: ids.pir,
    });
    expect(clips.entries[0]).toEqual({
      name: 'Demo clip',
      chi: 0.02,
      source: { text: 'Demo test report (invented)', libraryEntryId: ids.clip },
    });
  });

  it('refuses a deleted material or χ value, or a ψ named as a clip, at its field before anything runs', async () => {
    const before = await savedCount();
    const admin = await as('admin');
    expect((await admin.delete(`/api/organisations/${orgId}/materials/${ids.wool}`)).status).toBe(204);
    const product = await save({});
    expect(product.status).toBe(422);
    expect(product.body.error.fields).toEqual({ 'parameters.0.products.1.libraryEntryId': DELETED });

    const [p0, p1] = parameters();
    const withProducts = { ...p0, products: p0!.products!.slice(0, 1) };
    expect((await admin.delete(`/api/organisations/${orgId}/bridge-values/${ids.clip}`)).status).toBe(204);
    const chi = await save({ parameters: [withProducts, p1] });
    expect(chi.status).toBe(422);
    expect(chi.body.error.fields).toEqual({ 'parameters.1.entries.0.source.libraryEntryId': DELETED });
    const girt = await save({
      parameters: [
        { ...p1, entries: [{ name: 'Girt', chi: 0.1, source: { text: 'x', libraryEntryId: ids.girt } }] },
      ],
    });
    expect(girt.status).toBe(422);
    expect(Object.keys(girt.body.error.fields)).toEqual(['parameters.0.entries.0.source.libraryEntryId']);

    const shapeless = await save({
      parameters: [{ kind: 'insulationProduct', layer, products: [{ name: 'No λ', source: 'x' }] }],
    });
    expect(shapeless.status).toBe(400);
    expect(Object.keys(shapeless.body.error.fields)).toEqual(['parameters.0.products.0.conductivity']);
    expect(await savedCount()).toBe(before);
  });

  it('the public sweep runs a product axis as a check run of the wall built with each product', async () => {
    const products = [
      { name: 'Demo PIR board', conductivity: 0.022, vapourResistanceFactor: 60, source: 'Demo sheet' },
      { name: 'Demo wood-fibre board', conductivity: 0.045, vapourResistanceFactor: 5, source: 'Demo sheet' },
    ];
    const s = demoSweep();
    const rows = [criteriaRow('max_u_factor', 0.35), criteriaRow('max_condensation_accumulation', 0.5)];
    const res = await t
      .anonymous()
      .post('/api/v1/calc/sweep')
      .send({
        ...s,
        rows,
        costs: undefined,
        parameters: [{ kind: 'insulationProduct', layer: 3, products }],
      });
    expect(res.status, res.text.slice(0, 300)).toBe(200);
    products.forEach((m, i) => {
      const built = demoAssembly();
      built.joints = s.assembly.joints;
      built.thermal.layers[3] = {
        ...built.thermal.layers[3]!,
        name: m.name,
        conductivity: m.conductivity,
      } as never;
      delete (built.thermal.layers[3] as { materialId?: string }).materialId;
      built.vapour![3] = { kind: 'mu', mu: m.vapourResistanceFactor };
      const direct = runChecks(built, s.project, rows);
      expect(res.body.variants[i].verdict).toBe(direct.verdict);
      expect(res.body.variants[i].checks.map((c: { margin: number }) => c.margin)).toEqual(
        direct.checks.map((c) => c.margin),
      );
    });
    const twice = await t
      .anonymous()
      .post('/api/v1/calc/sweep')
      .send({
        ...s,
        parameters: [{ kind: 'insulationProduct', layer: 3, products: [products[0], products[0]] }],
      });
    expect(twice.status).toBe(422);
    expect(Object.keys(twice.body.error.fields)).toEqual(['parameters.0.products.1.name']);
  });
});
