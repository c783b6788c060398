import { describe, expect, it } from 'vitest';
import { CalcInputError } from '../errors';
import { solveBridge } from './bridge';
import { demoGirtModel } from './fixtures';
import { bridgeModelSchema } from './schema';
import { type ClipTemplate, carve, clipModel, type GirtTemplate, girtModel } from './templates';

const wall = {
  layers: [
    { name: 'cladding sheet', thickness: 0.0006, lambda: 50 },
    { name: 'mineral wool', thickness: 0.1, lambda: 0.035 },
    { name: 'liner', thickness: 0.0006, lambda: 50 },
  ],
  crosses: { from: 1, to: 1 },
};
const girt: GirtTemplate = {
  ...wall,
  profile: 'z',
  spacing: 0.6,
  thickness: 0.0015,
  outerFlange: 0.05,
  innerFlange: 0.05,
};
const clip: ClipTemplate = {
  layers: [
    { name: 'cladding sheet', thickness: 0.0007, lambda: 50 },
    { name: 'mineral wool', thickness: 0.1, lambda: 0.035 },
    { name: 'concrete', thickness: 0.15, lambda: 2 },
  ],
  crosses: { from: 1, to: 1 },
  spacingX: 0.6,
  spacingZ: 0.6,
  width: 0.08,
  thickness: 0.003,
  mesh: { interfaceCell: 0.005, maxCell: 0.1 },
};
const solve = (m: unknown) => solveBridge(bridgeModelSchema.parse(m));
const refusedField = (run: () => unknown) => {
  try {
    run();
  } catch (e) {
    if (e instanceof CalcInputError) return e.field;
    throw e;
  }
  return 'accepted';
};

describe('carve', () => {
  it('leaves the pieces around a hole, which fill the box less the hole', () => {
    const pieces = carve({ name: 'wool', lambda: 0.035, min: [0, 0], max: [1, 1] }, [
      { min: [0.4, 0.2], max: [0.5, 1] },
    ]);
    const area = pieces.reduce((s, p) => s + (p.max[0]! - p.min[0]!) * (p.max[1]! - p.min[1]!), 0);
    expect(area).toBeCloseTo(1 - 0.1 * 0.8, 12);
  });
});

describe('girt template', () => {
  it('builds the same Z girt as the hand-made demo model and gives its ψ', () => {
    const fromTemplate = solve(girtModel(girt));
    const byHand = solve(demoGirtModel());
    expect(fromTemplate.psi!).toBeCloseTo(byHand.psi!, 6);
  });
  it('a C girt bridges about as much as a Z of the same steel; a girt of λ 1 far less', () => {
    const c = solve(girtModel({ ...girt, profile: 'c' }));
    const z = solve(girtModel(girt));
    expect(Math.abs(c.psi! / z.psi! - 1)).toBeLessThan(0.2);
    const wood = solve(girtModel({ ...girt, metalLambda: 1 }));
    expect(wood.psi!).toBeLessThan(z.psi! / 5);
  });
  it('refuses flanges wider than half the spacing and steel thicker than the layer', () => {
    expect(refusedField(() => girtModel({ ...girt, outerFlange: 0.31 }))).toBe('outerFlange');
    expect(
      refusedField(() =>
        girtModel({
          ...girt,
          thickness: 0.006,
          layers: [wall.layers[0]!, { ...wall.layers[1]!, thickness: 0.01 }, wall.layers[2]!],
        }),
      ),
    ).toBe('thickness');
    expect(refusedField(() => girtModel({ ...girt, crosses: { from: 1, to: 3 } }))).toBe('crosses.to');
  });
});

describe('clip template', () => {
  it('gives χ per clip > 0; a thermal break pad lowers it', () => {
    const bare = solve(clipModel(clip));
    const padded = solve(clipModel({ ...clip, pad: { thickness: 0.01, lambda: 0.2 } }));
    expect(bare.chi!).toBeGreaterThan(0);
    expect(padded.chi!).toBeLessThan(bare.chi!);
    expect(bare.solver.energyBalance).toBeLessThan(1e-3);
  });
  it('refuses a pad as deep as the layers the clip crosses (a clip longer than the insulation is deep)', () => {
    expect(refusedField(() => clipModel({ ...clip, pad: { thickness: 0.1, lambda: 0.2 } }))).toBe(
      'pad.thickness',
    );
    expect(refusedField(() => clipModel({ ...clip, width: 0.7 }))).toBe('width');
  });
});
