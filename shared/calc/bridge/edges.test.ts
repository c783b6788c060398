import { describe, expect, it } from 'vitest';
import { solveBridge } from './bridge';
import { type EdgeTemplate, edgeModel } from './edges';
import { refusedField } from './fixtures';
import { bridgeModelSchema } from './schema';

const solve = (e: EdgeTemplate) => solveBridge(bridgeModelSchema.parse(edgeModel(e)));
const layers = [
  { name: 'cladding', thickness: 0.02, lambda: 0.5 },
  { name: 'mineral wool', thickness: 0.15, lambda: 0.035 },
  { name: 'concrete', thickness: 0.2, lambda: 2 },
];

describe('outside corner', () => {
  it('one layer, Rs = 0: ψ with inside lengths is 0.54·λ, the edge shape factor of two walls', () => {
    // Conduction shape factor of the edge of two adjoining walls S = 0.54·D (Incropera & DeWitt,
    // Fundamentals of Heat and Mass Transfer, Table 4.1, walls sized by their inside areas) [memory]:
    // ψ_i = ψ_e + 2·U·d (the two inside lengths are each d shorter), U = λ/d with Rs = 0 (derived).
    const r = solve({
      kind: 'corner',
      layers: [{ name: 'wall', thickness: 0.2, lambda: 1 }],
      rsi: 0,
      rse: 0,
    });
    const psiInside = r.psi! + 2 * (1 / 0.2) * 0.2;
    expect(r.psi!).toBeLessThan(0);
    expect(psiInside).toBeGreaterThan(0.54 * 0.95);
    expect(psiInside).toBeLessThan(0.54 * 1.05);
  });
  it('an insulated wall: ψ with outside lengths is small and negative (ISO 14683 Table C.1 corners: −0.05 to −0.15) [memory]', () => {
    const r = solve({ kind: 'corner', layers });
    expect(r.psi!).toBeLessThan(0);
    expect(r.psi!).toBeGreaterThan(-0.2);
    expect(r.solver.energyBalance).toBeLessThan(1e-3);
  });
});

describe('floor slab edge', () => {
  it('a slab through the insulation bridges far more than one stopped behind it; both ψ > 0', () => {
    const through = solve({ kind: 'slab', layers, slab: { from: 1, thickness: 0.2, lambda: 2 } });
    const behind = solve({ kind: 'slab', layers, slab: { from: 2, thickness: 0.2, lambda: 2 } });
    expect(behind.psi!).toBeGreaterThan(0);
    expect(through.psi!).toBeGreaterThan(5 * behind.psi!);
    expect(through.psi!).toBeLessThan(1.5);
  });
  it('refuses a slab edge at a layer that does not exist', () => {
    expect(
      refusedField(() => edgeModel({ kind: 'slab', layers, slab: { from: 3, thickness: 0.2, lambda: 2 } })),
    ).toBe('slab.from');
  });
});

describe('window or door frame', () => {
  const frame = { width: 0.07, depth: 0.07, offset: 0.06, lambda: 0.13 };
  it('a frame of the wall’s own λ filling a one-layer wall gives ψ = 0 within 1e-3 (a plain wall, derived)', () => {
    const r = solve({
      kind: 'opening',
      layers: [{ name: 'insulation', thickness: 0.15, lambda: 0.035 }],
      frame: { width: 0.07, depth: 0.15, offset: 0, lambda: 0.035 },
    });
    expect(Math.abs(r.psi!)).toBeLessThan(1e-3);
  });
  it('a metal frame bridges more than a timber one; ψ > 0 and below 1 W/(m·K)', () => {
    const timber = solve({ kind: 'opening', layers, frame });
    const metal = solve({ kind: 'opening', layers, frame: { ...frame, lambda: 160 } });
    expect(timber.psi!).toBeGreaterThan(0);
    expect(metal.psi!).toBeGreaterThan(timber.psi!);
    expect(metal.psi!).toBeLessThan(1);
  });
  it('refuses a frame deeper than the wall, naming the field', () => {
    expect(
      refusedField(() => edgeModel({ kind: 'opening', layers, frame: { ...frame, offset: 0.35 } })),
    ).toBe('frame.depth');
  });
});
