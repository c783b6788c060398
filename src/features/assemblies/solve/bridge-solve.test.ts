import { templateWall } from '@shared/calc/bridge/templates';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { describe, expect, it } from 'vitest';
import { demoInput } from '../../../lib/revision-test-fixtures';
import { withSolvedValue } from '../components/ThermalBridgesEditor';
import {
  annexFChi,
  computedSourceText,
  initialInputs,
  linearDetailOf,
  linearInputs,
  solveModel,
  solvesFor,
} from './bridge-solve';

describe('bridge-solve: the assembly as a solver template', () => {
  it('drops the layers outside a well-ventilated cavity and takes Rse = Rsi (ISO 6946:2017 §6.9.4)', () => {
    const wall = templateWall(demoInput.thermal.layers);
    // The demo wall: steel face and ventilated cavity outside, six layers inside from the barrier on.
    expect(wall.indices).toEqual([2, 3, 4, 5, 6, 7]);
    expect(wall.rse).toBe(0.13);
    expect(wall.rsi).toBe(0.13);
    // Declared R 0.01 over 0.5 mm: λ = d/R = 0.05 W/(m·K) (derived).
    expect(wall.layers[0]!.lambda).toBeCloseTo(0.05, 12);
    // Framed layer by isothermal planes, λ = Σ f·λ (ISO 6946:2017 §6.7.2; derived from the demo fractions).
    const f = 0.00270935960591133;
    expect(wall.layers[3]!.lambda).toBeCloseTo((1 - f) * 0.04 + f * 50, 9);
  });

  it('words the source of a computed value', () => {
    expect(computedSourceText('1.2.3', 12345, new Date('2026-12-04T10:00:00Z'))).toBe(
      'computed by Skinwright 1.2.3, mesh 12,345 cells, 2026-12-04',
    );
  });
});

describe('bridge-solve: fastener and edge details from the build-up page rows', () => {
  const layers = demoInput.thermal.layers;
  const fastener = demoInput.thermal.bridges.find((b) => b.kind === 'fastener')!;
  const girt = demoInput.thermal.bridges.find((b) => b.kind === 'linear')!;

  it('a fastener row: its diameter, λ and layer, a square grid of its count per area', () => {
    const inputs = initialInputs(fastener, layers);
    const wall = templateWall(layers);
    expect(inputs).toMatchObject({ kind: 'fastener', diameter: 0.005, metalLambda: 50, recess: 0 });
    if (inputs.kind !== 'fastener') throw new Error('fastener expected');
    // 4 per m² → 0.5 m × 0.5 m (derived: √(1/4)).
    expect(inputs.spacingX).toBeCloseTo(0.5, 12);
    expect(wall.indices[inputs.from]).toBe(3); // the demo screws cross layer 3, the mineral wool
    expect(solvesFor(inputs)).toBe('chi');
    expect(solveModel(inputs, layers).dimension).toBe('3d');
  });

  it('a linear row names its detail; each edge gives a 2-D model → ψ', () => {
    expect(linearDetailOf('Horizontal girts')).toBe('girt');
    expect(linearDetailOf('Slab edge at level 2')).toBe('slab');
    expect(linearDetailOf('Outside corners')).toBe('corner');
    expect(linearDetailOf('Window perimeter')).toBe('opening');
    for (const d of ['girt', 'slab', 'corner', 'opening'] as const) {
      const inputs = linearInputs(d, girt as Extract<typeof girt, { kind: 'linear' }>, layers);
      expect(inputs.kind).toBe(d);
      expect(solvesFor(inputs)).toBe('psi');
      expect(solveModel(inputs, layers).dimension).toBe('2d');
    }
  });

  it('the Annex F χ per fastener is ΔU_f / n_f of the engine (ISO 6946:2017 Annex F)', () => {
    if (fastener.kind !== 'fastener') throw new Error('fastener expected');
    const chi = annexFChi(fastener, layers)!;
    const r = calculateThermal({ layers, heatFlow: 'horizontal', bridges: [fastener] });
    expect(chi * fastener.countPerArea).toBeCloseTo(r.bridges[0]!.deltaU, 12);
    expect(chi).toBeGreaterThan(0);
  });

  it('"Use this value" on a fastener row makes a point bridge of χ at the same count', () => {
    const solved = withSolvedValue(fastener, 0.002, { text: 'computed' });
    expect(solved).toEqual({
      kind: 'point',
      name: fastener.name,
      chi: 0.002,
      countPerArea: 4,
      source: { text: 'computed' },
    });
    expect(withSolvedValue(girt, 0.03, { text: 'x' })).toMatchObject({
      kind: 'linear',
      psi: 0.03,
      spacing: 1.2,
    });
  });
});
