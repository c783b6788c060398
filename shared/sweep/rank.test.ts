import { describe, expect, it } from 'vitest';
import { CalcInputError } from '../calc/errors';
import { demoSweep } from './examples';
import { measureOf, rankBy, rankVariants, variantCost, variantThickness, variantWeight } from './rank';
import type { SweepProduct, SweepVariantResult } from './schema';
import { planSweep, runSweep } from './sweep';

describe('ranking the passing variants by cost', () => {
  const s = demoSweep();
  const costs = { insulation: 4.5, clip: 6, girt: 9 };

  it('prices what varies per m² of wall: d/25 mm of insulation, clips 1/(s_girt·s_clip), girts 1/s_girt', () => {
    const plan = planSweep(s.assembly, s.parameters, 100);
    // 100 mm at 4.5 per 25 mm = 18; clips at 0.8 m along girts 1.2 m apart: 6/(1.2·0.8) = 6.25 (derived).
    expect(variantCost(plan, s.assembly, [0.1, 0.8], costs)).toBeCloseTo(18 + 6.25, 12);
    const girts = planSweep(s.assembly, [{ kind: 'girtSpacing', list: [0.9, 1.5] }], 10);
    // Girts 1.5 m apart: 9/1.5 = 6 per m², clips 6/(1.5·0.8) = 5 (derived).
    expect(variantCost(girts, s.assembly, [1.5], costs)).toBeCloseTo(11, 12);
    const sealant = planSweep(s.assembly, [{ kind: 'sealantClass', list: ['25', '50'] }], 10);
    const priced = { sealant: { perMetre: { '25': 2, '50': 3.5 }, metresPerSquareMetre: 0.8 } };
    expect(variantCost(sealant, s.assembly, ['50'], priced)).toBeCloseTo(2.8, 12);
  });

  it('refuses a varied quantity without its cost, naming it', () => {
    const plan = planSweep(s.assembly, s.parameters, 100);
    expect(() => variantCost(plan, s.assembly, [0.1, 0.8], { clip: 6 })).toThrow(CalcInputError);
    try {
      variantCost(plan, s.assembly, [0.1, 0.8], { clip: 6 });
    } catch (e) {
      expect((e as CalcInputError).field).toBe('costs.insulation');
    }
  });

  it('ranks only passing variants, cheapest first, with what governs and how close the runner-up is', () => {
    const r = runSweep(s.assembly, s.project, s.rows, s.parameters, 100);
    const ranking = rankVariants(r.plan, s.assembly, r.variants, costs);
    const passing = r.variants.filter((v) => v.verdict === 'pass');
    expect(ranking.ranked).toHaveLength(passing.length);
    expect(ranking.notPassing).toBe(r.count - passing.length);
    expect(ranking.ranked.length).toBeGreaterThan(1);
    for (let i = 1; i < ranking.ranked.length; i++)
      expect(ranking.ranked[i]!.cost).toBeGreaterThanOrEqual(ranking.ranked[i - 1]!.cost);
    const [first, second] = ranking.ranked;
    expect(ranking.runnerUp!.costDifference).toBeCloseTo(second!.cost - first!.cost, 12);
    expect(ranking.runnerUp!.costRatio).toBeCloseTo((second!.cost - first!.cost) / first!.cost, 12);
    expect(first!.governing!.status).toBe('pass');
    // Thin insulation fails U ≤ 0.35: the cheapest passing wall is not the thinnest.
    expect(r.variants[0]!.verdict).toBe('fail');
    expect(r.variants[0]!.governing!.id).toBe('criterion.max_u_factor');
  });

  it('has no runner-up with fewer than two passing variants', () => {
    const r = runSweep(s.assembly, s.project, s.rows, [s.parameters[0]!], 100);
    const one = rankVariants(r.plan, s.assembly, r.variants.slice(-1), costs);
    expect(one.runnerUp).toBeNull();
  });
});

/** A passing variant built by hand (what governs it invented: the ranking only carries it). */
const passing = (index: number, values: (number | string)[]): SweepVariantResult => ({
  index,
  values,
  verdict: 'pass',
  governing: {
    id: 'criterion.max_u_factor',
    label: 'U-factor',
    status: 'pass',
    margin: 0.01,
    marginRatio: 0.03,
  },
  checks: [],
});

describe('each insulation product at its own price', () => {
  const s = demoSweep();
  // Invented demo products and prices; layer 3 is the demo wall's 100 mm mineral wool board.
  const products: SweepProduct[] = [
    { name: 'Demo PIR board', conductivity: 0.022, density: 32, source: 'Demo data sheet (invented)' },
    { name: 'Demo wood-fibre board', conductivity: 0.045, source: 'Demo data sheet (invented)' },
  ];
  const byProduct = { kind: 'insulationProduct' as const, layer: 3, products };
  const prices = { insulationProducts: { 'Demo PIR board': 7, 'Demo wood-fibre board': 5 } };

  it('prices the product on the layer’s own thickness when no thickness parameter varies that layer', () => {
    const plan = planSweep(s.assembly, [byProduct], 10);
    // 100 mm at 7 per 25 mm = 28; at 5 = 20 (derived).
    expect(variantCost(plan, s.assembly, ['Demo PIR board'], prices)).toBeCloseTo(28, 12);
    expect(variantCost(plan, s.assembly, ['Demo wood-fibre board'], prices)).toBeCloseTo(20, 12);
  });

  it('prices it on the thickness parameter’s value on the same layer, once (no insulation price needed)', () => {
    const thick = { kind: 'insulationThickness' as const, layer: 3, list: [0.05, 0.15] };
    const plan = planSweep(s.assembly, [thick, byProduct], 10);
    // 150 mm of the PIR board at 7 per 25 mm = 42 (derived); `costs.insulation` is not asked for nor added.
    expect(variantCost(plan, s.assembly, [0.15, 'Demo PIR board'], prices)).toBeCloseTo(42, 12);
    expect(
      variantCost(plan, s.assembly, [0.15, 'Demo PIR board'], { ...prices, insulation: 100 }),
    ).toBeCloseTo(42, 12);
    // A thickness of another layer (the gypsum sheathing, 4) is priced at `costs.insulation` as before:
    // 42 + 4·0.05/0.025 = 42 + 8 = 50 (derived).
    const other = planSweep(s.assembly, [{ ...thick, layer: 4 }, { ...byProduct }], 10);
    const both = { ...prices, insulation: 4 };
    expect(variantCost(other, s.assembly, [0.05, 'Demo PIR board'], both)).toBeCloseTo(28 + 8, 12);
  });

  it('refuses a product without a price, naming its field', () => {
    const plan = planSweep(s.assembly, [byProduct], 10);
    const priced = { insulationProducts: { 'Demo PIR board': 7 } };
    expect(() => variantCost(plan, s.assembly, ['Demo wood-fibre board'], priced)).toThrow(
      expect.objectContaining({ field: 'costs.insulationProducts.Demo wood-fibre board' }),
    );
    expect(() => variantCost(plan, s.assembly, ['Demo PIR board'], {})).toThrow(
      expect.objectContaining({ field: 'costs.insulationProducts.Demo PIR board' }),
    );
    // A product's name is never read off an object's prototype (no NaN for a product called "toString").
    const odd = planSweep(
      s.assembly,
      [{ ...byProduct, products: [{ ...products[0]!, name: 'toString' }] }],
      10,
    );
    expect(() => variantCost(odd, s.assembly, ['toString'], prices)).toThrow(
      expect.objectContaining({ field: 'costs.insulationProducts.toString' }),
    );
  });

  it('ranks two products apart by their own prices', () => {
    const plan = planSweep(s.assembly, [byProduct], 10);
    const r = rankBy(
      [passing(0, ['Demo PIR board']), passing(1, ['Demo wood-fibre board'])],
      measureOf('cost', plan, s.assembly, prices),
    );
    expect(r.ranked.map((v) => v.values[0])).toEqual(['Demo wood-fibre board', 'Demo PIR board']);
    expect(r.runnerUp).toEqual({ difference: 8, ratio: 0.4 });
  });
});

describe('ranking by wall thickness and by weight', () => {
  const s = demoSweep();
  // Steel face 0.7 mm, ventilated cavity 25 mm, mineral wool board, exterior gypsum 15.9 mm (the demo wall's
  // layers 0, 1, 3, 4 — each homogeneous one a generic material with its density).
  const wall = {
    ...s.assembly,
    vapour: undefined,
    thermal: { ...s.assembly.thermal, layers: [0, 1, 3, 4].map((i) => s.assembly.thermal.layers[i]!) },
  };
  const thick = planSweep(wall, [{ kind: 'insulationThickness', layer: 2, list: [0.05, 0.1, 0.15] }], 10);
  const variants = [passing(0, [0.05]), passing(1, [0.1]), passing(2, [0.15])];

  it('sums the layers’ thicknesses (hand-computed)', () => {
    // 0.0007 + 0.025 + 0.05 + 0.0159 = 0.0916 m (derived).
    expect(variantThickness(thick, wall, [0.05])).toBeCloseTo(0.0916, 12);
    const r = rankBy([...variants].reverse(), measureOf('thickness', thick, wall, {}));
    expect(r.ranked.map((v) => v.index)).toEqual([0, 1, 2]);
    expect(r.ranked[0]!.governing!.label).toBe('U-factor');
    // Runner-up 0.05 m thicker: 0.05/0.0916 (derived).
    expect(r.runnerUp!.difference).toBeCloseTo(0.05, 12);
    expect(r.runnerUp!.ratio).toBeCloseTo(0.05 / 0.0916, 12);
  });

  it('sums d·ρ of the layers (hand-computed), the air layer 0', () => {
    // ρ from data/reference/materials.json: steel 7800 (ISO 10456:2007 Table 3), mineral wool board 130
    // (ASHRAE Fundamentals 2021 ch. 26 Table 1), gypsum board 900 (ISO 10456:2007 Table 3) [third-party].
    // 0.0007·7800 + 0.05·130 + 0.0159·900 = 5.46 + 6.5 + 14.31 = 26.27 kg/m² (derived).
    expect(variantWeight(thick, wall, [0.05])).toBeCloseTo(26.27, 9);
    const r = rankBy(variants, measureOf('weight', thick, wall, {}));
    // Each 50 mm more mineral wool is 0.05·130 = 6.5 kg/m² more (derived).
    expect(r.runnerUp!.difference).toBeCloseTo(6.5, 9);
  });

  it('weighs a varied product by its own density, and refuses one without', () => {
    const products: SweepProduct[] = [
      { name: 'Demo PIR board', conductivity: 0.022, density: 32, source: 'Demo data sheet (invented)' },
      { name: 'Demo board without ρ', conductivity: 0.03, source: 'Demo data sheet (invented)' },
    ];
    const plan = planSweep(wall, [{ kind: 'insulationProduct', layer: 2, products }], 10);
    // 5.46 + 0.1·32 + 14.31 = 22.97 kg/m² (derived).
    expect(variantWeight(plan, wall, ['Demo PIR board'])).toBeCloseTo(22.97, 9);
    expect(() => variantWeight(plan, wall, ['Demo board without ρ'])).toThrow(
      /layer 3 \(Mineral wool board\), Demo board without ρ, has no density/,
    );
  });

  it('refuses weight when a layer has no density, naming the layer', () => {
    // The demo wall's water-resistive barrier is a resistance layer: it carries no density.
    const plan = planSweep(s.assembly, [s.parameters[0]!], 10);
    expect(() => variantWeight(plan, s.assembly, [0.1])).toThrow(
      expect.objectContaining({ field: 'thermal.layers.2' }),
    );
    expect(() => variantWeight(plan, s.assembly, [0.1])).toThrow(
      /layer 3 \(Water-resistive barrier\) has no density/,
    );
  });
});
