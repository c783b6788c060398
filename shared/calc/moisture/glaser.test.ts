import { CalcInputError } from '@shared/calc/errors';
import { describe, expect, it } from 'vitest';
import {
  assemblePath,
  DELTA_0,
  type DiffusionPath,
  glaserProfile,
  glaserWork,
  MAX_SUBLAYERS,
  nodeTemperatures,
  type PathLayer,
  saturationPressures,
  sublayerCount,
} from './glaser';

const layer = (resistance: number, sd: number, index: number, divisible = true): PathLayer => ({
  resistance,
  sd,
  layer: index,
  divisible,
});

/** Profile with given p_sat at the nodes (values at the surfaces are not used). */
function profile(path: DiffusionPath, psat: number[], pe: number, pi: number, wet?: number[]) {
  const work = glaserWork(path.nodeCount);
  const vertices = glaserProfile(path, psat, pe, pi, wet ?? psat.map(() => 0), work);
  return { p: work.p.slice(), rate: work.rate.slice(), vertices };
}

describe('assemblePath', () => {
  it('numbers nodes outside → inside with cumulative R (Rse first) and s_d', () => {
    const path = assemblePath([layer(0.1, 2, 0), layer(0.2, 3, 1)], 0.13, 0.04);
    expect(path.nodeCount).toBe(3);
    expect(path.resistance).toEqual([0.04, 0.04 + 0.1, 0.04 + 0.1 + 0.2]);
    expect(path.sd).toEqual([0, 2, 5]);
    expect(path.totalResistance).toBeCloseTo(0.47, 12);
    expect(path.totalSd).toBe(5);
    expect(path.outerLayer).toEqual([-1, 0, 1]);
    expect(path.innerLayer).toEqual([0, 1, -1]);
  });
  it('splits a layer of R > 0.25 m²·K/W into equal sub-layers, but never an air layer', () => {
    expect(sublayerCount(1.0, true, 0.25)).toBe(4);
    expect(sublayerCount(1.01, true, 0.25)).toBe(5);
    expect(sublayerCount(0.25, true, 0.25)).toBe(1);
    expect(sublayerCount(1.0, false, 0.25)).toBe(1);
    const path = assemblePath([layer(1.0, 4, 0), layer(0.5, 1, 1, false)], 0.13, 0.04);
    expect(path.sublayers).toEqual([4, 1]);
    expect(path.nodeCount).toBe(6);
    expect(path.sd[2]).toBeCloseTo(2, 12);
    expect(path.outerLayer[2]).toBe(0);
    expect(path.innerLayer[2]).toBe(0);
  });
  it('refuses a layer without vapour resistance, naming the layer', () => {
    expect(() => assemblePath([layer(0.1, 0, 3)], 0.13, 0.04)).toThrow(CalcInputError);
    expect(() => assemblePath([layer(0.1, 0, 3)], 0.13, 0.04)).toThrow(/layers\.3\.vapour/);
  });
  it('refuses more than MAX_SUBLAYERS sub-layers in all, naming the most resistive layer', () => {
    // 249 + 1 m²·K/W → 996 + 4 = 1000 sub-layers: allowed.
    expect(assemblePath([layer(249, 1, 0), layer(1, 1, 1)], 0.13, 0.04).nodeCount).toBe(MAX_SUBLAYERS + 1);
    // R = 2000 m²·K/W (2 m of λ 0.001) would need 8000 — the fuzz test's runaway allocation.
    const e = (() => {
      try {
        assemblePath([layer(1, 1, 0), layer(2000, 1, 1), layer(0.1, 1, 2)], 0.13, 0.04);
      } catch (err) {
        return err as CalcInputError;
      }
      throw new Error('expected a CalcInputError');
    })();
    expect(e).toBeInstanceOf(CalcInputError);
    expect(e.field).toBe('layers.1');
    expect(e.reason).toMatch(/8000 sub-layers/);
    expect(() => assemblePath([layer(Number.POSITIVE_INFINITY, 1, 4)], 0.13, 0.04)).toThrow(/layers\.4/);
  });
  it('refuses a sub-layer whose s_d is lost in rounding beside a large s_d (the vapour line would be vertical)', () => {
    // 1e-6 m in 200 sub-layers adds 5e-9 m to 1e8 m: below half an ulp, so two nodes would share s_d.
    expect(() => assemblePath([layer(0.1, 1e8, 0), layer(50, 1e-6, 1)], 0.13, 0.04)).toThrow(
      /layers\.1\.vapour/,
    );
    expect(assemblePath([layer(0.1, 1e4, 0), layer(50, 1e-6, 1)], 0.13, 0.04).nodeCount).toBe(202);
  });
});

describe('nodeTemperatures', () => {
  it('falls linearly with R from θ_i to θ_e (derived)', () => {
    const path = assemblePath([layer(1, 1, 0, false), layer(2, 1, 1, false)], 0.5, 0.5);
    expect(nodeTemperatures(path, 20, -20)).toEqual([-15, -5, 15]);
    expect(saturationPressures([0])[0]).toBe(610.5);
  });
});

describe('glaserProfile — tangent construction', () => {
  const path = assemblePath(
    [layer(0.1, 1, 0), layer(0.1, 1, 1), layer(0.1, 1, 2), layer(0.1, 1, 3)],
    0.13,
    0.04,
  );

  it('keeps the straight line and no rates when p stays under p_sat everywhere', () => {
    const r = profile(path, [0, 2000, 2000, 2000, 0], 400, 1200);
    expect(r.vertices).toBe(2);
    expect(r.p).toEqual([400, 600, 800, 1000, 1200]);
    expect(r.rate.every((g) => g === 0)).toBe(true);
  });

  it('touches p_sat at one plane with ISO’s g_c = δ₀[(p_i − p_c)/s′_c − (p_c − p_e)/(s′_T − s′_c)]', () => {
    // Plane at node 1: s′_c from inside = 3 m, s′_T − s′_c = 1 m (derived expectation).
    const r = profile(path, [0, 450, 2000, 2000, 0], 400, 1200);
    expect(r.p[1]).toBe(450);
    expect(r.rate[1]).toBeCloseTo(DELTA_0 * ((1200 - 450) / 3 - (450 - 400) / 1), 20);
    expect(r.rate.filter((g) => g !== 0)).toHaveLength(1);
  });

  it('is the lower convex hull, not "every node where the straight line exceeds p_sat"', () => {
    // Straight line 400 → 1200 Pa gives 600/800/1000 Pa at nodes 1–3. Nodes 1 and 2 (p_sat 500, 700) are
    // both hull vertices; node 3 (1100) stays above the string, which passes it at 700 + 500/2 = 950 Pa.
    const r = profile(path, [0, 500, 700, 1100, 0], 400, 1200);
    expect(r.rate[1]).toBeGreaterThan(0);
    expect(r.rate[2]).toBeGreaterThan(0);
    expect(r.rate[3]).toBe(0);
    expect(r.p[3]).toBeCloseTo(950, 9);
    // With p_sat 560 at node 1 the straight line (600) still exceeds it, yet the string pulled down to
    // node 2 passes node 1 at (400 + 700)/2 = 550 Pa: node 1 is not a condensation plane.
    const skipped = profile(path, [0, 560, 700, 1100, 0], 400, 1200);
    expect(skipped.rate[1]).toBe(0);
    expect(skipped.rate[2]).toBeGreaterThan(0);
    expect(skipped.p[1]).toBeCloseTo(550, 9);
  });

  it('gives each of two planes its own rate from its neighbouring vertices', () => {
    const r = profile(path, [0, 500, 2000, 900, 0], 400, 1500);
    const g1 = DELTA_0 * ((900 - 500) / 2 - (500 - 400) / 1);
    const g3 = DELTA_0 * ((1500 - 900) / 1 - (900 - 500) / 2);
    expect(r.rate[1]).toBeCloseTo(g1, 20);
    expect(r.rate[3]).toBeCloseTo(g3, 20);
    // Balance: Σ g = flux in from the interior − flux out to the exterior.
    expect(r.rate[1]! + r.rate[3]!).toBeCloseTo(DELTA_0 * ((1500 - 900) / 1 - (500 - 400) / 1), 20);
  });

  it('pins a wet plane at p_sat: it evaporates while another plane condenses', () => {
    // Node 3 holds water but is warm (p_sat 1400 > the dry line); node 1 is cold.
    const psat = [0, 450, 2000, 1400, 0];
    const r = profile(path, psat, 400, 1200, [0, 0, 0, 0.1, 0]);
    expect(r.p[3]).toBe(1400);
    expect(r.rate[3]).toBeLessThan(0);
    expect(r.rate[1]).toBeGreaterThan(0);
    expect(r.rate[3]).toBeCloseTo(DELTA_0 * ((1200 - 1400) / 1 - (1400 - 450) / 2), 20);
  });
});
