import { INCH, R_IP_TO_SI, siValue, U_IP_TO_SI } from '@shared/units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Bridge, FramedLayer, Layer, ThermalInput, ThermalResult } from './schema';
import { MIN_THICKNESS } from './schema';
import { calculateThermal } from './thermal';

const name = fc.constantFrom('A', 'B', 'C');
const thickness = fc.double({ min: 0.001, max: 0.3, noNaN: true });
const conductivity = fc.double({ min: 0.02, max: 60, noNaN: true });

const homogeneous = fc.record({ kind: fc.constant('homogeneous' as const), name, thickness, conductivity });
/** A declared-R layer; it carries its thickness, which a wall with metal framing requires. */
const declared = fc.record({
  kind: fc.constant('resistance' as const),
  name,
  resistance: fc.double({ min: 0.001, max: 5, noNaN: true }),
  thickness,
});
const air = fc.oneof(
  fc.record({
    kind: fc.constant('air' as const),
    name,
    thickness: fc.double({ min: 0.001, max: 0.3, noNaN: true }),
    ventilation: fc.constant('unventilated' as const),
  }),
  // ISO 6946:2017 §6.9.3: slightly ventilated means 500 < A_v ≤ 1500 mm²/m.
  fc.record({
    kind: fc.constant('air' as const),
    name,
    thickness: fc.double({ min: 0.001, max: 0.3, noNaN: true }),
    ventilation: fc.constant('slightly' as const),
    ventArea: fc.double({ min: 500.001, max: 1500, noNaN: true }),
  }),
);

/**
 * §6.9.3 blends one slightly ventilated layer, and not one outside metal framing: any other is entered as
 * unventilated, as a designer would have to.
 */
function oneSlightLayer(layers: Layer[]): Layer[] {
  const metal = layers.findIndex((l) => l.kind === 'framed' && l.metal);
  let seen = false;
  return layers.map((l, i) => {
    if (l.kind !== 'air' || l.ventilation !== 'slightly') return l;
    if (seen || (metal >= 0 && i > metal))
      return { kind: 'air', name: l.name, thickness: l.thickness, ventilation: 'unventilated' };
    seen = true;
    return l;
  });
}

/** Two-section framing (cavity + member), fractions summing to 1 exactly. */
const framed = (metal: boolean) =>
  fc
    .record({
      thickness: fc.double({ min: 0.03, max: 0.3, noNaN: true }),
      cavity: fc.double({ min: 0.02, max: 0.1, noNaN: true }),
      member: metal
        ? fc.double({ min: 15, max: 200, noNaN: true })
        : fc.double({ min: 0.1, max: 0.3, noNaN: true }),
      memberFraction: fc.double({ min: 0.001, max: 0.3, noNaN: true }),
      flangeWidth: fc.double({ min: 0.02, max: 0.08, noNaN: true }),
      spacing: fc.double({ min: 0.3, max: 1.2, noNaN: true }),
    })
    .map(
      (p): FramedLayer => ({
        kind: 'framed',
        name: metal ? 'Steel studs' : 'Wood studs',
        thickness: p.thickness,
        metal,
        flangeWidth: metal ? p.flangeWidth : undefined,
        spacing: metal ? p.spacing : undefined,
        sections: [
          { name: 'Cavity', conductivity: p.cavity, fraction: 1 - p.memberFraction },
          { name: 'Member', conductivity: p.member, fraction: p.memberFraction },
        ],
      }),
    );

/**
 * Steel studs the energy-code table covers (ASHRAE 90.1-2016 Table A9.2-2 rows: 3.5 in R-11–15, 6 in R-19–21,
 * at 16 or 24 in), so that the energy-code path is exercised too.
 */
const tableSteel = fc
  .record({
    row: fc.constantFrom({ depthIn: 3.5, lo: 11, hi: 15 }, { depthIn: 6, lo: 19, hi: 21 }),
    share: fc.double({ min: 0, max: 1, noNaN: true }),
    spacing: fc.constantFrom(16, 24),
  })
  .map(({ row: { depthIn, lo, hi }, share, spacing }): FramedLayer => {
    const d = depthIn * INCH;
    const ratedR = (lo + share * (hi - lo)) * R_IP_TO_SI;
    const web = 0.0011 / (spacing * INCH);
    return {
      kind: 'framed',
      name: 'Steel studs (table)',
      thickness: d,
      metal: true,
      flangeWidth: 0.041,
      spacing: spacing * INCH,
      sections: [
        { name: 'Batt', conductivity: d / ratedR, fraction: 1 - web },
        { name: 'Steel web', conductivity: 50, fraction: web },
      ],
    };
  });

const bridge: fc.Arbitrary<Bridge> = fc.oneof(
  fc.record({
    kind: fc.constant('point' as const),
    name,
    chi: fc.double({ min: 0, max: 0.5, noNaN: true }).map(siValue<'W/K'>),
    countPerArea: fc.double({ min: 0.1, max: 20, noNaN: true }),
  }),
  fc.record({
    kind: fc.constant('linear' as const),
    name,
    psi: fc.double({ min: 0, max: 0.5, noNaN: true }).map(siValue<'ψ W/(m·K)'>),
    spacing: fc.double({ min: 0.2, max: 5, noNaN: true }),
  }),
);

/** A valid wall: unbridged layers, optionally one framed layer (wood or metal) at a random position. */
const wallOf = (framing: fc.Arbitrary<FramedLayer | null>) =>
  fc
    .record({
      layers: fc.array(fc.oneof(homogeneous, declared, air), { minLength: 1, maxLength: 8 }),
      framing,
      at: fc.nat(),
      heatFlow: fc.constantFrom('horizontal' as const, 'upward' as const, 'downward' as const),
      bridges: fc.array(bridge, { maxLength: 3 }),
    })
    .map(({ layers, framing, at, heatFlow, bridges }): ThermalInput => {
      const all: Layer[] = [...layers];
      if (framing) all.splice(at % (all.length + 1), 0, framing);
      return { layers: oneSlightLayer(all), heatFlow, bridges };
    });

const anyWall = wallOf(fc.option(fc.oneof(framed(false), framed(true), tableSteel), { nil: null }));
const nonMetalWall = wallOf(fc.option(framed(false), { nil: null }));

const numbers = (r: ThermalResult): number[] => [
  r.R0,
  r.U0,
  r.Ueff,
  r.Reff,
  r.methodSpread,
  r.sharesSum,
  r.clearFieldShare,
  ...Object.values(r.ip),
  ...Object.values(r.methods).filter((x): x is number => x !== null),
  ...r.bridges.flatMap((b) => [b.deltaU, b.share]),
  ...r.trace.map((s) => s.value),
];

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-12);

describe('thermal properties', () => {
  it('adding a homogeneous layer anywhere never lowers R (parallel path, isothermal planes, ISO combined)', () => {
    fc.assert(
      fc.property(nonMetalWall, homogeneous, fc.nat(), (input, extra, at) => {
        const before = calculateThermal(input);
        const layers = [...input.layers];
        layers.splice(at % (layers.length + 1), 0, extra);
        const after = calculateThermal({ ...input, layers });
        expect(after.methods.parallelPath).toBeGreaterThanOrEqual(before.methods.parallelPath * (1 - 1e-12));
        expect(after.methods.isothermalPlanes).toBeGreaterThanOrEqual(
          before.methods.isothermalPlanes * (1 - 1e-12),
        );
        expect(after.R0).toBeGreaterThanOrEqual(before.R0 * (1 - 1e-12));
      }),
    );
  });

  // The zone method is not monotonic in added thickness: a layer between the flange and the surface
  // widens zone A (W = m + 2d) and can lower R — e.g. 1 mm of λ 0.15 outside 12.7 mm of gypsum on a
  // 163 mm stud at 0.3 m (fast-check counterexample). The property therefore holds only for a layer that
  // adds resistance without depth: a declared R on a layer as thick as the thinnest one allowed.
  it('adding a declared-resistance layer of negligible thickness never lowers the zone-method R', () => {
    fc.assert(
      fc.property(wallOf(framed(true)), declared, fc.nat(), (input, extra, at) => {
        const before = calculateThermal(input);
        const layers = [...input.layers];
        layers.splice(at % (layers.length + 1), 0, { ...extra, thickness: MIN_THICKNESS });
        const after = calculateThermal({ ...input, layers });
        const zone = (r: ThermalResult) => r.methods.zone!;
        // 1 µm more depth widens zone A by 2 µm: a relative change far below this tolerance.
        expect(zone(after)).toBeGreaterThanOrEqual(zone(before) * (1 - 1e-4));
      }),
    );
  });

  it('a layer entered as d/λ or as the same R with its thickness gives the same result by every method', () => {
    fc.assert(
      fc.property(anyWall, fc.nat(), (input, pick) => {
        const i = input.layers.findIndex(
          (l, k) => l.kind === 'homogeneous' && k >= pick % input.layers.length,
        );
        fc.pre(i >= 0);
        const layer = input.layers[i] as Extract<Layer, { kind: 'homogeneous' }>;
        const layers = [...input.layers];
        layers[i] = {
          kind: 'resistance',
          name: layer.name,
          resistance: layer.thickness / layer.conductivity,
          thickness: layer.thickness,
        };
        const a = calculateThermal(input);
        const b = calculateThermal({ ...input, layers });
        expect(b.defaultMethod).toBe(a.defaultMethod);
        for (const [key, x] of Object.entries(a.methods)) {
          const y = b.methods[key as keyof ThermalResult['methods']];
          if (x === null) expect(y).toBeNull();
          else expect(rel(y!, x)).toBeLessThan(1e-9);
        }
        for (const key of ['R0', 'U0', 'Ueff', 'Reff'] as const)
          expect(rel(b[key], a[key])).toBeLessThan(1e-9);
      }),
    );
  });

  it('upper limit R′T (parallel path) ≥ lower limit R″T (isothermal planes), zone method between them', () => {
    fc.assert(
      fc.property(anyWall, (input) => {
        const r = calculateThermal(input);
        expect(r.methods.parallelPath).toBeGreaterThanOrEqual(r.methods.isothermalPlanes * (1 - 1e-12));
        if (r.methods.zone !== null) {
          // The zone method lies between the bounds (ASHRAE Fundamentals ch. 27: zone A by isothermal planes).
          expect(r.methods.zone).toBeLessThanOrEqual(r.methods.parallelPath * (1 + 1e-12));
          expect(r.methods.zone).toBeGreaterThanOrEqual(r.methods.isothermalPlanes * (1 - 1e-12));
        }
      }),
    );
  });

  it('splitting a homogeneous layer in two leaves every method unchanged', () => {
    fc.assert(
      fc.property(
        anyWall,
        fc.nat(),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        (input, pick, share) => {
          const i = input.layers.findIndex(
            (l, k) => l.kind === 'homogeneous' && k >= pick % input.layers.length,
          );
          fc.pre(i >= 0);
          const layer = input.layers[i] as Extract<Layer, { kind: 'homogeneous' }>;
          const layers = [...input.layers];
          layers.splice(
            i,
            1,
            { ...layer, thickness: layer.thickness * share },
            { ...layer, thickness: layer.thickness * (1 - share) },
          );
          const whole = calculateThermal(input);
          const split = calculateThermal({ ...input, layers, bridges: [] });
          const wholeBare = calculateThermal({ ...input, bridges: [] });
          expect(rel(split.methods.parallelPath, whole.methods.parallelPath)).toBeLessThan(1e-12);
          expect(rel(split.methods.isothermalPlanes, whole.methods.isothermalPlanes)).toBeLessThan(1e-12);
          expect(rel(split.R0, wholeBare.R0)).toBeLessThan(1e-12);
        },
      ),
    );
  });

  it('every bridge adds ≥ 0 to U, and adding a bridge never lowers U_eff', () => {
    fc.assert(
      fc.property(anyWall, bridge, (input, extra) => {
        const r = calculateThermal(input);
        for (const b of r.bridges) expect(b.deltaU).toBeGreaterThanOrEqual(0);
        expect(r.Ueff).toBeGreaterThanOrEqual(r.U0);
        const more = calculateThermal({ ...input, bridges: [...input.bridges, extra] });
        expect(more.Ueff).toBeGreaterThanOrEqual(r.Ueff * (1 - 1e-12));
      }),
    );
  });

  it('R₀ never rests on the least conservative method: energy-code path, ISO combined, or the lowest R offered', () => {
    fc.assert(
      fc.property(anyWall, (input) => {
        const r = calculateThermal(input);
        const offered = r.offeredMethods.map((m) => r.methods[m]!);
        if (r.defaultMethod === 'energyCode') expect(r.basis.kind).toBe('energyCode');
        else if (r.methods.zone !== null) {
          expect(r.basis.kind).toBe('mostConservative');
          expect(r.R0).toBe(Math.min(...offered));
        } else expect(r.defaultMethod).toBe('isoCombined');
        if (offered.length > 1 && Math.max(...offered) > Math.min(...offered) * (1 + 1e-9))
          expect(r.R0).toBeLessThan(Math.max(...offered));
      }),
    );
  });

  it('IP ⇄ SI round trip', () => {
    fc.assert(
      fc.property(anyWall, (input) => {
        const r = calculateThermal(input);
        expect(rel(r.ip.R0 * R_IP_TO_SI, r.R0)).toBeLessThan(1e-12);
        expect(rel(r.ip.Reff * R_IP_TO_SI, r.Reff)).toBeLessThan(1e-12);
        expect(rel(r.ip.U0 * U_IP_TO_SI, r.U0)).toBeLessThan(1e-12);
        // R_IP_TO_SI · U_IP_TO_SI = 1 to the 7 digits NIST SP 811 tabulates.
        expect(rel(r.ip.R0 * r.ip.U0, 1)).toBeLessThan(1e-6);
      }),
    );
  });

  it('the result is finite for every valid input and the shares sum to 1', () => {
    fc.assert(
      fc.property(anyWall, (input) => {
        const r = calculateThermal(input);
        for (const x of numbers(r)) expect(Number.isFinite(x)).toBe(true);
        expect(r.R0).toBeGreaterThan(0);
        expect(r.sharesSum).toBeCloseTo(1, 12);
      }),
    );
  });
});
