import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCsv } from '../../csv';
import { takeoffToCsv } from './csv';
import { TAKEOFF_JOINT_TYPES, type TakeoffInput, type TakeoffResult, type Wall } from './schema';
import { calculateTakeoff, PACKAGES, US_FLUID_OUNCE } from './takeoff';

const size = (min: number, max: number) => fc.double({ min, max, noNaN: true });

const bead = fc.oneof(
  fc.record({ shape: fc.constant('round' as const), diameter: size(0.003, 0.03) }),
  fc.record({ shape: fc.constant('fillet' as const), leg: size(0.003, 0.03) }),
  fc.record({
    shape: fc.constant('rectangular' as const),
    width: size(0.006, 0.05),
    depth: size(0.006, 0.013),
  }),
);

/** A wall whose openings always fit (each at most a third of the wall each way, at most three of each). */
const wall: fc.Arbitrary<Wall> = fc
  .record({
    name: fc.string({
      unit: fc.constantFrom('a', 'Z', ' ', ',', '"', '\r', '\n', 'é', '—'),
      minLength: 1,
      maxLength: 12,
    }),
    length: size(1, 60),
    height: size(1, 20),
    corners: fc.integer({ min: 0, max: 1 }),
    abutments: fc.integer({ min: 0, max: 1 }),
    openings: fc.array(
      fc.record({
        w: size(0.05, 1),
        h: size(0.05, 1),
        count: fc.integer({ min: 1, max: 3 }),
        door: fc.boolean(),
      }),
      { maxLength: 3 },
    ),
  })
  .map((p) => ({
    name: p.name,
    length: p.length,
    height: p.height,
    corners: p.corners,
    abutments: p.abutments,
    openings: p.openings.map((o) => ({
      width: (o.w * p.length) / 9,
      height: (o.h * p.height) / 3,
      count: o.count,
      kind: o.door ? ('door' as const) : ('window' as const),
    })),
  }));

const anyTakeoff: fc.Arbitrary<TakeoffInput> = fc.record({
  walls: fc.array(wall, { minLength: 1, maxLength: 4 }),
  module: fc.record({
    width: size(0.3, 1.5),
    length: size(2, 12),
    orientation: fc.constantFrom('vertical' as const, 'horizontal' as const),
  }),
  beads: fc.record(
    Object.fromEntries(TAKEOFF_JOINT_TYPES.map((t) => [t, bead])) as Record<
      (typeof TAKEOFF_JOINT_TYPES)[number],
      typeof bead
    >,
    { requiredKeys: [] },
  ),
  wasteFactor: size(0, 0.3),
  trims: fc.array(
    fc.record({
      name: fc.constant('Trim'),
      appliesTo: fc.constantFrom(...TAKEOFF_JOINT_TYPES),
      stockLength: size(2, 6),
      lapAllowance: size(0, 0.1),
    }),
    { maxLength: 3 },
  ),
  fasteners: fc.record({ spacingAlongGirt: size(0.15, 0.6), girtSpacing: size(0.6, 2) }),
  tape: fc.record({
    width: size(0.01, 0.1),
    appliesTo: fc.subarray([...TAKEOFF_JOINT_TYPES], { minLength: 1 }),
  }),
});

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-12);
const close = (a: number, b: number) => expect(rel(a, b)).toBeLessThan(1e-9);

const quantities = (r: TakeoffResult): number[] => [
  ...Object.values(r.lengths),
  r.sealant.volume,
  r.sealant.volumeWithWaste,
  ...Object.values(r.sealant.cartridges),
  ...Object.values(r.sealant.sausages),
  ...r.trims.map((t) => t.pieces),
  r.fasteners ?? 0,
  r.tape?.length ?? 0,
];

describe('takeoff properties', () => {
  it('every quantity is finite and ≥ 0', () => {
    fc.assert(
      fc.property(anyTakeoff, (input) => {
        for (const q of quantities(calculateTakeoff(input))) {
          expect(Number.isFinite(q)).toBe(true);
          expect(q).toBeGreaterThanOrEqual(0);
        }
      }),
    );
  });

  // Linearity holds exactly in the wall list: two copies of every wall double every length, volume, trim
  // piece and fastener; packages, being rounded up, lie between once and twice the single count.
  it('duplicating every wall doubles every measured quantity', () => {
    fc.assert(
      fc.property(anyTakeoff, (input) => {
        const once = calculateTakeoff(input);
        const twice = calculateTakeoff({ ...input, walls: [...input.walls, ...input.walls] });
        for (const t of TAKEOFF_JOINT_TYPES) close(twice.lengths[t], 2 * once.lengths[t]);
        close(twice.sealant.volume, 2 * once.sealant.volume);
        close(twice.tape!.length, 2 * once.tape!.length);
        expect(twice.fasteners).toBe(2 * once.fasteners!);
        expect(twice.trims.map((t) => t.pieces)).toEqual(once.trims.map((t) => 2 * t.pieces));
        const n = once.sealant.cartridges.ml300;
        expect(twice.sealant.cartridges.ml300).toBeGreaterThanOrEqual(n);
        expect(twice.sealant.cartridges.ml300).toBeLessThanOrEqual(2 * n);
      }),
    );
  });

  // Within one wall the joint count steps at module boundaries, so linearity in wall length holds only in
  // whole modules: a wall n modules long, lengthened by k modules, gains exactly k times what one added
  // module adds — for every joint line.
  it('joint lengths grow linearly with the wall in whole modules', () => {
    fc.assert(
      fc.property(
        anyTakeoff,
        fc.integer({ min: 1, max: 30 }),
        fc.integer({ min: 1, max: 10 }),
        (input, n, k) => {
          const m = input.module;
          const along = m.orientation === 'vertical' ? m.width : m.length;
          const base = { ...input.walls[0]!, openings: [] };
          const at = (modules: number) =>
            calculateTakeoff({ ...input, walls: [{ ...base, length: modules * along }] }).lengths;
          const [l0, l1, lk] = [at(n), at(n + 1), at(n + k)];
          for (const t of TAKEOFF_JOINT_TYPES) {
            expect(Math.abs(lk[t] - l0[t] - k * (l1[t] - l0[t]))).toBeLessThan(1e-9 * Math.max(1, lk[t]));
          }
        },
      ),
    );
  });

  it('package arithmetic: n packages hold the volume, n − 1 do not', () => {
    fc.assert(
      fc.property(anyTakeoff, (input) => {
        const r = calculateTakeoff(input);
        const V = r.sealant.volumeWithWaste;
        const pairs = [
          [r.sealant.cartridges.usFlOz10_1, PACKAGES.cartridgeUsFlOz10_1],
          [r.sealant.cartridges.ml300, PACKAGES.cartridgeMl300],
          [r.sealant.sausages.usFlOz20, PACKAGES.sausageUsFlOz20],
          [r.sealant.sausages.ml600, PACKAGES.sausageMl600],
        ] as const;
        for (const [n, size] of pairs) {
          expect(n * size).toBeGreaterThanOrEqual(V * (1 - 1e-9));
          expect((n - 1) * size).toBeLessThan(V);
        }
      }),
    );
  });

  it('units round trip: m³ → US fl oz → m³ and ml → m³ → ml', () => {
    fc.assert(
      fc.property(size(1e-9, 10), (m3) => {
        close((m3 / US_FLUID_OUNCE) * US_FLUID_OUNCE, m3);
        close(((m3 * 1e6) / 1e6) * 1e6, m3 * 1e6);
        // 10.1 fl oz cartridges and 300 ml cartridges describe the same volume in two unit systems.
        close((m3 / PACKAGES.cartridgeUsFlOz10_1) * 10.1 * US_FLUID_OUNCE, m3);
      }),
    );
  });
});

describe('CSV', () => {
  it('any wall name survives the RFC 4180 round trip; quantities read back within 12 digits', () => {
    fc.assert(
      fc.property(anyTakeoff, (input) => {
        const r = calculateTakeoff(input);
        const parsed = parseCsv(takeoffToCsv(r));
        const rows = parsed.ok ? parsed.records.map((rec) => rec.fields) : [];
        expect(rows).toHaveLength(r.trace.length + 1);
        r.trace.forEach((s, k) => {
          const [label, value, unit, formula] = rows[k + 1]!;
          expect(label).toBe(s.label);
          expect(unit).toBe(s.unit);
          expect(formula).toBe(s.formula);
          expect(Math.abs(Number(value) - s.value)).toBeLessThanOrEqual(Math.abs(s.value) * 1e-11);
        });
      }),
    );
  });
});
