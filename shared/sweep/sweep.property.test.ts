import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MOVEMENT_CLASSES } from '../calc/joints/schema';
import { criteriaRow, demoAssembly, demoProject } from '../checks/fixtures';
import { runChecks } from '../checks/runner';
import type { SweepParameter } from './schema';
import { applyVariant, runSweep, variantResult } from './sweep';

/** Two or three parameters of the demo assembly with a few values each (at most 3 × 3 × 2 variants). */
const parametersArb: fc.Arbitrary<SweepParameter[]> = fc
  .tuple(
    fc.double({ min: 0.01, max: 0.15, noNaN: true }),
    fc.double({ min: 0.005, max: 0.05, noNaN: true }),
    fc.uniqueArray(fc.constantFrom(0.3, 0.6, 0.8, 1.1, 1.5), { minLength: 1, maxLength: 3 }),
    fc.uniqueArray(fc.constantFrom(...MOVEMENT_CLASSES), { minLength: 1, maxLength: 2 }),
    fc.option(fc.uniqueArray(fc.constantFrom(0.005, 0.03, 0.2), { minLength: 1, maxLength: 2 }), {
      nil: undefined,
    }),
  )
  .map(([start, step, clips, classes, chis]) => [
    { kind: 'insulationThickness', layer: 3, range: { start, stop: start + 2 * step, step } },
    { kind: 'clipSpacing', list: clips },
    chis ? { kind: 'clipChi', bridge: 0, list: chis } : { kind: 'sealantClass', list: classes },
  ]);

describe('a sweep gives what the runner gives on each variant’s assembly', () => {
  it('a sampled variant equals runChecks on the applied document (verdict, governing check, every margin)', () => {
    const rows = [
      criteriaRow('max_u_factor', 0.3),
      criteriaRow('max_condensation_accumulation', 0.5),
      criteriaRow('min_sealant_movement_class', 35),
    ];
    fc.assert(
      fc.property(parametersArb, fc.nat(), (parameters, pick) => {
        const a = demoAssembly();
        const r = runSweep(a, demoProject(), rows, parameters, 100);
        const v = r.variants[pick % r.count]!;
        const direct = runChecks(applyVariant(r.plan, a, v.values), demoProject(), rows);
        expect(v).toEqual(variantResult(v.index, v.values, direct));
      }),
      { numRuns: 12 },
    );
  });
});
