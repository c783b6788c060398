import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { readPdf } from '../setup/pdf';

/** Collects a binary body (supertest buffers JSON and text only). */
const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

/**
 * A firm's sweep costs (library entries by firm role) and an assembly's saved sweeps: run on the server against
 * the current revision and a code table version, priced from the library, stale once the assembly changes,
 * compared, printed as an appendix of the compliance sheet.
 */
describe.each(testDatabases())('sweep costs and saved sweeps on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let orgId: string;
  let assembly: {
    id: string;
    version: number;
    current: { input: { thermal: { layers: { kind: string; name: string }[] } } };
  };
  let layer: number;
  let setId: string;
  const costs: Record<string, string> = {};
  const as = (who: string) => t.as(demoEmail(who));

  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const owner = await as('admin');
    orgId = (await owner.get('/api/me')).body.organisations[0].id;
    const list = (await owner.get(`/api/projects/${projectId}/assemblies`)).body.assemblies as {
      id: string;
    }[];
    assembly = (await owner.get(`/api/assemblies/${list[0]!.id}`)).body;
    layer = assembly.current.input.thermal.layers.findIndex(
      (l) => l.kind === 'homogeneous' && /wool|insulation|foam|core/i.test(l.name),
    );
    if (layer < 0) layer = assembly.current.input.thermal.layers.findIndex((l) => l.kind === 'homogeneous');
    const sets = (await owner.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets as {
      id: string;
    }[];
    setId = sets[0]!.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  const entry = { name: 'Mineral wool board (example)', cost: 4.5, currency: 'EUR', source: 'Example quote' };

  it('lets editors add and change cost entries, readers only read them, and refuses bad entries by field', async () => {
    const editor = await as('architect');
    const added = await editor
      .post(`/api/organisations/${orgId}/sweep-costs`)
      .send({ kind: 'insulation', ...entry });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ kind: 'insulation', cost: 4.5, version: 1 });
    costs.insulation = added.body.id;
    const clip = await editor
      .post(`/api/organisations/${orgId}/sweep-costs`)
      .send({ kind: 'clip', name: 'Clip (example)', cost: 6, currency: 'EUR' });
    costs.clip = clip.body.id;
    const reader = await as('viewer');
    expect((await reader.get(`/api/organisations/${orgId}/sweep-costs`)).body.costs).toHaveLength(2);
    expect(
      (await reader.post(`/api/organisations/${orgId}/sweep-costs`).send({ kind: 'girt', ...entry })).status,
    ).toBe(403);

    const changed = await editor
      .put(`/api/organisations/${orgId}/sweep-costs/${costs.insulation}`)
      .send({ kind: 'insulation', ...entry, cost: 5, version: 1 });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ cost: 5, version: 2 });
    const stale = await editor
      .put(`/api/organisations/${orgId}/sweep-costs/${costs.insulation}`)
      .send({ kind: 'insulation', ...entry, cost: 7, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ cost: 5, version: 2 });

    const noClass = await editor
      .post(`/api/organisations/${orgId}/sweep-costs`)
      .send({ kind: 'sealant', ...entry });
    expect(noClass.status).toBe(400);
    expect(Object.keys(noClass.body.error.fields)).toEqual(['movementClass']);
    const currency = await editor
      .post(`/api/organisations/${orgId}/sweep-costs`)
      .send({ kind: 'girt', ...entry, currency: 'euro' });
    expect(currency.status).toBe(400);
    expect(Object.keys(currency.body.error.fields)).toEqual(['currency']);
    const negative = await editor
      .post(`/api/organisations/${orgId}/sweep-costs`)
      .send({ kind: 'girt', ...entry, cost: -1 });
    expect(Object.keys(negative.body.error.fields)).toEqual(['cost']);
  });

  const parameters = () => [
    { kind: 'insulationThickness', layer, range: { start: 0.05, stop: 0.2, step: 0.025 } },
    { kind: 'clipChi', bridge: 0, list: [0.005, 0.02] },
  ];

  it('saves a sweep run against the current revision and code table version, priced from the library', async () => {
    const engineer = await as('engineer');
    const res = await engineer.post(`/api/assemblies/${assembly.id}/sweeps`).send({
      name: 'Insulation × clip',
      criteriaSetId: setId,
      parameters: parameters(),
      costEntries: { insulation: costs.insulation },
    });
    expect(res.status, res.text.slice(0, 300)).toBe(201);
    const s = res.body;
    expect(s).toMatchObject({ assemblyId: assembly.id, stale: false, assemblyRevision: s.currentRevision });
    expect(s.costs).toEqual({ insulation: 5 });
    expect(s.summary.count).toBe(14);
    expect(s.summary.exploration).toMatchObject({ mode: 'exhaustive', evaluated: 14, unexplored: 0 });
    const { pass, fail, incomplete } = s.summary.verdicts;
    expect(pass + fail + incomplete).toBe(14);
    expect(s.summary.points).toHaveLength(14);
    if (pass > 0) expect(s.summary.ranking.top[0].cost).toBeGreaterThan(0);
    const got = await (await as('viewer')).get(`/api/sweeps/${s.id}`);
    expect(got.body).toEqual(s);
    const list = await (await as('viewer')).get(`/api/assemblies/${assembly.id}/sweeps`);
    expect(list.body.sweeps.map((x: { id: string }) => x.id)).toContain(s.id);
    expect(
      (
        await (
          await as('viewer')
        )
          .post(`/api/assemblies/${assembly.id}/sweeps`)
          .send({ name: 'x', criteriaSetId: setId, parameters: parameters() })
      ).status,
    ).toBe(403);
  });

  it('refuses before any work: a zero step, a parameter the assembly lacks, a deleted cost entry, a missing price — each by field', async () => {
    const engineer = await as('engineer');
    const post = (body: object) =>
      engineer
        .post(`/api/assemblies/${assembly.id}/sweeps`)
        .send({ name: 'Bad', criteriaSetId: setId, parameters: parameters(), ...body });
    const zero = await post({
      parameters: [{ kind: 'insulationThickness', layer, range: { start: 0.05, stop: 0.1, step: 0 } }],
    });
    expect(zero.status).toBe(422);
    expect(Object.keys(zero.body.error.fields)).toEqual(['parameters.0.range.step']);
    const lacking = await post({ parameters: [{ kind: 'clipChi', bridge: 40, list: [0.01] }] });
    expect(Object.keys(lacking.body.error.fields)).toEqual(['parameters.0.bridge']);
    expect(
      (await (await as('admin')).delete(`/api/organisations/${orgId}/sweep-costs/${costs.clip}`)).status,
    ).toBe(204);
    const deleted = await post({ costEntries: { insulation: costs.insulation, clip: costs.clip } });
    expect(deleted.status).toBe(422);
    expect(deleted.body.error.fields).toEqual({
      'costEntries.clip': 'no such entry in the firm library (it may have been deleted)',
    });
    const unpriced = await post({ costs: { clip: 3 } });
    expect(unpriced.status).toBe(422);
    expect(Object.keys(unpriced.body.error.fields)).toEqual(['costs.insulation']);
    const table = await post({ criteriaSetId: '00000000-0000-4000-8000-000000000000' });
    expect(table.status).toBe(404);
    const before = (await engineer.get(`/api/assemblies/${assembly.id}/sweeps`)).body.sweeps.length;
    expect(before).toBe(1);
  });

  it('says a sweep is stale once the assembly has changed, and compares two saved sweeps', async () => {
    const engineer = await as('engineer');
    const first = (await engineer.get(`/api/assemblies/${assembly.id}/sweeps`)).body.sweeps[0];
    const now = (await engineer.get(`/api/assemblies/${assembly.id}`)).body;
    const saved = await engineer.put(`/api/assemblies/${assembly.id}`).send({
      version: now.version,
      note: 'thicker sheathing',
      input: { ...now.current.input, name: `${now.current.input.name} (changed)` },
    });
    expect(saved.status).toBe(200);
    const stale = (await engineer.get(`/api/sweeps/${first.id}`)).body;
    expect(stale).toMatchObject({
      stale: true,
      assemblyRevision: first.assemblyRevision,
      currentRevision: saved.body.revision,
    });
    const second = await engineer
      .post(`/api/assemblies/${assembly.id}/sweeps`)
      .send({ name: 'Again', criteriaSetId: setId, parameters: parameters(), costs: { insulation: 4 } });
    expect(second.body.stale).toBe(false);
    const cmp = await engineer.get(
      `/api/assemblies/${assembly.id}/sweeps/compare?from=${first.id}&to=${second.body.id}`,
    );
    expect(cmp.status).toBe(200);
    expect(cmp.body.sameParameters).toBe(true);
    expect(cmp.body.changes.join('; ')).toContain(
      `assembly revision ${first.assemblyRevision} → ${saved.body.revision}`,
    );
    const bad = await engineer.get(`/api/assemblies/${assembly.id}/sweeps/compare?from=${first.id}&to=nope`);
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['query.to']);
  });

  it('searches a saved sweep larger than SWEEP_MAX_VARIANTS within that many, and keeps what it explored', async () => {
    const res = await (await as('engineer')).post(`/api/assemblies/${assembly.id}/sweeps`).send({
      name: 'Fine thickness',
      criteriaSetId: setId,
      parameters: [
        { kind: 'insulationThickness', layer, range: { start: 0.01, stop: 0.3, step: 0.0005 } },
        { kind: 'clipChi', bridge: 0, list: [0.005, 0.02] },
      ],
    });
    expect(res.status, res.text.slice(0, 300)).toBe(201);
    const e = res.body.summary.exploration;
    expect(res.body.summary.count).toBe(1162);
    expect(e.mode).toBe('bounded');
    expect(e.evaluated).toBeLessThanOrEqual(500);
    expect(e.evaluated + e.provenFailing + e.costlier + e.unexplored).toBe(1162);
  });

  it('prints a saved sweep as an appendix of the compliance sheet', async () => {
    const engineer = await as('engineer');
    const sweep = (await engineer.get(`/api/assemblies/${assembly.id}/sweeps`)).body.sweeps[0];
    const run = (
      await engineer.post(`/api/assemblies/${assembly.id}/check-runs`).send({ criteriaSetId: setId })
    ).body;
    const res = await engineer
      .get(`/api/check-runs/${run.id}/sheet.pdf?units=SI&sweep=${sweep.id}`)
      .buffer(true)
      .parse(binary);
    expect(res.status).toBe(200);
    const { text } = await readPdf(res.body as Buffer);
    expect(text).toContain(`Appendix: sweep “${sweep.name}”`);
    expect(text).toContain('Margin of the governing check against insulation thickness');
    expect(text).toContain('this sheet certifies only the assembly as checked above');
    const plain = await engineer
      .get(`/api/check-runs/${run.id}/sheet.pdf?units=SI`)
      .buffer(true)
      .parse(binary);
    expect((await readPdf(plain.body as Buffer)).text).not.toContain('Appendix: sweep');
    const missing = await engineer.get(
      `/api/check-runs/${run.id}/sheet.pdf?sweep=00000000-0000-4000-8000-000000000000`,
    );
    expect(missing.status).toBe(404);
  });

  it('deletes a saved sweep (assembly writers), and documents every route in the OpenAPI document', async () => {
    const engineer = await as('engineer');
    const sweep = (await engineer.get(`/api/assemblies/${assembly.id}/sweeps`)).body.sweeps[0];
    expect((await (await as('viewer')).delete(`/api/sweeps/${sweep.id}`)).status).toBe(403);
    expect((await engineer.delete(`/api/sweeps/${sweep.id}`)).status).toBe(204);
    expect((await engineer.get(`/api/sweeps/${sweep.id}`)).status).toBe(404);
    const doc = (await t.anonymous().get('/api/openapi.json')).body;
    for (const path of [
      '/api/organisations/{orgId}/sweep-costs',
      '/api/organisations/{orgId}/sweep-costs/{itemId}',
      '/api/assemblies/{assemblyId}/sweeps',
      '/api/assemblies/{assemblyId}/sweeps/compare',
      '/api/sweeps/{sweepId}',
    ])
      expect(doc.paths[path], path).toBeDefined();
  });
});
