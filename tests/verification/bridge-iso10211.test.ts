/**
 * Bridge solver vs the reference cases of ISO 10211:2017 Annex C (the same four cases as ISO 10211:2007
 * Annex A), which a method must reproduce to be "high precision": case 1 temperatures within 0.1 K of the
 * analytical solution; case 2 heat flow within 0.1 W/m and temperatures within 0.1 K; case 3 heat flows within
 * 1 % and temperatures within 0.1 K; case 4 heat flow within 1 % and temperature within 0.005 K.
 *
 * Tags: [third-party] read only in a public reproduction (named beside each value); [memory] recalled;
 * "derived" computed here from a formula. The standard itself was not read.
 * - Case geometry, materials and boundary conditions for cases 2, 3 and 4: the Feel++ heat toolbox's case
 *   files `toolboxes/heat/cases/Building/ThermalBridgesENISO10211/case{2,3,4}.{json,geo}` (github.com/feelpp/
 *   feelpp) [third-party]; case 2 also in the validation script of github.com/sebbypy/MScalculator
 *   (`python/examples_and_validation/examples.py`, "validation2") [third-party], which agrees.
 * - Reference results: "ISO 10211:2007 validation of HEAT2 7.0/HEAT3 5.0" (Blocon, on scribd.com, document
 *   224377858) lists case 2 (9.5 W/m; A–I 7.1, 0.8, 7.9, 6.3, 0.8, 16.4, 16.3, 16.8, 18.3 °C) and case 4
 *   (0.540 W, 0.805 °C) with the tolerances above [third-party]; the Feel++ checkers give the same case 2 and
 *   4 values and case 3 (Φα 46.09 W, Φβ 13.89 W, Φγ −59.98 W; θmin α 11.32 °C, θmin β 11.11 °C) [third-party];
 *   QuickField's "ISO 10211:2007 test case A.3 validation" page lists 59.98 W, 11.11 and 11.32 °C as well
 *   [third-party] (it names the rooms the other way round; the Feel++ labels are used, and this solver
 *   agrees with them).
 */
import { DEFAULT_MAX_CELLS, solveBridge, temperatureAt } from '@shared/calc/bridge/bridge';
import { demoGirtModel, demoWall } from '@shared/calc/bridge/examples';
import { type BridgeModelInput, bridgeModelSchema } from '@shared/calc/bridge/schema';
import { clipModel, girtModel } from '@shared/calc/bridge/templates';
import { thermalInputSchema } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { describe, expect, it } from 'vitest';

const model = (m: BridgeModelInput) => bridgeModelSchema.parse(m);
type Pt = number[];
const box = (name: string, lambda: number, min: Pt, max: Pt) => ({ name, lambda, min, max });
const env = (
  name: string,
  side: 'inside' | 'outside',
  temperature: number,
  resistance: number,
  min: Pt,
  max: Pt,
) => ({
  name,
  side,
  temperature,
  resistance,
  min,
  max,
});

describe('ISO 10211 case 1 — half of a square column, one side at 20 °C, the others at 0 °C (2-D)', () => {
  /**
   * Analytical solution (derived) of Laplace's equation in the square 0 ≤ x, s ≤ 1 with θ = θ1 on x = 1 and 0
   * on the other sides: θ = (4θ1/π) Σ_{n odd} sin(nπs)·sinh(nπx) / (n·sinh(nπ)) — separation of variables
   * (Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, §5.2; Incropera et al., Fundamentals of
   * Heat and Mass Transfer, eq. 4.19) [memory]. The model is the half y = s − 0.5 ∈ [0, 0.5], y = 0 a symmetry
   * plane; the 28 points are x = 1/8 … 7/8, y = 0 … 3/8 in steps of 1/8 (the MScalculator script's grid,
   * "validation1") [third-party].
   */
  const analytical = (x: number, y: number) => {
    const s = y + 0.5;
    let sum = 0;
    for (let n = 1; n < 400; n += 2) {
      // sinh(nπx)/sinh(nπ) written with exponentials so that it never overflows.
      const ratio =
        (Math.exp(n * Math.PI * (x - 1)) - Math.exp(-n * Math.PI * (x + 1))) /
        (1 - Math.exp(-2 * n * Math.PI));
      sum += (Math.sin(n * Math.PI * s) * ratio) / n;
    }
    return ((4 * 20) / Math.PI) * sum;
  };
  const m = model({
    dimension: '2d',
    boxes: [box('column', 1, [0, 0], [1, 0.5])],
    boundaries: [
      env('warm side', 'inside', 20, 0, [1, 0], [1, 0.5]),
      env('cold side', 'outside', 0, 0, [0, 0], [0, 0.5]),
      env('cold top', 'outside', 0, 0, [0, 0.5], [1, 0.5]),
    ],
    mesh: { interfaceCell: 0.005, maxCell: 0.005 },
    field: true,
  });
  const result = solveBridge(m);
  const points = [1, 2, 3, 4, 5, 6, 7].flatMap((i) => [0, 1, 2, 3].map((j) => [i / 8, j / 8]));
  it('28 points', () => expect(points).toHaveLength(28));
  it.each(points)('θ(%f, %f) within 0.1 K of the analytical solution', (x, y) => {
    expect(Math.abs(temperatureAt(m, result, [x!, y!]) - analytical(x!, y!))).toBeLessThan(0.1);
  });
});

describe('ISO 10211 case 2 — roof with an aluminium C profile, wood block and concrete (2-D)', () => {
  // x along the roof 0 … 0.5 m (x = 0 the profile's web, both ends adiabatic), y through it: y = 0 inside
  // (20 °C, Rsi 0.11), y = 0.0475 outside (0 °C, Rse 0.06). λ: concrete 1.15, wood 0.12, insulation 0.029,
  // aluminium 230 W/(m·K) [third-party: Feel++ case2.json; MScalculator validation2].
  const al = 230;
  const ins = 0.029;
  const m = model({
    dimension: '2d',
    boxes: [
      box('aluminium, inner sheet', al, [0, 0], [0.5, 0.0015]),
      box('aluminium, web', al, [0, 0.0015], [0.0015, 0.035]),
      box('aluminium, flange', al, [0, 0.035], [0.015, 0.0365]),
      box('wood', 0.12, [0, 0.0365], [0.015, 0.0415]),
      box('concrete', 1.15, [0, 0.0415], [0.5, 0.0475]),
      box('insulation', ins, [0.0015, 0.0015], [0.5, 0.035]),
      box('insulation', ins, [0.015, 0.035], [0.5, 0.0415]),
    ],
    boundaries: [
      env('inside', 'inside', 20, 0.11, [0, 0], [0.5, 0]),
      env('outside', 'outside', 0, 0.06, [0, 0.0475], [0.5, 0.0475]),
    ],
    mesh: { interfaceCell: 0.0005, maxCell: 0.002 },
    field: true,
  });
  const result = solveBridge(m);
  it('heat flow 9.5 W/m within 0.1 W/m; energy balance within 0.1 %', () => {
    expect(Math.abs(result.heatFlow - 9.5)).toBeLessThanOrEqual(0.1);
    expect(result.solver.energyBalance).toBeLessThan(1e-3);
  });
  const reference: [string, Pt, number][] = [
    ['A', [0, 0.0475], 7.1],
    ['B', [0.5, 0.0475], 0.8],
    ['C', [0, 0.0415], 7.9],
    ['D', [0.015, 0.0415], 6.3],
    ['E', [0.5, 0.0415], 0.8],
    ['F', [0, 0.0365], 16.4],
    ['G', [0.015, 0.0365], 16.3],
    ['H', [0, 0], 16.8],
    ['I', [0.5, 0], 18.3],
  ];
  it.each(reference)('θ%s within 0.1 K', (_, at, expected) => {
    expect(Math.abs(temperatureAt(m, result, at) - expected)).toBeLessThanOrEqual(0.1);
  });
});

describe('ISO 10211 case 4 — steel bar through an insulation layer (3-D)', () => {
  // Insulation 1 × 1 m, 0.2 m thick, λ 0.1; steel bar 0.1 × 0.05 m, λ 50, from the outside face (y = 0) to
  // 0.4 m beyond the inside face; Rs 0.1 on both sides; 1 °C inside, 0 °C outside [third-party: Feel++
  // case4.geo/json]. A quarter is modelled (x ≥ 0.5, z ≥ 0.5: two symmetry planes, adiabatic) and its heat
  // flow multiplied by 4 (derived). Reference: 0.540 W within 1 %, highest outside surface θ 0.805 °C within
  // 0.005 K [third-party: HEAT2/HEAT3 validation; Feel++ checkers].
  const result = solveBridge(
    model({
      dimension: '3d',
      boxes: [
        box('steel bar', 50, [0.5, 0, 0.5], [0.55, 0.6, 0.525]),
        box('insulation', 0.1, [0.55, 0, 0.5], [1, 0.2, 1]),
        box('insulation', 0.1, [0.5, 0, 0.525], [0.55, 0.2, 1]),
      ],
      boundaries: [
        env('outside', 'outside', 0, 0.1, [0.5, 0, 0.5], [1, 0, 1]),
        env('inside face', 'inside', 1, 0.1, [0.5, 0.2, 0.5], [1, 0.2, 1]),
        env('bar end', 'inside', 1, 0.1, [0.5, 0.6, 0.5], [0.55, 0.6, 0.525]),
        env('bar side', 'inside', 1, 0.1, [0.55, 0.2, 0.5], [0.55, 0.6, 0.525]),
        env('bar top', 'inside', 1, 0.1, [0.5, 0.2, 0.525], [0.55, 0.6, 0.525]),
      ],
      mesh: { interfaceCell: 0.0025, maxCell: 0.025, growth: 1.2 },
    }),
    1_000_000,
  );
  it('heat flow 0.540 W within 1 %; energy balance within 0.1 %', () => {
    expect(Math.abs((4 * result.heatFlow) / 0.54 - 1)).toBeLessThanOrEqual(0.01);
    expect(result.solver.energyBalance).toBeLessThan(1e-3);
  });
  it('highest outside surface temperature 0.805 °C within 0.005 K', () => {
    expect(Math.abs(result.boundaries[0]!.maxSurfaceTemperature - 0.805)).toBeLessThanOrEqual(0.005);
  });
});

describe('ISO 10211 case 3 — wall, floor slab and balcony at an outside corner, three environments (3-D)', () => {
  // Geometry in metres from the Feel++ case3.geo [third-party]: outside wall 0.1 m (λ 1) on the two outer
  // faces x = −0.1 and y = −0.1, insulation 0.05 m (λ 0.04), inner wall leaf 0.15 m (λ 0.7), slab
  // 0.15 m (λ 2.5) at z 1.0–1.15 running through the wall into a balcony to y = −0.7, floor finish 0.05 m
  // (λ 1); room α below (20 °C), room β above (15 °C), both Rs 0.2; outside γ 0 °C, Rs 0.05; the cut planes
  // x = 1.2, y = 1.2, z = 0 and z = 2.15 adiabatic. At the default-like mesh here (262 080 cells, 10 mm at
  // the edges): Φα 46.03, Φβ 13.88, Σγ −59.91 W; θmin α 11.32, β 11.10 °C (2026-12-04).
  const m = model({
    dimension: '3d',
    boxes: [
      box('outside wall', 1, [-0.1, -0.1, 0], [0, 1.2, 2.15]),
      box('outside wall', 1, [0, -0.1, 0], [1.2, 0, 1]),
      box('outside wall', 1, [0, -0.1, 1.15], [1.2, 0, 2.15]),
      box('outside wall', 1, [0, -0.1, 1], [0.05, 0, 1.15]),
      box('insulation', 0.04, [0, 0, 0], [0.05, 1.2, 2.15]),
      box('insulation', 0.04, [0.05, 0, 0], [1.2, 0.05, 1]),
      box('insulation', 0.04, [0.05, 0, 1.15], [1.2, 0.05, 2.15]),
      box('slab and balcony', 2.5, [0.05, -0.7, 1], [1.2, 1.2, 1.15]),
      box('inner leaf, lower', 0.7, [0.05, 0.05, 0], [0.2, 1.2, 1]),
      box('inner leaf, lower', 0.7, [0.2, 0.05, 0], [1.2, 0.2, 1]),
      box('inner leaf, upper', 0.7, [0.05, 0.05, 1.15], [0.2, 1.2, 2.15]),
      box('inner leaf, upper', 0.7, [0.2, 0.05, 1.15], [1.2, 0.2, 2.15]),
      box('floor finish', 1, [0.2, 0.2, 1.15], [1.2, 1.2, 1.2]),
    ],
    boundaries: [
      env('room α', 'inside', 20, 0.2, [0.2, 0.2, 0], [1.2, 1.2, 1]),
      env('room β', 'inside', 15, 0.2, [0.2, 0.2, 1.2], [1.2, 1.2, 2.15]),
      env('outside, x face', 'outside', 0, 0.05, [-0.1, -0.1, 0], [-0.1, 1.2, 2.15]),
      env('outside, y face', 'outside', 0, 0.05, [-0.1, -0.1, 0], [1.2, -0.1, 2.15]),
      env('balcony side', 'outside', 0, 0.05, [0.05, -0.7, 1], [0.05, -0.1, 1.15]),
      env('balcony top', 'outside', 0, 0.05, [0.05, -0.7, 1.15], [1.2, -0.1, 1.15]),
      env('balcony soffit', 'outside', 0, 0.05, [0.05, -0.7, 1], [1.2, -0.1, 1]),
      env('balcony end', 'outside', 0, 0.05, [0.05, -0.7, 1], [1.2, -0.7, 1.15]),
    ],
    mesh: { interfaceCell: 0.01, maxCell: 0.05, growth: 1.3 },
  });
  const result = solveBridge(m, 3_000_000);
  const flow = (side: 'α' | 'β') => result.boundaries.find((b) => b.name === `room ${side}`)!;
  const outside = result.boundaries.filter((b) => b.side === 'outside').reduce((s, b) => s + b.heatFlow, 0);
  it('heat flows α 46.09 W, β 13.89 W, γ −59.98 W, each within 1 %', () => {
    expect(Math.abs(flow('α').heatFlow / 46.09 - 1)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(flow('β').heatFlow / 13.89 - 1)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(outside / -59.98 - 1)).toBeLessThanOrEqual(0.01);
    expect(result.solver.energyBalance).toBeLessThan(1e-3);
  });
  it('lowest surface temperatures α 11.32 °C and β 11.11 °C within 0.1 K', () => {
    expect(Math.abs(flow('α').minSurfaceTemperature - 11.32)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(flow('β').minSurfaceTemperature - 11.11)).toBeLessThanOrEqual(0.1);
  });
});

describe('cross-check with the 1-D engine: a wall without a bridge (derived)', () => {
  // Steel sheet 0.6 mm (λ 50), mineral wool 100 mm (λ 0.035), gypsum 12.5 mm (λ 0.25); Rse 0.04, Rsi 0.13
  // (ISO 6946:2017 Table 7, as the thermal engine uses). With no bridge, L = U·A exactly, so ψ and χ are 0
  // and L / A is the clear-field U of calculateThermal.
  const layers = [
    { name: 'steel sheet', d: 0.0006, lambda: 50 },
    { name: 'mineral wool', d: 0.1, lambda: 0.035 },
    { name: 'gypsum board', d: 0.0125, lambda: 0.25 },
  ];
  const u1d = 1 / (0.04 + layers.reduce((s, l) => s + l.d / l.lambda, 0) + 0.13);
  const thermalU = calculateThermal(
    thermalInputSchema.parse({
      layers: layers.map((l) => ({
        kind: 'homogeneous',
        name: l.name,
        thickness: l.d,
        conductivity: l.lambda,
      })),
      heatFlow: 'horizontal',
      bridges: [],
    }),
  ).U0;
  const depth = layers.reduce((s, l) => s + l.d, 0);
  const stack = (dim: 2 | 3) => {
    let y = 0;
    return layers.map((l) => {
      const b = box(
        l.name,
        l.lambda,
        dim === 2 ? [0, y] : [0, y, 0],
        dim === 2 ? [0.6, y + l.d] : [0.6, y + l.d, 0.4],
      );
      y += l.d;
      return b;
    });
  };
  const faces = (dim: 2 | 3) => [
    env('outside', 'outside', 0, 0.04, dim === 2 ? [0, 0] : [0, 0, 0], dim === 2 ? [0.6, 0] : [0.6, 0, 0.4]),
    env(
      'inside',
      'inside',
      20,
      0.13,
      dim === 2 ? [0, depth] : [0, depth, 0],
      dim === 2 ? [0.6, depth] : [0.6, depth, 0.4],
    ),
  ];
  it('2-D: ψ = 0 within 1e-4 W/(m·K); L/l = U of the thermal engine within 0.5 %', () => {
    const r = solveBridge(
      model({
        dimension: '2d',
        boxes: stack(2),
        boundaries: faces(2),
        reference: { elements: [{ name: 'wall', u: u1d, size: 0.6 }] },
      }),
    );
    expect(Math.abs(r.psi!)).toBeLessThan(1e-4);
    expect(Math.abs(r.coupling! / 0.6 / thermalU - 1)).toBeLessThan(0.005);
  });
  it('3-D: χ = 0 within 1e-4 W/K; L/A = U of the thermal engine within 0.5 %', () => {
    const r = solveBridge(
      model({
        dimension: '3d',
        boxes: stack(3),
        boundaries: faces(3),
        reference: { elements: [{ name: 'wall', u: u1d, size: 0.24 }], lines: [] },
        mesh: { maxCell: 0.1 },
      }),
    );
    expect(Math.abs(r.chi!)).toBeLessThan(1e-4);
    expect(Math.abs(r.coupling! / 0.24 / thermalU - 1)).toBeLessThan(0.005);
  });
});

describe('grid convergence: the demo girt through insulation (derived)', () => {
  // Every cell split in two along each axis: ψ moves by less than 1 % (default mesh 1606 cells, ψ ≈ 0.347
  // W/(m·K); 6424 cells, ψ ≈ 0.348 — 0.5 %, 2026-12-04).
  it('ψ changes by < 1 % when the mesh is refined 2×', () => {
    const coarse = solveBridge(model(demoGirtModel()));
    const fine = solveBridge(model(demoGirtModel({ subdivide: 2 })));
    expect(fine.cells).toBe(4 * coarse.cells);
    expect(Math.abs(fine.psi! / coarse.psi! - 1)).toBeLessThan(0.01);
  });
  it('the girt template (Z, 1.5 mm): ψ changes by < 1 % when the mesh is refined 2×', () => {
    const coarse = solveBridge(model(girtModel(demoWall.girt)));
    const fine = solveBridge(model(girtModel({ ...demoWall.girt, mesh: { subdivide: 2 } })));
    expect(Math.abs(fine.psi! / coarse.psi! - 1)).toBeLessThan(0.01);
  });
});

describe('grid convergence: the clip template at its default mesh (derived)', () => {
  // Default mesh 211 788 cells, χ ≈ 0.04004 W/K; 2× (1 694 304 cells) χ ≈ 0.04031 — 0.68 %, 2026-12-04.
  // Richardson with the order 1.5 seen between 1, 0.5 and 0.25 mm edge cells: χ ≈ 0.04045, so the default
  // mesh reads about 1 % low. The refined solve takes a minute or more: the one slow check of this file.
  it('χ changes by < 1 % when the mesh is refined 2×; the default mesh is 200 000–250 000 cells', () => {
    const coarse = solveBridge(model(clipModel(demoWall.clip)));
    expect(coarse.cells).toBeGreaterThanOrEqual(200_000);
    expect(coarse.cells).toBeLessThanOrEqual(DEFAULT_MAX_CELLS);
    const fine = solveBridge(model(clipModel({ ...demoWall.clip, mesh: { subdivide: 2 } })), 2_000_000);
    expect(Math.abs(fine.chi! / coarse.chi! - 1)).toBeLessThan(0.01);
  }, 600_000);
});
