import { demoGirtModel, demoGirtWallU } from '@shared/calc/bridge/examples';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../setup/app';

/** POST /api/v1/calc/bridge: stateless, so one database is enough. */
describe('thermal bridge solve API', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp('pglite');
  });
  afterAll(async () => {
    await t?.close();
  });
  const post = (body: object) => t.anonymous().post('/api/v1/calc/bridge').send(body);

  it('solves the demo girt: ψ against the wall without it, balance within 0.1 %, no field unless asked', async () => {
    const res = await post(demoGirtModel());
    expect(res.status).toBe(200);
    expect(res.body.psi).toBeGreaterThan(0);
    expect(res.body.coupling - res.body.psi).toBeCloseTo(demoGirtWallU() * 0.6, 9);
    expect(res.body.solver.energyBalance).toBeLessThan(1e-3);
    expect(res.body.fRsi).toBeGreaterThan(0);
    expect(res.body.fRsi).toBeLessThan(1);
    expect(res.body.field).toBeNull();
    const withField = await post({ ...demoGirtModel(), field: true });
    expect(withField.body.field).toHaveLength(withField.body.cells);
  });

  it('refuses impossible input with the field: overlapping materials (422), λ ≤ 0 (400)', async () => {
    const model = demoGirtModel();
    model.boxes.push({ name: 'stray stud', lambda: 50, min: [0.1, 0.01], max: [0.12, 0.05] });
    const overlap = await post(model);
    expect(overlap.status).toBe(422);
    expect(overlap.body.error.code).toBe('invalid_input');
    expect(Object.keys(overlap.body.error.fields)).toEqual(['boxes.9']);
    const zero = demoGirtModel();
    zero.boxes[0]!.lambda = 0;
    const res = await post(zero);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['boxes.0.lambda']);
  });

  it('refuses a grid over BRIDGE_MAX_CELLS with 413 too_much_work naming mesh', async () => {
    const res = await post(
      demoGirtModel({ interfaceCell: 0.0001, maxCell: 0.001, growth: 1.05, subdivide: 4 }),
    );
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_much_work');
    expect(res.body.error.fields.mesh).toMatch(/^at most 250000 grid cells \(got \d+\)/);
  });

  it('is in the OpenAPI document with its example', async () => {
    const doc = (await t.anonymous().get('/api/openapi.json')).body;
    expect(doc.paths['/api/v1/calc/bridge'].post).toBeDefined();
  });
});
