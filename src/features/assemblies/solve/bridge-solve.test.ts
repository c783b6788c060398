import { templateWall } from '@shared/calc/bridge/templates';
import { describe, expect, it } from 'vitest';
import { demoInput } from '../../../lib/revision-test-fixtures';
import { computedSourceText, sectionOf } from './bridge-solve';

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

  it('reads the mid-plane of a 3-D field (z between the middle edges)', () => {
    const grid = { x: [0, 1, 2], y: [0, 1], z: [0, 1, 2, 3] };
    const field = [1, 2, 3, 4, 5, 6];
    expect(sectionOf({ grid, field })?.values).toEqual([3, 4]);
    expect(sectionOf({ grid: { ...grid, z: [0, 1] }, field: [7, 8] })?.values).toEqual([7, 8]);
  });

  it('words the source of a computed value', () => {
    expect(computedSourceText('1.2.3', 12345, new Date('2026-12-04T10:00:00Z'))).toBe(
      'computed by Skinwright 1.2.3, mesh 12,345 cells, 2026-12-04',
    );
  });
});
