/**
 * Wind (components and cladding, walls) vs published sources. Each check names its source (standard, edition,
 * table/figure/example) and a tolerance. Tags: [seen] read in the named source; [third-party] seen only in a
 * public reproduction (named); [memory] recalled, not re-read — verify before relying on it; "derived" =
 * computed here from exact definitions or formulas, which tests arithmetic, not the standard.
 */

import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { HIGH_RISE_WALL, LOW_RISE_WALL, logLinear } from '@shared/calc/wind/coefficients';
import { demoWindSchedule } from '@shared/calc/wind/examples';
import { analyseSite, MINIMUM_PRESSURE, wallPressures } from '@shared/calc/wind/pressure';
import type { WindSite } from '@shared/calc/wind/schema';
import { groundElevationFactor, velocityPressureExposureCoefficient } from '@shared/calc/wind/velocity';
import { messageText } from '@shared/format/messages';
import { FOOT, MPH_TO_MS, PSF_TO_PA } from '@shared/units';
import { describe, expect, it } from 'vitest';

const FT2 = FOOT * FOOT;

describe('ASCE 7-16 Table 26.10-1 — velocity pressure exposure coefficients K_z', () => {
  // Source: ASCE/SEI 7-16 Table 26.10-1 [memory]; the same 66 cells are reproduced identically in two public
  // repositories (a TypeScript wind-load module citing "ASCE 7-16 Table 26.10-1" and a Python wind module)
  // [third-party]. The engine evaluates the table's note-1 formula, which differs from the printed cells by at
  // most 0.008 over all 66 cells (the table is not a plain rounding of the formula). Tolerance ±0.01.
  it.each([
    ['B', 15, 0.57],
    ['B', 30, 0.7],
    ['B', 60, 0.85],
    ['B', 100, 0.99],
    ['B', 200, 1.2],
    ['B', 500, 1.56],
    ['C', 15, 0.85],
    ['C', 30, 0.98],
    ['C', 60, 1.13],
    ['C', 100, 1.26],
    ['C', 200, 1.46],
    ['C', 500, 1.77],
    ['D', 15, 1.03],
    ['D', 30, 1.16],
    ['D', 60, 1.31],
    ['D', 100, 1.43],
    ['D', 200, 1.61],
    ['D', 500, 1.89],
  ] as const)('exposure %s, %s ft: K_z = %s', (exposure, zFt, Kz) => {
    expect(
      Math.abs(velocityPressureExposureCoefficient('ASCE 7-16', exposure, zFt * FOOT) - Kz),
    ).toBeLessThanOrEqual(0.01);
  });

  // Source: ASCE/SEI 7-16 Table 26.10-1, row "0–15 ft" [memory + the same reproductions]. Tolerance ±0.01.
  it('below 15 ft K_z keeps its 15 ft value (exposure C, 10 ft → 0.85)', () => {
    expect(
      Math.abs(velocityPressureExposureCoefficient('ASCE 7-16', 'C', 10 * FOOT) - 0.85),
    ).toBeLessThanOrEqual(0.01);
  });
});

describe('ASCE 7-16 Table 26.9-1 — ground elevation factor K_e', () => {
  // Source: ASCE/SEI 7-16 Table 26.9-1 [third-party: the cells are quoted in a public ASCE 7-22 C&C test harness,
  // whose note states the table is unchanged in 7-22]. The engine uses the table's footnote formula
  // K_e = e^(−0.0000362·z_e); the printed 4000 ft cell (0.86) sits 0.005 under it. Tolerance ±0.01.
  it.each([
    [0, 1.0],
    [2000, 0.93],
    [3000, 0.9],
    [4000, 0.86],
    [5000, 0.83],
    [6000, 0.8],
  ] as const)('%s ft: K_e = %s', (zeFt, Ke) => {
    expect(Math.abs(groundElevationFactor(zeFt * FOOT) - Ke)).toBeLessThanOrEqual(0.01);
  });
  // Source: the same Table 26.9-1, row "< 0": K_e = 1.00 below sea level [memory; the formula alone would give
  // 1.012 at −100 m]. Exact.
  it('[memory] below sea level (row “< 0”): K_e = 1.00, not the formula’s 1.012', () => {
    expect(groundElevationFactor(-100)).toBe(1);
    expect(groundElevationFactor(-1000 * FOOT)).toBe(1);
  });
});

describe('ASCE 7-16/7-22 Table 26.10-1 — exposure B below 30 ft for components and cladding', () => {
  // Source: ASCE/SEI 7-16 and 7-22 Table 26.10-1, exposure B, 0–15 ft: K_z = 0.57; the footnote's 0.70 below
  // 30 ft applies to Chapter 28 (envelope procedure) only [memory + third-party: a public ASCE 7 wind
  // calculator's source notes "7-16/7-22: zm = 15 per Table 26.10-1 (asterisk footnote zm = 30 applies to Ch.28
  // LR only)" and "7-05/7-10: zm = 30 per Table 30.3-1 Note 1 ('z shall not be taken less than 30 ft in
  // Exposure B')"; a public Python reimplementation of ASCE 7-98 applies the same 30 ft rule to Case 1, all
  // components and cladding]. Tolerance ±0.01 (two decimals).
  it.each(['ASCE 7-16', 'ASCE 7-22'] as const)(
    '%s: K_h at 15 ft = 0.57 for components and cladding',
    (edition) => {
      expect(
        Math.abs(velocityPressureExposureCoefficient(edition, 'B', 15 * FOOT) - 0.57),
      ).toBeLessThanOrEqual(0.01);
    },
  );
  it.each(['ASCE 7-16', 'ASCE 7-22'] as const)(
    '%s: the schedule says so in the same words, with the ASCE 7-10 floor of 0.70 and how much higher it is',
    (edition) => {
      const r = calculateWindSchedule({
        ...demoWindSchedule(),
        site: { ...demoWindSchedule().site, edition, exposure: 'B', meanRoofHeight: 15 * FOOT },
      });
      const w = messageText(r.warnings.find((x) => x.code === 'exposure_b_floor')!, 'IP');
      expect(w).toMatch(/^Exposure B below 30\u202fft/);
      expect(w).toContain(`${edition} Table 26.10-1 gives K_z = 0.57`);
      expect(w).toContain('Chapter 28');
      expect(w).toMatch(/0\.70 below 30\u202fft .* (22|23) % higher/);
    },
  );
});

describe('ASCE 7-16/7-22 Figure 30.3-1 — wall GC_p, h ≤ 60 ft', () => {
  // Source: ASCE/SEI 7-16 Figure 30.3-1 [memory + third-party: the same breakpoints are reproduced in three public
  // repositories — a C# ASCE 7-10 Figure 30.4-1 module, a Python ASCE 7-22 coefficient file (as log-linear
  // equations) and a Python ASCE 7-22 test harness]. Exact as printed (one decimal), tolerance 1e-12.
  it.each([
    ['zone 4, 10 ft²', LOW_RISE_WALL.zone4, 10, -1.1],
    ['zone 4, 500 ft²', LOW_RISE_WALL.zone4, 500, -0.8],
    ['zone 5, 10 ft²', LOW_RISE_WALL.zone5, 10, -1.4],
    ['zone 5, 500 ft²', LOW_RISE_WALL.zone5, 500, -0.8],
    ['zones 4 & 5 positive, 10 ft²', LOW_RISE_WALL.positive, 10, 1.0],
    ['zones 4 & 5 positive, 500 ft²', LOW_RISE_WALL.positive, 500, 0.7],
  ] as const)('%s: GC_p = %s', (_label, curve, A, gcp) => {
    expect(logLinear(curve, A)).toBeCloseTo(gcp, 12);
  });
});

describe('ASCE 7-16 Figure 30.5-1 / 7-22 Figure 30.4-1 — wall GC_p, h > 60 ft', () => {
  // Source: recalled [memory — conflicting reproductions; verify]. One public C# module (ASCE 7-10 Figure 30.6-1)
  // has the same six values but 10/500 ft² breakpoints on a linear area scale; one public ASCE 7-22 harness has
  // zone 4 −1.0 at 10 ft². These checks pin the recalled values only; they do not confirm the standard.
  it.each([
    ['zone 4, ≤ 20 ft²', HIGH_RISE_WALL.zone4, 20, -0.9],
    ['zone 4, 500 ft²', HIGH_RISE_WALL.zone4, 500, -0.7],
    ['zone 5, ≤ 20 ft²', HIGH_RISE_WALL.zone5, 20, -1.8],
    ['zone 5, 500 ft²', HIGH_RISE_WALL.zone5, 500, -1.0],
    ['positive, ≤ 20 ft²', HIGH_RISE_WALL.positive, 20, 0.9],
    ['positive, 500 ft²', HIGH_RISE_WALL.positive, 500, 0.6],
  ] as const)('[memory] %s: GC_p = %s', (_label, curve, A, gcp) => {
    expect(logLinear(curve, A)).toBeCloseTo(gcp, 12);
  });
});

/** Site of ASCE 7-16 Figure 30.4-1: exposure B, h = 30 ft, K_zt = 1, K_e = 1, enclosed. */
const pnet30Site = (Vmph: number): WindSite => ({
  edition: 'ASCE 7-16',
  basicWindSpeed: Vmph * MPH_TO_MS,
  riskCategory: 'II',
  exposure: 'B',
  Kzt: 1,
  groundElevation: 0,
  keEqualsOne: true,
  enclosure: 'enclosed',
  meanRoofHeight: 30 * FOOT,
  planLength: 80 * FOOT,
  planWidth: 50 * FOOT,
  roofSlopeDeg: 20,
});

describe('ASCE 7-16 Figure 30.4-1 — published net wall pressures p_net30, end to end', () => {
  // Source: ASCE/SEI 7-16 Figure 30.4-1 (chapter 30, part 2), table "Net design wind pressure p_net30 (psf),
  // exposure B, h = 30 ft, K_zt = 1.0", wall zones 4 and 5, effective areas 10/20/50/100 ft², V = 95–130 mph
  // [third-party: cells reproduced "from the physical book" in a public repository's regression test of an
  // ASCE 7-22 windows-and-doors engine]. These tabulated pressures are the part 1 method worked out by ASCE:
  // q_h (Eq. 26.10-1) × [(GC_p of Figure 30.3-1) ∓ 0.18]. The printed wall rows carry no 10 % low-slope
  // reduction (the numbers show it), so the site here has θ = 20°. The table prints the computed pressure; the
  // engine then applies the 16 psf minimum of §30.2.2, so cells under 16 psf are compared with 16 psf.
  // Tolerance ±0.1 psf: printed to 0.1 psf (±0.05), the formula K_z = 0.7006 vs the table's 0.70 (≤ 0.03 psf),
  // and the exact SI constant vs 0.00256 rounding (0.05 %, ≤ 0.02 psf).
  const V = [95, 100, 105, 110, 115, 120, 130];
  const rows: readonly [4 | 5, number, readonly (readonly [number, number])[]][] = [
    [
      4,
      10,
      [
        [16.2, -17.6],
        [18.0, -19.5],
        [19.8, -21.5],
        [21.8, -23.6],
        [23.8, -25.8],
        [25.9, -28.1],
        [30.4, -33.0],
      ],
    ],
    [
      4,
      20,
      [
        [15.5, -16.9],
        [17.2, -18.7],
        [18.9, -20.6],
        [20.8, -22.6],
        [22.7, -24.7],
        [24.7, -26.9],
        [29.0, -31.6],
      ],
    ],
    [
      4,
      50,
      [
        [14.5, -15.9],
        [16.1, -17.6],
        [17.8, -19.4],
        [19.5, -21.3],
        [21.3, -23.3],
        [23.2, -25.4],
        [27.2, -29.8],
      ],
    ],
    [
      4,
      100,
      [
        [13.8, -15.2],
        [15.3, -16.8],
        [16.9, -18.5],
        [18.5, -20.4],
        [20.2, -22.2],
        [22.0, -24.2],
        [25.9, -28.4],
      ],
    ],
    [
      5,
      10,
      [
        [16.2, -21.7],
        [18.0, -24.1],
        [19.8, -26.6],
        [21.8, -29.1],
        [23.8, -31.9],
        [25.9, -34.7],
        [30.4, -40.7],
      ],
    ],
    [
      5,
      20,
      [
        [15.5, -20.3],
        [17.2, -22.5],
        [18.9, -24.8],
        [20.8, -27.2],
        [22.7, -29.7],
        [24.7, -32.4],
        [29.0, -38.0],
      ],
    ],
    [
      5,
      50,
      [
        [14.5, -18.3],
        [16.1, -20.3],
        [17.8, -22.4],
        [19.5, -24.6],
        [21.3, -26.9],
        [23.2, -29.3],
        [27.2, -34.3],
      ],
    ],
    [
      5,
      100,
      [
        [13.8, -16.9],
        [15.3, -18.7],
        [16.9, -20.6],
        [18.5, -22.6],
        [20.2, -24.7],
        [22.0, -26.9],
        [25.9, -31.6],
      ],
    ],
  ];
  it.each(rows)('zone %s, %s ft²: 7 speeds, inward and outward', (zone, areaFt2, cells) => {
    cells.forEach(([inward, outward], i) => {
      const p = wallPressures(analyseSite(pnet30Site(V[i]!)), zone, areaFt2 * FT2).strength;
      expect(Math.abs(p.inward / PSF_TO_PA - Math.max(inward, 16))).toBeLessThanOrEqual(0.1);
      expect(Math.abs(p.outward / PSF_TO_PA - Math.min(outward, -16))).toBeLessThanOrEqual(0.1);
    });
  });
});

describe('ASCE 7-22 — velocity pressure from published worked examples', () => {
  // Source: "Wind Loads: Guide to the Wind Load Provisions of ASCE 7-22" (Stafford & Reinhold, ASCE Press),
  // Example 6.1 "Commercial Building with a Flat Roof": h = 15 ft, exposure C, V = 148 mph, K_zt = 1.0,
  // K_e = 1.0, K_h = 0.85, q_h = 47.7 psf without K_d [third-party: inputs and results reproduced in a public
  // repository's validation report]. Tolerance: K_h ±0.005 (two decimals), q_h ±0.1 psf (printed to 0.1 psf).
  const guide: WindSite = {
    edition: 'ASCE 7-22',
    basicWindSpeed: 148 * MPH_TO_MS,
    riskCategory: 'II',
    exposure: 'C',
    Kzt: 1,
    groundElevation: 37 * FOOT,
    keEqualsOne: true,
    enclosure: 'enclosed',
    meanRoofHeight: 15 * FOOT,
    planLength: 60 * FOOT,
    planWidth: 30 * FOOT,
    roofSlopeDeg: 0,
  };
  it('Guide Example 6.1: K_h = 0.85', () => {
    expect(Math.abs(analyseSite(guide).velocity.Kh - 0.85)).toBeLessThanOrEqual(0.005);
  });
  it('Guide Example 6.1: q_h = 47.7 psf (K_d not in q_h)', () => {
    expect(Math.abs(analyseSite(guide).velocity.qhPsf - 47.7)).toBeLessThanOrEqual(0.1);
  });

  // Source: an ASCE 7-22 worked velocity-pressure example (exposure C, z = 30 ft) giving K_z = 0.98
  // [third-party: quoted in the same public validation report]. Tolerance ±0.005 (two decimals).
  it('exposure C, 30 ft: K_z = 0.98', () => {
    expect(
      Math.abs(velocityPressureExposureCoefficient('ASCE 7-22', 'C', 30 * FOOT) - 0.98),
    ).toBeLessThanOrEqual(0.005);
  });
});

describe('ASCE 7-16 §30.2.2 and Table 26.13-1 — minimum pressure and internal pressure', () => {
  // Source: ASCE/SEI 7-16 §30.2.2, minimum C&C net pressure 16 psf [memory + third-party: the default minimum of a
  // public ASCE 7-22 C&C library]. 16 psf → Pa by NIST SP 811 B.9 (1 lbf/ft² = 47.880 26 Pa, seven figures
  // [memory]): agrees to 16 × half a unit in the last printed digit.
  it('minimum net pressure 16 psf = 766.08 Pa', () => {
    expect(Math.abs(MINIMUM_PRESSURE - 16 * 47.88026)).toBeLessThanOrEqual(16 * 0.000005);
  });

  // Source: ASCE/SEI 7-16 Table 26.13-1, (GC_pi) = ±0.18 enclosed, ±0.55 partially enclosed [memory +
  // third-party: a public ASCE 7-22 test harness]. Exact.
  it('(GC_pi) = 0.18 enclosed and 0.55 partially enclosed', () => {
    expect(analyseSite(pnet30Site(115)).GCpi).toBe(0.18);
    expect(analyseSite({ ...pnet30Site(115), enclosure: 'partially_enclosed' }).GCpi).toBe(0.55);
  });
});
