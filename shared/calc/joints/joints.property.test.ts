import { celsiusToFahrenheit, deltaFahrenheitToKelvin, fahrenheitToCelsius, INCH } from '@shared/units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculateJoint, MOVEMENT_CAPABILITY, sealantDepth } from './joints';
import { type JointInput, MOVEMENT_CLASSES } from './schema';

const length = fc.double({ min: 0.1, max: 20, noNaN: true });
const alpha = fc.double({ min: 1e-6, max: 1e-4, noNaN: true });

/** A valid one- or two-sided joint with installation inside the surface range. */
const anyJoint: fc.Arbitrary<JointInput> = fc
  .record({
    sides: fc.array(fc.record({ alpha, length }), { minLength: 1, maxLength: 2 }),
    min: fc.double({ min: -40, max: 10, noNaN: true }),
    span: fc.double({ min: 5, max: 110, noNaN: true }),
    installAt: fc.double({ min: 0, max: 1, noNaN: true }),
    installSpread: fc.double({ min: 0, max: 1, noNaN: true }),
    extension: fc.double({ min: 0, max: 0.01, noNaN: true }),
    compression: fc.double({ min: 0, max: 0.01, noNaN: true }),
    movementClass: fc.constantFrom(...MOVEMENT_CLASSES),
    tolerance: fc.double({ min: 0, max: 0.01, noNaN: true }),
    designWidth: fc.double({ min: 0.003, max: 0.1, noNaN: true }),
  })
  .map((p): JointInput => {
    const max = p.min + p.span;
    const lo = p.min + p.installAt * p.span;
    const hi = lo + p.installSpread * (max - lo);
    return {
      name: 'Property joint',
      type: 'other',
      designWidth: p.designWidth,
      sides: p.sides,
      surfaceTemperatureRange: { min: p.min, max },
      installationTemperature: { min: lo, max: hi },
      otherMovement: { extension: p.extension, compression: p.compression },
      sealant: { movementClass: p.movementClass },
      constructionTolerance: p.tolerance,
    };
  });

const width = (j: JointInput) => calculateJoint(j).requiredWidth;
const scale = fc.double({ min: 1, max: 5, noNaN: true });
const atLeast = (after: number, before: number) => expect(after).toBeGreaterThanOrEqual(before * (1 - 1e-12));

describe('required width properties', () => {
  it('is non-decreasing in panel length L', () => {
    fc.assert(
      fc.property(anyJoint, scale, fc.nat(1), (j, k, i) => {
        const sides = j.sides.map((s, n) => (n === i % j.sides.length ? { ...s, length: s.length * k } : s));
        atLeast(width({ ...j, sides }), width(j));
      }),
    );
  });

  it('is non-decreasing in α', () => {
    fc.assert(
      fc.property(anyJoint, scale, (j, k) => {
        const sides = j.sides.map((s) => ('alpha' in s ? { ...s, alpha: s.alpha * k } : s));
        atLeast(width({ ...j, sides }), width(j));
      }),
    );
  });

  it('is non-decreasing in ΔT (a wider surface-temperature range)', () => {
    fc.assert(
      fc.property(
        anyJoint,
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        (j, colder, hotter) => {
          const r = j.surfaceTemperatureRange;
          atLeast(
            width({ ...j, surfaceTemperatureRange: { min: r.min - colder, max: r.max + hotter } }),
            width(j),
          );
        },
      ),
    );
  });

  it('is non-increasing in movement class (12.5 → 25 → 35 → 50 → 100/50)', () => {
    fc.assert(
      fc.property(anyJoint, (j) => {
        const widths = MOVEMENT_CLASSES.map((c) => width({ ...j, sealant: { movementClass: c } }));
        for (let k = 1; k < widths.length; k++)
          expect(widths[k]).toBeLessThanOrEqual(widths[k - 1]! * (1 + 1e-12));
      }),
    );
  });

  it('verdict is pass exactly when the design width reaches the required width; margin has the same sign', () => {
    fc.assert(
      fc.property(anyJoint, (j) => {
        const r = calculateJoint(j);
        expect(r.verdict === 'pass').toBe(r.designWidth >= r.requiredWidth);
        expect(r.margin >= 0).toBe(r.verdict === 'pass');
        expect(r.requiredWidth).toBeGreaterThanOrEqual(Math.max(r.widthForExtension, r.widthForCompression));
        expect(r.requiredDepth).toBeLessThanOrEqual(r.designWidth);
      }),
    );
  });
});

describe('depth rule', () => {
  // ASTM C1193 depth guidance is continuous in the width; a step (the earlier 2:1 rule halved the depth at
  // ½ in) would shrink the sealant and the takeoff bead when a joint is made wider.
  it('the depth and the bead cross-section W·D never fall as the width grows', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (w, dw) => {
          const wider = w + dw;
          expect(sealantDepth(wider)).toBeGreaterThanOrEqual(sealantDepth(w));
          expect(wider * sealantDepth(wider)).toBeGreaterThanOrEqual(w * sealantDepth(w));
        },
      ),
    );
  });
});

describe('units round trip', () => {
  // A joint described in inches and °F, converted at the edge, gives in inches what the same formula gives
  // worked entirely in inch-pound units: W = (100/X)(e·L·ΔT + M) + t.
  it('SI engine = the inch-pound hand formula', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 12, max: 600, noNaN: true }),
        fc.double({ min: 2e-6, max: 2e-5, noNaN: true }),
        fc.double({ min: -30, max: 40, noNaN: true }),
        fc.double({ min: 60, max: 180, noNaN: true }),
        fc.double({ min: 0, max: 0.25, noNaN: true }),
        fc.double({ min: 0, max: 0.25, noNaN: true }),
        fc.constantFrom(...MOVEMENT_CLASSES),
        (L, e, minF, maxF, M, t, movementClass) => {
          const installF = (minF + maxF) / 2;
          const r = calculateJoint({
            name: 'IP joint',
            type: 'other',
            designWidth: 1 * INCH,
            sides: [{ alpha: e / deltaFahrenheitToKelvin(1), length: L * INCH }],
            surfaceTemperatureRange: { min: fahrenheitToCelsius(minF), max: fahrenheitToCelsius(maxF) },
            installationTemperature: fahrenheitToCelsius(installF),
            otherMovement: { extension: M * INCH, compression: M * INCH },
            sealant: { movementClass },
            constructionTolerance: t * INCH,
            minimumPracticalWidth: 1e-6,
          });
          const X = MOVEMENT_CAPABILITY[movementClass];
          const hand = Math.max(
            (100 / X.extension) * (e * L * (installF - minF) + M) + t,
            (100 / X.compression) * (e * L * (maxF - installF) + M) + t,
          );
          expect(r.requiredWidth / INCH).toBeCloseTo(hand, 9);
          expect(celsiusToFahrenheit(r.deltaTExtension + fahrenheitToCelsius(minF))).toBeCloseTo(installF, 9);
        },
      ),
    );
  });
});
