import { describe, expect, it } from 'vitest';
import { CalcInputError } from '../calc/errors';
import { demoSweep } from './examples';
import { rankVariants, variantCost } from './rank';
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
