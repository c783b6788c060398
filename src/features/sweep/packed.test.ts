import { demoSweep } from '@shared/sweep/examples';
import type { SweepVariantResult } from '@shared/sweep/schema';
import { runSweep } from '@shared/sweep/sweep';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { packVariants, unpackVariants } from './packed';

const round = (v: readonly SweepVariantResult[]) => unpackVariants(packVariants(v));

const checkFields = {
  id: fc.string(),
  status: fc.constantFrom('pass', 'fail', 'not_evaluated' as const),
  margin: fc.option(fc.double({ noNaN: true }), { nil: null }),
  marginRatio: fc.option(fc.double({ noNaN: true }), { nil: null }),
};
const plain = { noNullPrototype: true };
const check = fc.record(checkFields, plain);
const variant: fc.Arbitrary<SweepVariantResult> = fc.record(
  {
    index: fc.nat(),
    values: fc.array(fc.oneof(fc.double({ noNaN: true }), fc.string()), { maxLength: 3 }),
    verdict: fc.constantFrom('pass', 'fail', 'incomplete' as const),
    governing: fc.option(fc.record({ ...checkFields, label: fc.string() }, plain), { nil: null }),
    checks: fc.array(check, { maxLength: 6 }),
  },
  plain,
);

describe('variants packed into numbers for the trip from a worker (derived)', () => {
  it('unpack(pack(v)) is v for the demo sweep, key for key, in one Float64Array', () => {
    const { assembly, project, rows, parameters } = demoSweep();
    const { variants } = runSweep(assembly, project, rows, parameters, 1000);
    const packed = packVariants(variants);
    expect(packed.numbers).toBeInstanceOf(Float64Array);
    // Each check id once, not once per variant.
    expect(new Set(packed.strings).size).toBe(packed.strings.length);
    expect(round(variants)).toStrictEqual(variants);
  });

  it('holds for any variants: nulls, ±0 and ±∞, string values, no governing check (property)', () => {
    fc.assert(
      fc.property(fc.array(variant, { maxLength: 8 }), (vs) => {
        expect(round(vs)).toStrictEqual(vs);
      }),
    );
  });

  it('nothing packs to nothing', () => {
    expect(round([])).toEqual([]);
  });
});
