import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculateMoisture } from './monthly';
import { saturationPressureIso13788 } from './psychrometrics';
import {
  type MoistureInput,
  type MoistureLayer,
  type MoistureResult,
  type MonthClimate,
  moistureResultSchema,
  type Vapour,
} from './schema';

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const name = fc.constantFrom('A', 'B', 'C');

const vapour: fc.Arbitrary<Vapour> = fc.oneof(
  fc.record({ kind: fc.constant('mu' as const), mu: num(1, 5000) }),
  fc.record({ kind: fc.constant('sd' as const), sd: num(0.001, 200) }),
  fc.record({ kind: fc.constant('permeance' as const), permeance: num(0.5, 5000) }),
  fc.record({
    kind: fc.constant('usPerm' as const),
    perm: num(0.01, 100),
    reference: fc.constantFrom('23C' as const, '0C' as const),
  }),
);
const thick = <T extends object>(layer: fc.Arbitrary<T>) =>
  fc.tuple(layer, vapour).map(([l, v]): T & { vapour: Vapour } => ({ ...l, vapour: v }));

/** Every layer kind; declared-resistance layers never carry μ (they have no thickness). */
const anyLayer: fc.Arbitrary<MoistureLayer> = fc.oneof(
  thick(
    fc.record({
      kind: fc.constant('homogeneous' as const),
      name,
      thickness: num(0.001, 0.3),
      conductivity: num(0.02, 60),
    }),
  ),
  fc
    .tuple(
      fc.record({ kind: fc.constant('resistance' as const), name, resistance: num(0.01, 5) }),
      vapour.filter((v) => v.kind !== 'mu'),
    )
    .map(([l, v]) => ({ ...l, vapour: v })),
  thick(
    fc.record({
      kind: fc.constant('air' as const),
      name,
      thickness: num(0.005, 0.3),
      ventilation: fc.constantFrom('unventilated' as const, 'slightly' as const, 'well' as const),
    }),
  ),
  thick(
    fc.record({
      kind: fc.constant('framed' as const),
      name,
      thickness: num(0.03, 0.3),
      metal: fc.boolean(),
      sections: fc.tuple(num(0.02, 0.1), num(0.1, 60), num(0.001, 0.3)).map(([cavity, member, f]) => [
        { name: 'cavity', conductivity: cavity, fraction: 1 - f },
        { name: 'member', conductivity: member, fraction: f },
      ]),
    }),
  ),
);
/** The innermost layer is never a well-ventilated cavity (nothing would be left to calculate). */
const innermost = thick(
  fc.record({
    kind: fc.constant('homogeneous' as const),
    name,
    thickness: num(0.005, 0.05),
    conductivity: num(0.1, 1),
  }),
);
const month: fc.Arbitrary<MonthClimate> = fc.record({
  exteriorTemperature: num(-40, 40),
  exteriorRelativeHumidity: num(0, 1),
});
/** Fixed RH ≤ 0.9 with a factor ≤ 1.1 keeps p_i below saturation: 1.1·0.9 − 0.1·p_e/p_sat < 1. */
const interior: fc.Arbitrary<MoistureInput['interior']> = fc.oneof(
  fc.record({ kind: fc.constant('fixed' as const), temperature: num(15, 25), relativeHumidity: num(0, 0.9) }),
  fc.record({
    kind: fc.constant('humidityClass' as const),
    temperature: num(15, 25),
    humidityClass: fc.integer({ min: 1, max: 5 }),
  }),
);
const anyInput: fc.Arbitrary<MoistureInput> = fc.record({
  layers: fc
    .tuple(fc.array(anyLayer, { minLength: 0, maxLength: 7 }), innermost)
    .map(([ls, last]) => [...ls, last]),
  heatFlow: fc.constantFrom('horizontal' as const, 'upward' as const, 'downward' as const),
  interior,
  months: fc.array(month, { minLength: 12, maxLength: 12 }),
  safetyFactor: num(1, 1.1),
});

function allFinite(x: unknown): boolean {
  if (typeof x === 'number') return Number.isFinite(x);
  if (Array.isArray(x)) return x.every(allFinite);
  if (x !== null && typeof x === 'object') return Object.values(x).every(allFinite);
  return true;
}

describe('calculateMoisture — properties', () => {
  it('is finite and matches its result schema for every valid input', () => {
    fc.assert(
      fc.property(anyInput, (input) => {
        const r = calculateMoisture(input);
        expect(allFinite(r)).toBe(true);
        expect(moistureResultSchema.safeParse(r).success).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('balances the mass: Σ condensed − Σ evaporated = final M_a, and M_a ≥ 0 everywhere', () => {
    fc.assert(
      fc.property(anyInput, (input) => {
        const r = calculateMoisture(input);
        const i = r.interstitial;
        const scale = Math.max(1e-9, i.totalCondensed);
        expect(Math.abs(i.totalCondensed - i.totalEvaporated - i.finalAccumulation)).toBeLessThanOrEqual(
          1e-9 * scale,
        );
        for (const m of r.months) {
          expect(m.accumulation.every((x) => x >= 0)).toBe(true);
          const sum = m.accumulation.reduce((a, b) => a + b, 0);
          expect(Math.abs(sum - m.totalAccumulation)).toBeLessThanOrEqual(1e-12 * Math.max(1, sum));
        }
      }),
      { numRuns: 300 },
    );
  });

  it('never draws the vapour line above p_sat at an interior node', () => {
    fc.assert(
      fc.property(anyInput, (input) => {
        const r = calculateMoisture(input);
        for (const m of r.months)
          for (let k = 1; k < r.nodes.length - 1; k++)
            expect(m.vapourPressure[k]!).toBeLessThanOrEqual(m.saturationPressure[k]! * (1 + 1e-12));
      }),
      { numRuns: 200 },
    );
  });

  it('predicts no condensation when p_i and p_e stay below p_sat of every node in every month', () => {
    // Constructive: node temperatures lie between θ_e and θ_i, so p_sat(min(θ_e, θ_i)) bounds every node.
    const dryCase = fc
      .record({
        layers: fc
          .tuple(fc.array(anyLayer, { minLength: 0, maxLength: 6 }), innermost)
          .map(([ls, last]) => [...ls, last]),
        theta: fc.array(num(-30, 30), { minLength: 12, maxLength: 12 }),
        rhE: num(0, 0.99),
        rhI: num(0, 0.99),
      })
      .map(({ layers, theta, rhE, rhI }): MoistureInput => {
        const coldest = Math.min(20, ...theta);
        return {
          layers,
          heatFlow: 'horizontal',
          interior: {
            kind: 'fixed',
            temperature: 20,
            relativeHumidity: (rhI * saturationPressureIso13788(coldest)) / saturationPressureIso13788(20),
          },
          months: theta.map((t) => ({
            exteriorTemperature: t,
            exteriorRelativeHumidity:
              (rhE * saturationPressureIso13788(Math.min(t, 20))) / saturationPressureIso13788(t),
          })),
          safetyFactor: 1,
        };
      });
    fc.assert(
      fc.property(dryCase, (input) => {
        const r = calculateMoisture(input);
        for (const m of r.months) {
          const lowest = Math.min(...m.saturationPressure);
          expect(Math.max(m.interiorVapourPressure, m.exteriorVapourPressure)).toBeLessThanOrEqual(lowest);
        }
        expect(r.interstitial.condensationOccurs).toBe(false);
      }),
      { numRuns: 300 },
    );
  });

  it('a more vapour-tight warm-side lining never increases winter condensation', () => {
    const winter = fc.record({
      layers: fc.array(
        thick(
          fc.record({
            kind: fc.constant('homogeneous' as const),
            name,
            thickness: num(0.005, 0.2),
            conductivity: num(0.03, 2),
          }),
        ),
        { minLength: 1, maxLength: 5 },
      ),
      liningMu: num(1, 100),
      tighter: num(1, 1000),
      thetaE: num(-25, 0),
      rhE: num(0.5, 0.95),
      thetaI: num(18, 24),
      rhI: num(0.3, 0.7),
    });
    const condensed = (r: MoistureResult) => r.months[0]!.condensed;
    fc.assert(
      fc.property(winter, ({ layers, liningMu, tighter, thetaE, rhE, thetaI, rhI }) => {
        const wall = (mu: number): MoistureInput => ({
          layers: [
            ...layers,
            {
              kind: 'homogeneous',
              name: 'Lining',
              thickness: 0.0125,
              conductivity: 0.25,
              vapour: { kind: 'mu', mu },
            },
          ],
          heatFlow: 'horizontal',
          interior: { kind: 'fixed', temperature: thetaI, relativeHumidity: rhI },
          months: Array.from({ length: 12 }, () => ({
            exteriorTemperature: thetaE,
            exteriorRelativeHumidity: rhE,
          })),
          safetyFactor: 1,
        });
        const base = calculateMoisture(wall(liningMu));
        const tight = calculateMoisture(wall(liningMu * tighter));
        expect(condensed(tight)).toBeLessThanOrEqual(condensed(base) * (1 + 1e-9) + 1e-15);
      }),
      { numRuns: 300 },
    );
  });
});
