import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bridgeGrid, solveBridge } from './bridge';
import { demoGirtModel } from './examples';
import { refusedField } from './fixtures';
import { gradedSizes } from './grid';
import { type BridgeModel, type BridgeModelInput, bridgeModelSchema } from './schema';

const parse = (m: BridgeModelInput) => bridgeModelSchema.parse(m);
const slab = (over: Partial<BridgeModelInput> = {}): BridgeModel =>
  parse({
    dimension: '2d',
    boxes: [{ name: 'board', lambda: 0.04, min: [0, 0], max: [0.5, 0.1] }],
    boundaries: [
      { name: 'out', side: 'outside', temperature: 0, resistance: 0.04, min: [0, 0], max: [0.5, 0] },
      { name: 'in', side: 'inside', temperature: 20, resistance: 0.13, min: [0, 0.1], max: [0.5, 0.1] },
    ],
    ...over,
  });

describe('grid', () => {
  it('grades from the edges and fills the interval exactly', () => {
    const sizes = gradedSizes(0.1, 0.002, 1.3, 0.02);
    expect(sizes.reduce((s, v) => s + v, 0)).toBeCloseTo(0.1, 12);
    expect(sizes[0]).toBeLessThanOrEqual(0.002);
    expect(Math.max(...sizes)).toBeLessThanOrEqual(0.02);
  });
  it('a sheet thinner than the edge cell is one cell across, without refining the whole model', () => {
    const grid = bridgeGrid(parse(demoGirtModel()));
    const dy = grid.y.slice(1).map((y, i) => y - grid.y[i]!);
    expect(dy).toContain(grid.y[1]! - grid.y[0]!);
    expect(grid.y[1]! - grid.y[0]!).toBeCloseTo(0.0006, 12);
    expect(Math.max(...dy)).toBeGreaterThan(0.01);
  });
});

describe('a plain board (derived: 1-D series resistances)', () => {
  it('heat flow = Δθ·l / (Rse + d/λ + Rsi), balance within 0.1 %, no bridge', () => {
    const r = solveBridge(
      slab({ reference: { elements: [{ name: 'board', u: 1 / (0.04 + 2.5 + 0.13), size: 0.5 }] } }),
    );
    expect(r.heatFlow).toBeCloseTo((20 * 0.5) / (0.04 + 0.1 / 0.04 + 0.13), 7);
    expect(r.solver.energyBalance).toBeLessThan(1e-3);
    expect(Math.abs(r.psi!)).toBeLessThan(1e-7);
    // θsi = θi − q·Rsi; f_Rsi = (θsi − θe)/(θi − θe).
    const q = 20 / (0.04 + 2.5 + 0.13);
    expect(r.minInsideSurface!.temperature).toBeCloseTo(20 - q * 0.13, 7);
    expect(r.fRsi).toBeCloseTo((20 - q * 0.13) / 20, 7);
    expect(r.field).toBeNull();
  });
});

describe('impossible input is refused before solving, naming the field', () => {
  const board = { name: 'board', lambda: 0.04, min: [0, 0], max: [0.5, 0.1] };
  it('boxes of different λ that overlap', () => {
    const m = slab({ boxes: [board, { name: 'stud', lambda: 50, min: [0.2, 0], max: [0.3, 0.1] }] });
    expect(refusedField(() => solveBridge(m))).toBe('boxes.1');
  });
  it('overlapping boxes of the same λ are one material', () => {
    const m = slab({ boxes: [board, { ...board, name: 'more board', min: [0.2, 0] }] });
    expect(refusedField(() => solveBridge(m))).toBe('accepted');
  });
  it('a box of zero or negative size', () => {
    expect(refusedField(() => solveBridge(slab({ boxes: [{ ...board, max: [0.5, 0] }] })))).toBe(
      'boxes.0.max',
    );
    expect(refusedField(() => solveBridge(slab({ boxes: [{ ...board, max: [-0.5, 0.1] }] })))).toBe(
      'boxes.0.max',
    );
  });
  it('λ ≤ 0 (the schema refuses it too; the engine does not trust its caller)', () => {
    const m = slab();
    m.boxes[0]!.lambda = 0;
    expect(refusedField(() => solveBridge(m))).toBe('boxes.0.lambda');
    m.boxes[0]!.lambda = Number.NaN;
    expect(refusedField(() => solveBridge(m))).toBe('boxes.0.lambda');
  });
  it('a point with the wrong number of coordinates', () => {
    expect(refusedField(() => solveBridge(slab({ boxes: [{ ...board, min: [0, 0, 0] }] })))).toBe(
      'boxes.0.min',
    );
  });
  it('more cells than the budget', () => {
    expect(refusedField(() => solveBridge(slab(), 10))).toBe('mesh');
  });
  it('a boundary region that holds no surface of the model', () => {
    const m = slab();
    m.boundaries[1]!.min = [0, 0.2];
    m.boundaries[1]!.max = [0.5, 0.2];
    expect(refusedField(() => solveBridge(m))).toBe('boundaries.1');
  });
  it('a piece of material that touches no environment', () => {
    const m = slab({ boxes: [board, { name: 'loose', lambda: 1, min: [1, 1], max: [1.1, 1.1] }] });
    expect(refusedField(() => solveBridge(m))).toBe('boundaries');
  });
});

describe('properties', () => {
  it('any layered wall: finite results, balance within 0.1 %, ψ = 0 within 1e-6', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            d: fc.double({ min: 0.0005, max: 0.2, noNaN: true }),
            lambda: fc.double({ min: 0.01, max: 60, noNaN: true }),
          }),
          {
            minLength: 1,
            maxLength: 5,
          },
        ),
        (layers) => {
          let y = 0;
          const boxes = layers.map((l, i) => {
            const b = { name: `layer ${i}`, lambda: l.lambda, min: [0, y], max: [0.3, y + l.d] };
            y += l.d;
            return b;
          });
          const u = 1 / (0.04 + layers.reduce((s, l) => s + l.d / l.lambda, 0) + 0.13);
          const r = solveBridge(
            slab({
              boxes,
              boundaries: [
                {
                  name: 'out',
                  side: 'outside',
                  temperature: -10,
                  resistance: 0.04,
                  min: [0, 0],
                  max: [0.3, 0],
                },
                { name: 'in', side: 'inside', temperature: 20, resistance: 0.13, min: [0, y], max: [0.3, y] },
              ],
              reference: { elements: [{ name: 'wall', u, size: 0.3 }] },
            }),
          );
          expect(JSON.stringify(r)).not.toMatch(/null,null|NaN|Infinity/);
          expect(r.solver.energyBalance).toBeLessThan(1e-3);
          expect(Math.abs(r.psi!)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 25 },
    );
  });
});
