import { CalcInputError } from '@shared/calc/errors';
import { messageText } from '@shared/format/messages';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { windSite } from '../../../tests/setup/wind-arbitraries';
import {
  CONTINUITY_FACTOR,
  calculateWindSchedule,
  clipCapacity,
  clipSpacing,
  effectiveWindArea,
  interpolateColumn,
  SPACING_TOLERANCE,
} from './attachment';
import { checkDesignSpacing } from './design';
import { demoLoadSpanTable, demoPanel, demoWindSchedule } from './examples';
import { analyseSite, wallPressures } from './pressure';
import {
  type DesignSpacings,
  designSpacingResultSchema,
  type Panel,
  type WindDesignInput,
  windDesignInputSchema,
  type ZoneDesign,
} from './schema';

/*
 * Every expected value below is computed with the engine's own functions (pressures, effective area, table
 * interpolation, clip capacity and clip spacing of attachment.ts / pressure.ts) or is the engine's schedule itself;
 * the demo table and site are the invented examples of examples.ts.
 */

const demo = (design: DesignSpacings): WindDesignInput => ({ ...demoWindSchedule(), design });
const zoneOf = (zones: readonly ZoneDesign[], zone: 4 | 5) => zones.find((z) => z.zone === zone)!;
const checkOf = (z: ZoneDesign, name: string) => z.checks.find((c) => c.check === name)!;

function inputError(fn: () => unknown): CalcInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalcInputError) return e;
    throw e;
  }
  throw new Error('expected a CalcInputError');
}

describe('design spacing of the demo wall', () => {
  it('meets both zones at spacings within the engine’s maxima, every utilisation ≤ 1', () => {
    const input = demo({ girtSpacing: 1.2, clipSpacing: 0.6 });
    const schedule = calculateWindSchedule(input);
    // The premise, from the engine: 1.2 m and 0.6 m lie within both zones' maxima.
    for (const z of schedule.zones) {
      expect(1.2).toBeLessThanOrEqual(z.girtSpacing!);
      expect(0.6).toBeLessThanOrEqual(z.clip!.maxSpacing);
    }
    const { zones } = checkDesignSpacing(input, schedule);
    expect(zones.map((z) => [z.zone, z.girt, z.clip, z.status])).toEqual([
      [4, 'meets', 'meets', 'meets'],
      [5, 'meets', 'meets', 'meets'],
    ]);
    for (const z of zones) for (const c of z.checks) expect(c.utilisation).toBeLessThanOrEqual(1);
    expect(zones.map((z) => z.maxGirtSpacing)).toEqual(schedule.zones.map((z) => z.girtSpacing));
  });

  it('computes demand and allowable with the engine’s pressures, effective area and table interpolation', () => {
    const input = demo({ girtSpacing: 1.35, clipSpacing: 0.5 });
    const { zones } = checkDesignSpacing(input);
    const site = analyseSite(input.site);
    const rows = demoLoadSpanTable().rows;
    const spans = rows.map((r) => r.span);
    const width = demoPanel().panelModuleWidth;
    for (const zone of [4, 5] as const) {
      const z = zoneOf(zones, zone);
      const p = wallPressures(site, zone, effectiveWindArea(1.35, width));
      const inward = checkOf(z, 'inward');
      expect(inward.required).toBe(p.asd.inward);
      expect(inward.allowable).toBe(
        interpolateColumn(
          spans,
          rows.map((r) => r.allowableInward),
          1.35,
        ),
      );
      expect(inward.utilisation).toBe(inward.required! / inward.allowable!);
      expect(checkOf(z, 'outward').required).toBe(-p.asd.outward);
      // Deflection at 0.6 W (the default factor) against the L/180 column.
      expect(checkOf(z, 'deflection').required).toBeCloseTo(
        0.6 * Math.max(p.strength.inward, -p.strength.outward),
        9,
      );

      const P = clipCapacity(demoPanel().clip);
      const C = CONTINUITY_FACTOR.double;
      const governing = (A: number) => {
        const q = wallPressures(site, zone, A);
        return Math.max(q.asd.inward, -q.asd.outward);
      };
      const clip = checkOf(z, 'clip');
      expect(clip.allowable).toBe(P);
      expect(clip.required).toBeCloseTo(C * governing(0.5 * 1.35) * 0.5 * 1.35, 9);
      expect(z.maxClipAtDesignGirt).toBeLessThanOrEqual(clipSpacing(P, C, 1.35, governing).maxSpacing);
    }
  });

  it('fails a design girt spacing beyond the maximum, with a utilisation over 1', () => {
    const input = demo({ girtSpacing: 2.4, clipSpacing: 0.6 });
    const schedule = calculateWindSchedule(input);
    expect(2.4).toBeGreaterThan(schedule.zones[0]!.girtSpacing!);
    const zone4 = zoneOf(checkDesignSpacing(input, schedule).zones, 4);
    expect(zone4.girt).toBe('fails');
    expect(zone4.status).toBe('fails');
    expect(zone4.worst!.utilisation!).toBeGreaterThan(1);
  });

  it('says "outside the table" where the table has no value, without a number, and never extrapolates', () => {
    const longer = checkDesignSpacing(demo({ girtSpacing: 3.5, clipSpacing: 0.6 })).zones[0]!;
    const inward = checkOf(longer, 'inward');
    expect(inward.status).toBe('outside-table');
    expect(inward.utilisation).toBeNull();
    expect(inward.required).toBeNull();
    expect(inward.reason).toMatchObject({
      code: 'span_beyond_table',
      path: 'design.girtSpacing',
      values: { span: 3.5 },
    });
    expect(messageText(inward.reason!)).toMatch(
      /^the design span \(3\.5\u202fm\) is longer than the table’s longest span/,
    );
    // Longer than the longest span is also longer than the maximum: a failure, not a question.
    expect(longer.girt).toBe('fails');

    const shorter = checkDesignSpacing(demo({ girtSpacing: 0.5, clipSpacing: 0.3 })).zones[0]!;
    expect(shorter.girt).toBe('outside-table');
    expect(shorter.status).toBe('outside-table');
    expect(checkOf(shorter, 'outward').reason).toMatchObject({
      code: 'span_below_table',
      values: { span: 0.5 },
    });
    expect(messageText(checkOf(shorter, 'outward').reason!, 'IP')).toMatch(
      /^the design span \(1\.64\u202fft\) is shorter than the table’s shortest span \(2\.95\u202fft\)/,
    );
  });

  it('leaves a spacing that is not given "missing", and still gives the clip maximum at a design girt spacing', () => {
    const none = checkDesignSpacing(demo({})).zones[0]!;
    expect([none.girt, none.clip, none.status]).toEqual(['missing', 'missing', 'missing']);
    expect(none.worst).toBeNull();
    expect('girtSpacing' in none).toBe(false);

    const girtOnly = checkDesignSpacing(demo({ girtSpacing: 1.2 })).zones[0]!;
    expect(girtOnly.girt).toBe('meets');
    expect(girtOnly.clip).toBe('missing');
    expect(checkOf(girtOnly, 'clip').reason).toEqual({
      code: 'design_clip_missing',
      path: 'design.clipSpacing',
      values: {},
    });
    expect(girtOnly.maxClipAtDesignGirt).toBeGreaterThan(0);
  });

  it('fails every design girt spacing of a zone the table cannot carry at all', () => {
    const input = demo({ girtSpacing: 1.2, clipSpacing: 0.6 });
    input.panel.loadSpanTable = {
      spanCondition: 'double',
      deflectionLimit: 'L/180',
      rows: [
        { span: 0.9, allowableInward: 4690, allowableOutward: 1100 },
        { span: 1.2, allowableInward: 2640, allowableOutward: 900 },
        { span: 1.5, allowableInward: 1690, allowableOutward: 700 },
      ],
    };
    const schedule = calculateWindSchedule(input);
    expect(schedule.zones[1]!.status).toBe('outside-table');
    const zone5 = zoneOf(checkDesignSpacing(input, schedule).zones, 5);
    expect(zone5.maxGirtSpacing).toBeNull();
    expect(zone5.girt).toBe('fails');
  });

  it('traces every figure: formula, source, inputs and the utilisation it reports', () => {
    const result = checkDesignSpacing(demo({ girtSpacing: 1.2, clipSpacing: 0.6 }));
    expect(designSpacingResultSchema.safeParse(result).success).toBe(true);
    const ids = result.trace.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const zone of [4, 5] as const) {
      const z = zoneOf(result.zones, zone);
      for (const c of z.checks) {
        const s = result.trace.find((t) => t.id === `wind.zone${zone}.design.${c.check}`)!;
        expect(s.value).toBe(c.utilisation);
        expect(s.formula).toMatch(/u = /);
        expect(s.source).toMatch(/§26\.2/);
        expect(Object.keys(s.inputs).length).toBeGreaterThan(0);
      }
      const max = result.trace.find((t) => t.id === `wind.zone${zone}.design.maxClipSpacing`)!;
      expect(max.value).toBe(z.maxClipAtDesignGirt);
      expect(max.unit).toBe('m');
    }
  });

  it('computes the schedule itself when it is not given', () => {
    const input = demo({ girtSpacing: 1.5, clipSpacing: 0.7 });
    expect(checkDesignSpacing(input)).toEqual(checkDesignSpacing(input, calculateWindSchedule(input)));
  });

  it('has a zod contract, and refuses an impossible design spacing with the field that is wrong', () => {
    expect(windDesignInputSchema.safeParse(demo({ girtSpacing: 1.2 })).success).toBe(true);
    expect(windDesignInputSchema.safeParse(demo({ girtSpacing: -1 })).success).toBe(false);
    expect(windDesignInputSchema.safeParse(demo({ clipSpacing: 11 })).success).toBe(false);
    expect(inputError(() => checkDesignSpacing(demo({ girtSpacing: 0 }))).field).toBe('design.girtSpacing');
    expect(inputError(() => checkDesignSpacing(demo({ clipSpacing: Number.NaN }))).field).toBe(
      'design.clipSpacing',
    );
  });
});

// ------------------------------------------------------------------------------------------------ properties

const site = windSite;

/**
 * Panels shaped like real ones: the demo table with each column scaled on its own, so strong, weak and
 * out-of-table panels occur. Its allowables fall with the span much faster than the demand falls with the
 * effective area (GC_p is linear in log A), as a panel's bending and deflection capacities do.
 */
const panel: fc.Arbitrary<Panel> = fc
  .record({
    inward: fc.double({ min: 0.2, max: 6, noNaN: true }),
    outward: fc.double({ min: 0.2, max: 6, noNaN: true }),
    deflection: fc.option(fc.double({ min: 0.2, max: 6, noNaN: true }), { nil: undefined }),
    width: fc.double({ min: 0.2, max: 1.2, noNaN: true }),
    capacity: fc.double({ min: 300, max: 8000, noNaN: true }),
    spanCondition: fc.constantFrom('single' as const, 'double' as const, 'triple' as const),
  })
  .map(({ inward, outward, deflection, width, capacity, spanCondition }) => ({
    loadSpanTable: {
      spanCondition,
      deflectionLimit: 'L/180',
      rows: demoLoadSpanTable().rows.map((r) => ({
        span: r.span,
        allowableInward: r.allowableInward * inward,
        allowableOutward: r.allowableOutward * outward,
        ...(deflection === undefined
          ? {}
          : { allowableDeflectionPressure: r.allowableDeflectionPressure! * deflection }),
      })),
    },
    clip: { allowableLoad: capacity },
    panelModuleWidth: width,
    girtOrientation: 'horizontal' as const,
    designLevel: 'ASD' as const,
  }));

const schedule = fc.record({ site, panel });
const TABLE_SPANS = demoLoadSpanTable().rows.map((r) => r.span);
const spacings: fc.Arbitrary<DesignSpacings> = fc.record(
  {
    girtSpacing: fc.double({ min: 0.3, max: 4, noNaN: true }),
    clipSpacing: fc.double({ min: 0.05, max: 3, noNaN: true }),
  },
  { requiredKeys: [] },
);

describe('design spacing properties', () => {
  it('a design spacing equal to the engine’s maximum meets (zone 5 capped by zone 4 by under 1 mm at most)', () => {
    fc.assert(
      fc.property(schedule, (base) => {
        const r = calculateWindSchedule(base);
        for (const z of r.zones) {
          if (z.girtSpacing === null || z.clip === null) continue;
          const design = { girtSpacing: z.girtSpacing, clipSpacing: z.clip.maxSpacing };
          const d = zoneOf(checkDesignSpacing({ ...base, design }, r).zones, z.zone);
          if (d.maxGirtSpacing === z.girtSpacing && d.maxClipAtDesignGirt === z.clip.maxSpacing) {
            expect([d.girt, d.clip, d.status]).toEqual(['meets', 'meets', 'meets']);
          } else {
            // Only the end zones are capped, and only by what the searches' 1 mm tolerance can leave.
            expect(z.zone).toBe(5);
            expect(z.girtSpacing - d.maxGirtSpacing!).toBeLessThan(SPACING_TOLERANCE);
            expect(z.clip.maxSpacing - d.maxClipAtDesignGirt!).toBeLessThan(SPACING_TOLERANCE);
          }
        }
      }),
    );
  });

  it('a girt spacing larger than the engine’s maximum fails', () => {
    fc.assert(
      fc.property(
        schedule,
        fc.double({ min: 1e-6, max: 3, noNaN: true }),
        fc.option(fc.double({ min: 0.05, max: 3, noNaN: true }), { nil: undefined }),
        (base, excess, clipSpacingDesign) => {
          const r = calculateWindSchedule(base);
          for (const z of r.zones) {
            const girtSpacing = (z.girtSpacing ?? TABLE_SPANS[0]!) + excess;
            const design = {
              girtSpacing,
              ...(clipSpacingDesign === undefined ? {} : { clipSpacing: clipSpacingDesign }),
            };
            const d = zoneOf(checkDesignSpacing({ ...base, design }, r).zones, z.zone);
            expect(d.girt).toBe('fails');
            expect(d.status).toBe('fails');
          }
        },
      ),
    );
  });

  it('utilisation does not decrease as a design spacing grows', () => {
    const [first, last] = [TABLE_SPANS[0]!, TABLE_SPANS[TABLE_SPANS.length - 1]!];
    const span = fc.double({ min: first, max: last, noNaN: true });
    const clip = fc.double({ min: 0.05, max: 3, noNaN: true });
    fc.assert(
      fc.property(schedule, span, span, clip, clip, (base, g1, g2, c1, c2) => {
        const [ga, gb] = g1 <= g2 ? [g1, g2] : [g2, g1];
        const [ca, cb] = c1 <= c2 ? [c1, c2] : [c2, c1];
        const r = calculateWindSchedule(base);
        const at = (girtSpacing: number, clipSpacingDesign: number) =>
          checkDesignSpacing({ ...base, design: { girtSpacing, clipSpacing: clipSpacingDesign } }, r).zones;
        const small = at(ga, ca);
        const longerGirt = at(gb, ca);
        const longerClip = at(ga, cb);
        small.forEach((z, i) => {
          z.checks.forEach((c, j) => {
            const u = c.utilisation!;
            expect(longerGirt[i]!.checks[j]!.utilisation!).toBeGreaterThanOrEqual(u * (1 - 1e-12));
            expect(longerClip[i]!.checks[j]!.utilisation!).toBeGreaterThanOrEqual(u * (1 - 1e-12));
          });
        });
      }),
    );
  });

  it('zone 5 never passes where zone 4 fails at the same spacings', () => {
    fc.assert(
      fc.property(schedule, spacings, (base, design) => {
        const { zones } = checkDesignSpacing({ ...base, design });
        const [z4, z5] = [zoneOf(zones, 4), zoneOf(zones, 5)];
        if (z4.girt === 'fails') expect(z5.girt).toBe('fails');
        if (z4.clip === 'fails') expect(z5.clip).toBe('fails');
        if (z4.status === 'fails') expect(z5.status).toBe('fails');
        if (z4.status !== 'meets') expect(z5.status).not.toBe('meets');
      }),
    );
  });

  it('returns its contract with every number finite for valid input', () => {
    fc.assert(
      fc.property(schedule, spacings, (base, design) => {
        const result = checkDesignSpacing({ ...base, design });
        expect(designSpacingResultSchema.safeParse(result).success).toBe(true);
        const numbers = [
          ...result.trace.flatMap((s) => [s.value, ...Object.values(s.inputs).map((i) => i.value)]),
          ...result.zones.flatMap((z) => [
            z.maxGirtSpacing,
            z.maxClipAtDesignGirt,
            ...z.checks.flatMap((c) => [c.required, c.allowable, c.utilisation]),
          ]),
        ].filter((x): x is number => x !== null);
        for (const x of numbers) expect(Number.isFinite(x)).toBe(true);
      }),
    );
  });
});
