import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fixed, roundDecimal } from './rounding';

describe('one rounding rule for printed figures', () => {
  it('rounds the decimal as written, half away from zero', () => {
    expect(fixed(0.15, 1)).toBe('0.2');
    expect(fixed(3.35, 1)).toBe('3.4');
    expect(fixed(1.005, 2)).toBe('1.01');
    expect(fixed(-0.15, 1)).toBe('-0.2');
    expect(fixed(-0.01, 1)).toBe('0.0');
    expect(fixed(0.15, 2)).toBe('0.15');
    expect(roundDecimal(2.675, 2)).toBe(2.68);
  });

  it('never differs from the exact value by more than half a unit in the last place', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 6 }), (x, d) => {
        expect(Math.abs(roundDecimal(x, d) - x)).toBeLessThanOrEqual(
          0.5 * 10 ** -d * (1 + 1e-9) + Math.abs(x) * 1e-15,
        );
      }),
    );
  });
});
