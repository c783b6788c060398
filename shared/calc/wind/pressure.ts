import { CalcInputError, requireInRange, requirePositive } from '@shared/calc/errors';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { M, ONE, PA } from '@shared/calc/trace-units';
import { engineMessage, type WindWarning } from '@shared/format/message-schema';
import { FOOT, PSF_TO_PA } from '@shared/units';
import {
  edgeWidth,
  internalPressureCoefficient,
  LOW_RISE_HEIGHT_LIMIT,
  LOW_SLOPE_LIMIT_DEG,
  wallFigure,
  wallGCp,
} from './coefficients';
import type { VelocityResult, WallZone, WindSite, ZonePressure } from './schema';
import {
  aboveGradientHeight,
  EXPOSURE_B_CHAPTER_28_KZ,
  EXPOSURE_B_FLOOR_HEIGHT,
  EXPOSURE_CONSTANTS,
  groundElevationFactor,
  KD_BUILDINGS,
  pressureDirectionality,
  VELOCITY_EQUATION,
  velocityPressure,
  velocityPressureExposureCoefficient,
} from './velocity';

/*
 * Design wind pressures on wall components and cladding: p = q_h[(GC_p) − (GC_pi)] (ASCE 7-16 Eq. 30.3-1, h ≤ 60 ft),
 * p = q(GC_p) − q_i(GC_pi) with q = q_z for positive and q_h for negative pressure (ASCE 7-16 Eq. 30.5-1, h > 60 ft);
 * ASCE 7-22 multiplies both by K_d (Eq. 30.3-1 / 30.4-1) because its q excludes K_d. Minimum net pressure 16 psf
 * (§30.2.2); ASD = 0.6 W (§2.4.1, combination D + 0.6W).
 */

/** Minimum net C&C design pressure, strength level: 16 psf = 0.766 kPa (ASCE 7-16/7-22 §30.2.2). */
export const MINIMUM_PRESSURE = 16 * PSF_TO_PA;
/** ASD load factor on W (ASCE 7-16 §2.4.1, D + 0.6W). */
export const ASD_WIND_FACTOR = 0.6;

export interface SiteAnalysis {
  velocity: VelocityResult;
  lowRise: boolean;
  figure: string;
  edgeWidth: number;
  GCpi: number;
  roofSlopeDeg: number;
  /** K_d in the pressure equation (7-22) or 1 (7-16). */
  pressureFactor: number;
  trace: TraceStep[];
  warnings: WindWarning[];
}

function validateSite(site: WindSite): number {
  requirePositive(site.basicWindSpeed, 'site.basicWindSpeed', 'basic wind speed V');
  requirePositive(site.meanRoofHeight, 'site.meanRoofHeight', 'mean roof height h');
  requirePositive(site.planLength, 'site.planLength', 'plan length');
  requirePositive(site.planWidth, 'site.planWidth', 'plan width');
  requireInRange(site.Kzt, 1, 5, 'site.Kzt', 'topographic factor K_zt');
  requireInRange(site.roofSlopeDeg, 0, 90, 'site.roofSlopeDeg', 'roof slope θ');
  requireInRange(site.groundElevation, -150, 3000, 'site.groundElevation', 'ground elevation');
  const z = site.heightOfComponent ?? site.meanRoofHeight;
  requirePositive(z, 'site.heightOfComponent', 'height of the component z');
  if (z > site.meanRoofHeight)
    throw new CalcInputError(
      'site.heightOfComponent',
      `the component height z (${z} m) lies above the mean roof height h (${site.meanRoofHeight} m); parapets and rooftop items are outside this wall calculation`,
    );
  return z;
}

/** Velocity pressures, figure, end-zone width and internal pressure of a site (ASCE 7 chapters 26 and 30). */
export function analyseSite(site: WindSite): SiteAnalysis {
  const z = validateSite(site);
  const GCpi = internalPressureCoefficient(site.enclosure);
  const { edition, exposure, Kzt } = site;
  const h = site.meanRoofHeight;
  const trace: TraceStep[] = [];
  const warnings: WindWarning[] = [];

  const Kh = velocityPressureExposureCoefficient(edition, exposure, h);
  const Kz = velocityPressureExposureCoefficient(edition, exposure, z);
  const Ke = site.keEqualsOne === true ? 1 : groundElevationFactor(site.groundElevation);
  const Kd = KD_BUILDINGS;
  const V = site.basicWindSpeed;
  const qh = velocityPressure(edition, Kh, Kzt, Kd, Ke, V);
  const qz = velocityPressure(edition, Kz, Kzt, Kd, Ke, V);
  const lowRise = h <= LOW_RISE_HEIGHT_LIMIT;
  const least = Math.min(site.planLength, site.planWidth);
  const a = edgeWidth(lowRise, h, least);
  const figure = wallFigure(edition, lowRise);
  const kzSource = `${edition} Table 26.10-1 note 1, exposure ${exposure}`;

  trace.push(
    step(
      'wind.Kh',
      'Velocity pressure exposure coefficient at the mean roof height K_h',
      `K_h = ${edition === 'ASCE 7-16' ? '2.01' : '2.41'}·(max(h, 15 ft)/z_g)^(2/α)`,
      kzSource,
      { h: v(h, M) },
      Kh,
      ONE,
    ),
    step(
      'wind.Ke',
      'Ground elevation factor K_e',
      site.keEqualsOne === true
        ? 'K_e = 1.0 (always permitted)'
        : site.groundElevation <= 0
          ? 'K_e = 1.00 at and below sea level (Table 26.9-1, row < 0)'
          : 'K_e = e^(−0.0000362·z_e[ft])',
      `${edition} §26.9, Table 26.9-1`,
      { z_e: v(site.groundElevation, M) },
      Ke,
      ONE,
    ),
    step(
      'wind.Kd',
      'Wind directionality factor K_d',
      'K_d for buildings, C&C',
      `${edition} Table 26.6-1`,
      {},
      Kd,
      ONE,
    ),
    step(
      'wind.qh',
      'Velocity pressure at the mean roof height q_h',
      VELOCITY_EQUATION[edition],
      `${edition} §26.10, Eq. 26.10-1`,
      { K_h: v(Kh, ONE), K_zt: v(Kzt, ONE), K_d: v(Kd, ONE), K_e: v(Ke, ONE), V: v(V, 'm/s') },
      qh,
      PA,
      `V read from the risk category ${site.riskCategory} map`,
    ),
  );
  if (!lowRise)
    trace.push(
      step(
        'wind.qz',
        'Velocity pressure at the component height q_z (positive pressure, h > 60 ft)',
        VELOCITY_EQUATION[edition],
        `${edition} §26.10, Eq. 26.10-1`,
        { K_z: v(Kz, ONE), z: v(z, M) },
        qz,
        PA,
      ),
    );
  trace.push(
    step(
      'wind.a',
      'End-zone width a (zone 5 at each corner)',
      lowRise
        ? 'a = min(0.1·least dimension, 0.4h) ≥ max(0.04·least dimension, 3 ft)'
        : 'a = 0.1·least dimension ≥ 3 ft',
      figure,
      { 'least dimension': v(least, M), h: v(h, M) },
      a,
      M,
    ),
    step(
      'wind.GCpi',
      'Internal pressure coefficient (GC_pi), magnitude',
      `±(GC_pi) for a ${site.enclosure.replace('_', ' ')} building`,
      `${edition} Table 26.13-1`,
      {},
      GCpi,
      ONE,
    ),
  );

  if (aboveGradientHeight(edition, exposure, h))
    warnings.push(
      engineMessage('above_gradient_height', 'site.meanRoofHeight', {
        height: h,
        gradientHeight: EXPOSURE_CONSTANTS[edition][exposure].zgFt * FOOT,
      }),
    );
  if (!lowRise) warnings.push(engineMessage('high_rise_gcp', '', { figure, limit: LOW_RISE_HEIGHT_LIMIT }));
  if (exposure === 'B' && Math.min(z, h) < EXPOSURE_B_FLOOR_HEIGHT) {
    const k = Math.min(Kh, Kz);
    warnings.push(
      engineMessage('exposure_b_floor', '', {
        edition,
        kz: k,
        floorKz: EXPOSURE_B_CHAPTER_28_KZ,
        floorHeight: EXPOSURE_B_FLOOR_HEIGHT,
      }),
    );
  }
  if (site.roofSlopeDeg <= LOW_SLOPE_LIMIT_DEG && lowRise)
    warnings.push(engineMessage('low_slope_gcp', 'site.roofSlopeDeg', { slopeLimit: LOW_SLOPE_LIMIT_DEG }));

  return {
    velocity: {
      edition,
      Kh,
      Kz,
      Kzt,
      Kd,
      Ke,
      qh,
      qhPsf: qh / PSF_TO_PA,
      qz,
      qzPsf: qz / PSF_TO_PA,
      equation: VELOCITY_EQUATION[edition],
    },
    lowRise,
    figure,
    edgeWidth: a,
    GCpi,
    roofSlopeDeg: site.roofSlopeDeg,
    pressureFactor: pressureDirectionality(edition, Kd),
    trace,
    warnings,
  };
}

/**
 * Strength-level and ASD wall pressures in a zone at an effective wind area (m²): inward with −(GC_pi), outward
 * with +(GC_pi), each at least 16 psf in magnitude (Eq. 30.3-1 / 30.5-1 of 7-16; Eq. 30.3-1 / 30.4-1 of 7-22).
 */
export function wallPressures(site: SiteAnalysis, zone: WallZone, area: number): ZonePressure {
  const { qh, qz } = site.velocity;
  const gcp = wallGCp(site.lowRise, zone, area, site.roofSlopeDeg);
  const qPositive = site.lowRise ? qh : qz;
  const f = site.pressureFactor;
  const inwardRaw = f * (qPositive * gcp.positive + qh * site.GCpi);
  const outwardRaw = f * qh * (gcp.negative - site.GCpi);
  const inward = Math.max(inwardRaw, MINIMUM_PRESSURE);
  const outward = Math.min(outwardRaw, -MINIMUM_PRESSURE);
  return {
    effectiveArea: area,
    GCpInward: gcp.positive,
    GCpOutward: gcp.negative,
    strength: { inward, outward },
    asd: { inward: ASD_WIND_FACTOR * inward, outward: ASD_WIND_FACTOR * outward },
    minimumGoverns: inward !== inwardRaw || outward !== outwardRaw,
  };
}

/** Trace of the pressures of one zone at its governing effective area. */
export function tracePressures(
  site: SiteAnalysis,
  zone: WallZone,
  p: ZonePressure,
  span: number,
): TraceStep[] {
  const edition = site.velocity.edition;
  const eq = site.lowRise
    ? edition === 'ASCE 7-16'
      ? 'p = q_h[(GC_p) − (GC_pi)] — Eq. 30.3-1'
      : 'p = q_h·K_d[(GC_p) − (GC_pi)] — Eq. 30.3-1'
    : edition === 'ASCE 7-16'
      ? 'p = q_z(GC_p) − q_h(GC_pi) inward, q_h[(GC_p) − (GC_pi)] outward — Eq. 30.5-1'
      : 'p = K_d[q_z(GC_p) − q_h(GC_pi)] inward, q_h·K_d[(GC_p) − (GC_pi)] outward — Eq. 30.4-1';
  const note = p.minimumGoverns ? 'The 16 psf (0.77 kPa) minimum of §30.2.2 governs' : undefined;
  return [
    step(
      `wind.zone${zone}.GCp`,
      `Zone ${zone}: external pressure coefficients at the effective wind area`,
      'GC_p linear in log₁₀A between the figure’s breakpoints; A = span × max(width, span/3)',
      site.figure,
      { A: v(p.effectiveArea, 'm²'), span: v(span, M) },
      p.GCpOutward,
      ONE,
      `Positive (GC_p) = ${p.GCpInward.toFixed(3)}`,
    ),
    step(
      `wind.zone${zone}.pOutward`,
      `Zone ${zone}: design pressure, outward (strength level)`,
      eq,
      `${edition} chapter 30`,
      { q_h: v(site.velocity.qh, PA), GC_p: v(p.GCpOutward, ONE), GC_pi: v(site.GCpi, ONE) },
      p.strength.outward,
      PA,
      note,
    ),
    step(
      `wind.zone${zone}.pInward`,
      `Zone ${zone}: design pressure, inward (strength level)`,
      eq,
      `${edition} chapter 30`,
      {
        [site.lowRise ? 'q_h' : 'q_z']: v(site.lowRise ? site.velocity.qh : site.velocity.qz, PA),
        GC_p: v(p.GCpInward, ONE),
        GC_pi: v(-site.GCpi, ONE),
      },
      p.strength.inward,
      PA,
      note,
    ),
  ];
}
