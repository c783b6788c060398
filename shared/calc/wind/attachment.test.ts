import { CalcInputError } from '@shared/calc/errors';
import { messageText } from '@shared/format/messages';
import { describe, expect, it } from 'vitest';
import {
  CONTINUITY_FACTOR,
  calculateWindSchedule,
  clipCapacity,
  clipSpacing,
  effectiveWindArea,
  interpolateColumn,
  SPACING_TOLERANCE,
  spanCheck,
  spanForPressure,
} from './attachment';
import { demoPanel, demoSite, demoWindSchedule } from './examples';
import { analyseSite, MINIMUM_PRESSURE, wallPressures } from './pressure';
import { type WindScheduleInput, windScheduleInputSchema, windScheduleResultSchema } from './schema';

/** Run `fn` and return the CalcInputError it throws. */
function inputError(fn: () => unknown): CalcInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalcInputError) return e;
    throw e;
  }
  throw new Error('expected a CalcInputError');
}

const withSite = (site: Partial<WindScheduleInput['site']>): WindScheduleInput => ({
  ...demoWindSchedule(),
  site: { ...demoSite(), ...site },
});

describe('effective wind area and table look-up', () => {
  it('A = span × max(width, span/3)', () => {
    expect(effectiveWindArea(1.5, 0.6)).toBeCloseTo(0.9, 12);
    expect(effectiveWindArea(3, 0.6)).toBeCloseTo(3, 12); // span/3 = 1 m > 0.6 m
  });

  it('interpolates linearly and never extrapolates', () => {
    const spans = [1, 2, 3];
    const values = [3000, 1000, 500];
    expect(interpolateColumn(spans, values, 1.5)).toBeCloseTo(2000, 12);
    expect(interpolateColumn(spans, values, 3)).toBe(500);
    expect(interpolateColumn(spans, values, 0.99)).toBeNull();
    expect(interpolateColumn(spans, values, 3.01)).toBeNull();
  });

  it('finds the largest span carrying a pressure: interpolated, at the table end, or outside the table', () => {
    const spans = [1, 2, 3];
    const allowable = [3000, 1000, 500];
    expect(spanForPressure(spans, allowable, 2000)).toEqual({ span: 1.5, status: 'ok' });
    expect(spanForPressure(spans, allowable, 400)).toEqual({ span: 3, status: 'table-end' });
    expect(spanForPressure(spans, allowable, 3001)).toBeNull();
    expect(spanForPressure([1, 2, 3], [1000, 1000, 500], 1000)).toEqual({ span: 2, status: 'ok' });
  });
});

describe('fixed-point spacing searches', () => {
  it('a span check converges to a fixed point of s = span(p(A(s)))', () => {
    const spans = [0.5, 1, 1.5, 2, 2.5, 3];
    const allowable = spans.map((s) => 2000 / (s * s));
    const demand = (s: number) => 900 - 100 * Math.log10(1 + s);
    const c = spanCheck('outward', spans, allowable, demand);
    expect(c.status).toBe('ok');
    expect(c.iteration.converged).toBe(true);
    const again = spanForPressure(spans, allowable, demand(c.maxSpan!))!;
    expect(Math.abs(again.span - c.maxSpan!)).toBeLessThan(SPACING_TOLERANCE);
    expect(c.utilisation!).toBeLessThanOrEqual(1);
  });

  it('clip spacing: P = C·p(A_c)·s_g·s_c at the fixed point, and each iterate is on the safe side', () => {
    const p = (A: number) => 1200 - 200 * Math.min(1, A / 5);
    const r = clipSpacing(2000, 1.25, 1.5, p);
    expect(r.iteration.converged).toBe(true);
    expect(r.demand).toBeLessThanOrEqual(2000 * (1 + 1e-9));
    expect(r.demand).toBeGreaterThan(2000 * 0.999);
    expect(r.effectiveArea).toBeCloseTo(r.maxSpacing * 1.5, 12);
  });

  it('clip capacity is the rating, or fastener capacity × fasteners', () => {
    expect(clipCapacity({ allowableLoad: 1800 })).toBe(1800);
    expect(clipCapacity({ fastenerCapacity: 1150, fastenersPerClip: 2 })).toBe(2300);
    expect(inputError(() => clipCapacity({ fastenerCapacity: 1150, fastenersPerClip: 1.5 })).field).toBe(
      'panel.clip.fastenersPerClip',
    );
  });
});

describe('continuity factors (beam theory, derived)', () => {
  /** Interior reactions of n equal spans under uniform load w = 1, L = 1 by the three-moment equation. */
  function maxInteriorReaction(n: number): number {
    // M_{i−1} + 4M_i + M_{i+1} = −1/2 for i = 1..n−1, M_0 = M_n = 0 (Gauss–Seidel is ample here).
    const M = new Array<number>(n + 1).fill(0);
    for (let k = 0; k < 200; k++) for (let i = 1; i < n; i++) M[i] = (-0.5 - M[i - 1]! - M[i + 1]!) / 4;
    let max = 0;
    for (let i = 1; i < n; i++) max = Math.max(max, 1 + (M[i - 1]! - M[i]!) + (M[i + 1]! - M[i]!));
    return max;
  }

  it('two equal spans 1.25, three equal spans 1.10, single span 1.0', () => {
    expect(maxInteriorReaction(2)).toBeCloseTo(CONTINUITY_FACTOR.double, 12);
    expect(maxInteriorReaction(3)).toBeCloseTo(CONTINUITY_FACTOR.triple, 12);
    expect(CONTINUITY_FACTOR.single).toBe(1);
  });
});

describe('calculateWindSchedule — demo wall', () => {
  const r = calculateWindSchedule(windScheduleInputSchema.parse(demoWindSchedule()));

  it('matches the result schema', () => {
    expect(() => windScheduleResultSchema.parse(r)).not.toThrow();
  });

  it('finds a girt and clip spacing in both zones, zone 5 no longer than zone 4', () => {
    const [z4, z5] = r.zones;
    expect(z4!.girtSpacing).toBeGreaterThan(0);
    expect(z5!.girtSpacing!).toBeLessThanOrEqual(z4!.girtSpacing!);
    expect(z5!.pressures!.strength.outward).toBeLessThan(z4!.pressures!.strength.outward);
    for (const z of r.zones) {
      expect(z.clip!.maxSpacing).toBeGreaterThan(0);
      expect(z.clip!.utilisation).toBeLessThanOrEqual(1 + 1e-9);
      for (const c of z.spanChecks) {
        expect(c.iteration.converged).toBe(true);
        expect(c.utilisation!).toBeLessThanOrEqual(1 + 1e-9);
      }
    }
  });

  it('governing spacing is the smallest of the span checks', () => {
    for (const z of r.zones) {
      const min = Math.min(...z.spanChecks.map((c) => c.maxSpan!));
      expect(z.girtSpacing).toBe(min);
      expect(z.spanChecks.find((c) => c.maxSpan === min)!.check).toBe(z.governingCheck);
    }
  });

  it('ASD pressures are 0.6 × strength and respect the 16 psf minimum', () => {
    for (const z of r.zones) {
      const p = z.pressures!;
      expect(p.asd.outward).toBeCloseTo(0.6 * p.strength.outward, 9);
      expect(p.asd.inward).toBeCloseTo(0.6 * p.strength.inward, 9);
      expect(p.strength.inward).toBeGreaterThanOrEqual(MINIMUM_PRESSURE);
      expect(-p.strength.outward).toBeGreaterThanOrEqual(MINIMUM_PRESSURE);
    }
  });

  it('shows the edition’s velocity-pressure equation with its number, and the cautions', () => {
    expect(r.trace.find((s) => s.id === 'wind.qh')!.formula).toContain('Eq. 26.10-1');
    expect(r.cautions.join(' ')).toContain('engineer of record');
    expect(r.cautions.join(' ')).toContain('manufacturer’s tested values govern');
  });

  it('uses the continuity factor of the span condition unless one is entered', () => {
    expect(r.zones[0]!.clip!.continuityFactor).toBe(1.25);
    const single = calculateWindSchedule({
      ...demoWindSchedule(),
      panel: { ...demoPanel(), continuityFactor: 1 },
    });
    expect(single.zones[0]!.clip!.maxSpacing).toBeGreaterThan(r.zones[0]!.clip!.maxSpacing);
  });
});

describe('calculateWindSchedule — editions, heights and table limits', () => {
  it('7-22 leaves K_d out of q and puts it in p: same pressures when K_z is equal', () => {
    const s16 = analyseSite(demoSite());
    const s22 = analyseSite({ ...demoSite(), edition: 'ASCE 7-22' });
    expect(s22.velocity.qh / s22.velocity.Kh).toBeCloseTo(s16.velocity.qh / s16.velocity.Kh / 0.85, 6);
    const p16 = wallPressures(s16, 5, 1).strength.outward / s16.velocity.Kh;
    const p22 = wallPressures(s22, 5, 1).strength.outward / s22.velocity.Kh;
    expect(p22).toBeCloseTo(p16, 6);
    expect(s22.velocity.equation).toContain('K_d enters p');
  });

  it('above the gradient height z_g: a message with h and z_g in m, worded in SI and IP', () => {
    // ASCE 7-16 Table 26.11-1 [memory]: exposure D, z_g = 700 ft = 213.36 m; h = 220 m lies above it.
    const high = analyseSite({ ...demoSite(), exposure: 'D', meanRoofHeight: 220, roofSlopeDeg: 0 });
    const w = high.warnings.find((m) => m.code === 'above_gradient_height')!;
    expect(w.path).toBe('site.meanRoofHeight');
    expect(w.values.height).toBe(220);
    expect(w.values.gradientHeight).toBeCloseTo(213.36, 9);
    expect(messageText(w)).toBe(
      'The mean roof height (220\u202fm) lies above the gradient height z_g (213.36\u202fm); K_z is held at its value at z_g',
    );
    expect(messageText(w, 'IP')).toContain(
      '(721.8\u202fft) lies above the gradient height z_g (700\u202fft)',
    );
    expect(analyseSite(demoSite()).warnings.some((m) => m.code === 'above_gradient_height')).toBe(false);
  });

  it('h > 60 ft: h > 60 figure, q_z for inward pressure, and a caution to confirm the coefficients', () => {
    const tall = { ...demoSite(), meanRoofHeight: 40, roofSlopeDeg: 0 };
    const top = analyseSite(tall);
    const low = analyseSite({ ...tall, heightOfComponent: 5 });
    expect(top.lowRise).toBe(false);
    expect(top.figure).toContain('30.5-1');
    expect(top.warnings.map((w) => messageText(w)).join(' ')).toContain('confirm the wall GC_p values');
    expect(wallPressures(low, 4, 2).strength.inward).toBeLessThan(wallPressures(top, 4, 2).strength.inward);
    expect(wallPressures(low, 4, 2).strength.outward).toBe(wallPressures(top, 4, 2).strength.outward);
  });

  it('outside the table: a clear status and no number', () => {
    const r = calculateWindSchedule(withSite({ basicWindSpeed: 120 }));
    for (const z of r.zones) {
      expect(z.status).toBe('outside-table');
      expect(z.girtSpacing).toBeNull();
      expect(z.clip).toBeNull();
    }
    expect(r.warnings.map((w) => messageText(w)).join(' ')).toContain('outside the table');
  });

  it('at the end of the table: the longest tabulated span, flagged, never more', () => {
    const weak = calculateWindSchedule({
      site: { ...demoSite(), basicWindSpeed: 20 },
      panel: {
        ...demoPanel(),
        loadSpanTable: {
          spanCondition: 'single',
          deflectionLimit: 'L/120',
          rows: [
            { span: 0.6, allowableInward: 5000, allowableOutward: 5000 },
            { span: 1.2, allowableInward: 4000, allowableOutward: 4000 },
          ],
        },
      },
    });
    for (const z of weak.zones) {
      expect(z.status).toBe('table-end');
      expect(z.girtSpacing).toBe(1.2);
      expect(z.pressures!.minimumGoverns).toBe(true);
    }
    expect(weak.warnings.map((w) => messageText(w)).join(' ')).toContain(
      'longer spans are outside the table',
    );
  });
});

describe('calculateWindSchedule — impossible input', () => {
  it('refuses a negative wind speed, h ≤ 0, a component above the roof and an open building', () => {
    expect(inputError(() => calculateWindSchedule(withSite({ basicWindSpeed: -1 }))).field).toBe(
      'site.basicWindSpeed',
    );
    expect(inputError(() => calculateWindSchedule(withSite({ meanRoofHeight: 0 }))).field).toBe(
      'site.meanRoofHeight',
    );
    expect(inputError(() => calculateWindSchedule(withSite({ heightOfComponent: 12 }))).field).toBe(
      'site.heightOfComponent',
    );
    expect(inputError(() => calculateWindSchedule(withSite({ enclosure: 'open' }))).field).toBe(
      'site.enclosure',
    );
  });

  const withRows = (rows: WindScheduleInput['panel']['loadSpanTable']['rows']): WindScheduleInput => ({
    ...demoWindSchedule(),
    panel: { ...demoPanel(), loadSpanTable: { ...demoPanel().loadSpanTable, rows } },
  });

  it('refuses table rows not increasing in span, rising allowables and a partial deflection column', () => {
    const rows = demoPanel().loadSpanTable.rows;
    const swapped = [rows[1]!, rows[0]!, ...rows.slice(2)];
    expect(inputError(() => calculateWindSchedule(withRows(swapped))).field).toBe(
      'panel.loadSpanTable.rows.1.span',
    );
    const rising = rows.map((r, i) => (i === 3 ? { ...r, allowableOutward: 5000 } : r));
    expect(inputError(() => calculateWindSchedule(withRows(rising))).field).toBe(
      'panel.loadSpanTable.rows.3.allowableOutward',
    );
    const partial = rows.map((r, i) => (i === 2 ? { ...r, allowableDeflectionPressure: undefined } : r));
    expect(inputError(() => calculateWindSchedule(withRows(partial))).field).toBe('panel.loadSpanTable.rows');
  });
});
