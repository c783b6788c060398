import { demoSweep } from '@shared/sweep/examples';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../setup/app';

/** POST /api/v1/calc/sweep: stateless, so one database is enough. */
describe('sweep API', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp('pglite');
  });
  afterAll(async () => {
    await t?.close();
  });
  const post = (body: object) => t.anonymous().post('/api/v1/calc/sweep').send(body);

  it('checks every variant of the demo sweep and ranks the passing ones by cost', async () => {
    const res = await post(demoSweep());
    expect(res.status).toBe(200);
    expect(res.body.count).toBe(24);
    expect(res.body.variants).toHaveLength(24);
    expect(res.body.parameters[1]).toEqual({ kind: 'clipSpacing', values: [0.4, 0.6, 0.8, 1] });
    const v = res.body.variants[0];
    expect(v.values).toEqual([0.025, 0.4]);
    expect(v.verdict).toBe('fail');
    expect(v.governing.id).toBe('criterion.max_u_factor');
    const { ranked, runnerUp } = res.body.ranking;
    expect(ranked.length).toBeGreaterThan(1);
    expect(ranked[1].cost - ranked[0].cost).toBeCloseTo(runnerUp.costDifference, 9);
    const { costs: _, ...withoutCosts } = demoSweep();
    expect((await post(withoutCosts)).body.ranking).toBeNull();
  });

  it('prices each insulation product on its own, and refuses one without a price (422 at its field)', async () => {
    // Invented demo products and prices; the demo wall's layer 3 is 100 mm: 7 × 4 = 28 and 5 × 4 = 20 (derived).
    const products = [
      { name: 'Demo PIR board', conductivity: 0.022, vapourResistanceFactor: 60, source: 'Demo (invented)' },
      { name: 'Demo slab', conductivity: 0.034, vapourResistanceFactor: 1.3, source: 'Demo (invented)' },
    ];
    const body = (insulationProducts: Record<string, number>) => ({
      ...demoSweep(),
      parameters: [{ kind: 'insulationProduct', layer: 3, products }],
      costs: { insulationProducts },
    });
    const res = await post(body({ 'Demo PIR board': 7, 'Demo slab': 5 }));
    expect(res.status).toBe(200);
    const costOf = Object.fromEntries(
      res.body.ranking.ranked.map((r: { values: string[]; cost: number }) => [r.values[0], r.cost]),
    );
    expect(res.body.ranking.ranked.map((r: { values: string[] }) => r.values[0])).toEqual([
      'Demo slab',
      'Demo PIR board',
    ]);
    expect(costOf['Demo slab']).toBeCloseTo(20, 9);
    expect(costOf['Demo PIR board']).toBeCloseTo(28, 9);
    const unpriced = await post(body({ 'Demo PIR board': 7 }));
    expect(unpriced.status).toBe(422);
    expect(Object.keys(unpriced.body.error.fields)).toEqual(['costs.insulationProducts.Demo slab']);
  });

  it('refuses a zero step (422) and a parameter the assembly lacks (422), naming the field', async () => {
    const s = demoSweep();
    const zero = await post({
      ...s,
      parameters: [{ kind: 'insulationThickness', layer: 3, range: { start: 0.05, stop: 0.1, step: 0 } }],
    });
    expect(zero.status).toBe(422);
    expect(zero.body.error.code).toBe('invalid_input');
    expect(Object.keys(zero.body.error.fields)).toEqual(['parameters.0.range.step']);
    const missing = await post({ ...s, parameters: [{ kind: 'clipChi', bridge: 9, list: [0.01] }] });
    expect(missing.status).toBe(422);
    expect(Object.keys(missing.body.error.fields)).toEqual(['parameters.0.bridge']);
    const four = await post({ ...s, parameters: [...s.parameters, ...s.parameters] });
    expect(four.status).toBe(400);
    expect(Object.keys(four.body.error.fields)).toEqual(['parameters']);
  });

  it('refuses more variants than SWEEP_MAX_VARIANTS with 413 too_much_work naming parameters', async () => {
    const res = await post({
      ...demoSweep(),
      parameters: [
        { kind: 'insulationThickness', layer: 3, range: { start: 0.01, stop: 0.2, step: 0.00005 } },
      ],
    });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_much_work');
    expect(res.body.error.fields.parameters).toMatch(/^at most 500 variants \(got 38\d\d\); vary fewer/);
  });

  it('searches a space of over 100 000 variants with mode "search", saying what was and was not explored', async () => {
    const res = await post({
      ...demoSweep(),
      mode: 'search',
      parameters: [
        { kind: 'insulationThickness', layer: 3, range: { start: 0.01, stop: 0.3, step: 0.0005 } },
        { kind: 'clipSpacing', range: { start: 0.3, stop: 1.5, step: 0.01 } },
        { kind: 'sealantClass', list: ['25', '50'] },
      ],
      costs: { insulation: 4.5, clip: 6, sealant: { perMetre: { 25: 3, 50: 5 }, metresPerSquareMetre: 0.5 } },
    });
    expect(res.status).toBe(200);
    expect(res.body.count).toBe(581 * 121 * 2);
    const e = res.body.exploration;
    expect(e.mode).toBe('bounded');
    expect(e.evaluated).toBeLessThanOrEqual(500);
    expect(res.body.variants).toHaveLength(e.evaluated);
    expect(e.evaluated + e.provenFailing + e.costlier + e.unexplored).toBe(res.body.count);
    expect(e.notes.length).toBeGreaterThan(1);
  });

  it('refuses a varied thing without a price before anything runs (422, the cost named)', async () => {
    const res = await post({
      ...demoSweep(),
      parameters: [...demoSweep().parameters, { kind: 'sealantClass', list: ['25', '50'] }],
      costs: { insulation: 4.5, clip: 6, sealant: { perMetre: { 25: 3 }, metresPerSquareMetre: 0.5 } },
    });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields)).toEqual(['costs.sealant.perMetre.50']);
  });

  it('is in the OpenAPI document', async () => {
    const doc = (await t.anonymous().get('/api/openapi.json')).body;
    expect(doc.paths['/api/v1/calc/sweep'].post).toBeDefined();
  });
});
