import { CalcInputError } from '@shared/calc/errors';
import { FOOT } from '@shared/units';
import { describe, expect, it } from 'vitest';
import {
  edgeWidth,
  HIGH_RISE_WALL,
  internalPressureCoefficient,
  LOW_RISE_WALL,
  logLinear,
  wallFigure,
  wallGCp,
} from './coefficients';

const FT2 = FOOT * FOOT;

describe('log-linear figure curves', () => {
  const curve = LOW_RISE_WALL.zone5;

  it('returns the breakpoint values and is flat outside them', () => {
    expect(logLinear(curve, 10)).toBeCloseTo(-1.4, 12);
    expect(logLinear(curve, 500)).toBeCloseTo(-0.8, 12);
    expect(logLinear(curve, 1)).toBeCloseTo(-1.4, 12);
    expect(logLinear(curve, 5000)).toBeCloseTo(-0.8, 12);
  });

  it('is linear in log₁₀A: the geometric mean of the breakpoints gives the mean value (derived)', () => {
    expect(logLinear(curve, Math.sqrt(10 * 500))).toBeCloseTo(-1.1, 12);
  });
});

describe('wall GC_p', () => {
  it('converts m² to ft²: 10 ft² in m² lands exactly on the breakpoint', () => {
    const g = wallGCp(true, 4, 10 * FT2, 30);
    expect(g.negative).toBeCloseTo(-1.1, 12);
    expect(g.positive).toBeCloseTo(1.0, 12);
  });

  it('reduces the low-rise values by 10 % when θ ≤ 10°, not above, and never for h > 60 ft', () => {
    expect(wallGCp(true, 5, 1, 10).negative).toBeCloseTo(0.9 * wallGCp(true, 5, 1, 10.01).negative, 12);
    expect(wallGCp(false, 5, 1, 5).negative).toBe(wallGCp(false, 5, 1, 30).negative);
  });

  it('zone 5 is never milder than zone 4, and the positive curve is shared', () => {
    for (const lowRise of [true, false])
      for (const A of [0.1, 1, 5, 20, 50, 100]) {
        const z4 = wallGCp(lowRise, 4, A, 20);
        const z5 = wallGCp(lowRise, 5, A, 20);
        expect(z5.negative).toBeLessThanOrEqual(z4.negative);
        expect(z5.positive).toBe(z4.positive);
      }
  });

  it('h > 60 ft curves start at 20 ft²', () => {
    expect(logLinear(HIGH_RISE_WALL.zone5, 20)).toBeCloseTo(-1.8, 12);
    expect(logLinear(HIGH_RISE_WALL.zone5, 15)).toBeCloseTo(-1.8, 12);
  });

  it('names the figure of each edition and height range', () => {
    expect(wallFigure('ASCE 7-16', true)).toContain('Figure 30.3-1');
    expect(wallFigure('ASCE 7-16', false)).toContain('Figure 30.5-1');
    expect(wallFigure('ASCE 7-22', false)).toContain('Figure 30.4-1');
  });
});

describe('internal pressure and end-zone width', () => {
  it('GC_pi 0.18 enclosed, 0.55 partially enclosed; an open building is refused with the field path', () => {
    expect(internalPressureCoefficient('enclosed')).toBe(0.18);
    expect(internalPressureCoefficient('partially_enclosed')).toBe(0.55);
    try {
      internalPressureCoefficient('open');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).field).toBe('site.enclosure');
    }
  });

  it('a = min(0.1·least, 0.4h) ≥ max(0.04·least, 3 ft) for h ≤ 60 ft (derived cases)', () => {
    expect(edgeWidth(true, 9, 30)).toBeCloseTo(3, 12); // 0.1·30 = 3 < 0.4·9 = 3.6
    expect(edgeWidth(true, 5, 60)).toBeCloseTo(2.4, 12); // min(6, 0.4·5 = 2) = 2, but 0.04·60 = 2.4 governs
    expect(edgeWidth(true, 6, 500)).toBeCloseTo(20, 12); // 0.04·500 = 20 governs
    expect(edgeWidth(true, 3, 6)).toBeCloseTo(3 * FOOT, 12); // 3 ft floor
  });

  it('a = 0.1·least ≥ 3 ft for h > 60 ft', () => {
    expect(edgeWidth(false, 40, 50)).toBeCloseTo(5, 12);
    expect(edgeWidth(false, 40, 5)).toBeCloseTo(3 * FOOT, 12);
  });
});
