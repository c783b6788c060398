import { demoComputedGirt } from '@shared/calc/bridge/examples';
import { ENGINE_VERSION } from '@shared/calc/trace';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { readPdf } from '../setup/pdf';

const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

/**
 * A computed bridge on the compliance sheet: the demo assembly's girt with its ψ computed (the demo girt detail,
 * stored on the bridge as the Solve dialog stores it), checked, and the sheet read back with pdfjs.
 */
describe.each(testDatabases())('computed bridges on the compliance sheet on %s', (kind) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp(kind);
  });
  afterAll(async () => {
    await t?.close();
  });

  it('prints the detail drawn to scale, its map, ψ, mesh, energy balance and the surface check at the girt', async () => {
    const projectId = await t.demoProjectId();
    const architect = await t.as(demoEmail('architect'));
    const a = (await architect.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0];
    const full = (await architect.get(`/api/assemblies/${a.id}`)).body;
    const computed = demoComputedGirt(ENGINE_VERSION);
    const text = `computed by Skinwright ${ENGINE_VERSION}, mesh ${computed.cells} cells, ${computed.date}`;
    const input = structuredClone(full.current.input);
    const girt = input.thermal.bridges.findIndex((b: { kind: string }) => b.kind === 'linear');
    input.thermal.bridges[girt] = {
      ...input.thermal.bridges[girt],
      psi: computed.value,
      source: { text, computed },
    };
    const saved = await architect
      .put(`/api/assemblies/${a.id}`)
      .send({ version: full.version, note: 'girt ψ computed', input });
    expect(saved.status).toBe(200);

    const sets = (await architect.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets;
    const setId = sets.find((s: { name: string }) => s.name.startsWith('Illustrative example')).id;
    const run = await architect.post(`/api/assemblies/${a.id}/check-runs`).send({ criteriaSetId: setId });
    expect(run.status).toBe(201);
    // The moisture module checks the surface at the girt with f_Rsi of its Rsi 0.25 solve.
    const checks = run.body.outputs.checks as { id: string; provided: number }[];
    expect(checks.find((c) => c.id === 'moisture.surface.bridge.0')?.provided).toBe(computed.surface.fRsi);

    const pdf = await architect
      .get(`/api/check-runs/${run.body.id}/sheet.pdf?units=SI`)
      .buffer(true)
      .parse(binary);
    expect(pdf.status).toBe(200);
    // Lines of a wrapped paragraph joined by single spaces.
    const sheet = (await readPdf(pdf.body as Buffer)).text.replace(/\s+/g, ' ');
    expect(sheet).toContain('THERMAL BRIDGES COMPUTED HERE (ISO 10211)');
    expect(sheet).toMatch(/Horizontal girts — ψ 0\.\d+/);
    expect(sheet).toMatch(/Section, 1:\d+/);
    expect(sheet).toContain('Temperature map');
    expect(sheet).toContain(`Mesh ${computed.cells.toLocaleString('en-GB')} cells`);
    expect(sheet).toMatch(/energy balance \S+ % of the heat flow/);
    expect(sheet).toContain(`f_Rsi ${computed.fRsi.toFixed(3)}`);
    expect(sheet).toContain(text);
    expect(sheet).toMatch(/Interior surface at Horizontal girts/);
  }, 120_000);
});
