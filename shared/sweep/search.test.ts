import { describe, expect, it } from 'vitest';
import { criteriaRow, demoAssembly, demoProject } from '../checks/fixtures';
import type { SweepParameter } from './schema';
import { failsThermally, searchSweep } from './search';
import { runSweep } from './sweep';

const rows = [
  criteriaRow('max_u_factor', 0.3),
  criteriaRow('max_condensation_accumulation', 0.5),
  criteriaRow('min_sealant_movement_class', 25),
];
const a = { ...demoAssembly(), joints: demoAssembly().joints?.slice(0, 1) };
const parameters: SweepParameter[] = [
  { kind: 'insulationThickness', layer: 3, range: { start: 0.01, stop: 0.2, step: 0.005 } },
  { kind: 'clipSpacing', list: [0.4, 0.6, 0.8, 1.0, 1.2] },
];
/** The thinnest passing variant of each clip spacing (by its position in the list), from a whole sweep. */
const thinnestPassing = (variants: { values: (number | string)[]; verdict: string }[]) => {
  const best = new Map<number | string, number>();
  for (const v of variants)
    if (v.verdict === 'pass' && !(best.get(v.values[1]!)! <= (v.values[0] as number)))
      best.set(v.values[1]!, v.values[0] as number);
  return best;
};

describe('searching a sweep larger than its budget', () => {
  const whole = runSweep(a, demoProject(), rows, parameters, 10_000);

  it('runs every variant when the sweep fits the budget, and says so', () => {
    const r = searchSweep(a, demoProject(), rows, parameters, 1000);
    expect(r.exploration).toMatchObject({ mode: 'exhaustive', evaluated: 195, unexplored: 0 });
    expect(r.variants).toEqual(whole.variants);
  });

  it('finds the thinnest passing variant of every clip spacing as the whole sweep does, running far fewer', () => {
    const r = searchSweep(a, demoProject(), rows, parameters, 100);
    const e = r.exploration;
    expect(e.mode).toBe('bounded');
    expect(e.evaluated).toBeLessThanOrEqual(100);
    expect(e.evaluated + e.provenFailing + e.costlier + e.unexplored).toBe(195);
    expect(e.unexplored).toBe(0);
    expect(thinnestPassing(r.variants)).toEqual(thinnestPassing(whole.variants));
    // Every variant it ran is the whole sweep's variant of that index.
    for (const v of r.variants) expect(v).toEqual(whole.variants[v.index]);
    // What it ruled out by the property does fail a thermal criterion in the whole sweep.
    const ran = new Set(r.variants.map((v) => v.index));
    const ruledOut = whole.variants.filter(
      (v) =>
        !ran.has(v.index) && (v.values[0] as number) < thinnestPassing(whole.variants).get(v.values[1]!)!,
    );
    expect(ruledOut.every((v) => v.verdict !== 'pass')).toBe(true);
    expect(ruledOut.filter(failsThermally)).toHaveLength(e.provenFailing);
  });

  it('never runs more than its budget, and counts what the budget left unexplored', () => {
    const r = searchSweep(a, demoProject(), rows, parameters, 12);
    expect(r.variants.length).toBeLessThanOrEqual(12);
    const e = r.exploration;
    expect(e.evaluated).toBe(r.variants.length);
    expect(e.unexplored).toBeGreaterThan(0);
    expect(e.evaluated + e.provenFailing + e.costlier + e.unexplored).toBe(195);
    expect(e.notes.join(' ')).toMatch(/not explored/);
  });

  it('samples evenly when no insulation thickness is varied, and says the rest was not explored', () => {
    const r = searchSweep(
      a,
      demoProject(),
      rows,
      [
        { kind: 'clipSpacing', range: { start: 0.3, stop: 1.5, step: 0.01 } },
        { kind: 'sealantClass', list: ['25', '50'] },
      ],
      50,
    );
    expect(r.count).toBe(242);
    expect(r.exploration).toMatchObject({ mode: 'bounded', evaluated: 49, unexplored: 193 });
  });

  it('takes a space of over 100 000 combinations, within the budget', () => {
    const r = searchSweep(
      a,
      demoProject(),
      rows,
      [
        { kind: 'insulationThickness', layer: 3, range: { start: 0.01, stop: 0.3, step: 0.0005 } },
        { kind: 'clipSpacing', range: { start: 0.3, stop: 1.5, step: 0.01 } },
        { kind: 'sealantClass', list: ['25', '50'] },
      ],
      1500,
    );
    expect(r.count).toBe(581 * 121 * 2);
    const e = r.exploration;
    expect(e.evaluated).toBeLessThanOrEqual(1500);
    expect(e.evaluated + e.provenFailing + e.costlier + e.unexplored).toBe(r.count);
    expect(r.variants.some((v) => v.verdict === 'pass')).toBe(true);
  });
});
