import { CalcInputError } from '@shared/calc/errors';
import { FOOT } from '@shared/units';
import type { Enclosure, WallZone, WindEdition } from './schema';

/*
 * Wall external pressure coefficients (GC_p) and the internal coefficient (GC_pi) for components and cladding,
 * ASCE/SEI 7-16 and 7-22 chapter 30. The figures are drawn against the effective wind area in ft², straight lines
 * in log₁₀A between two breakpoints and flat outside them.
 *
 * For the h ≤ 60 ft and h > 60 ft curves, the verification tests name the published source each value was checked against, and how; the h > 60 ft curves carry a caution on every schedule that
 * uses them.
 */

/** Mean roof height separating the low-rise figures from the h > 60 ft figures: 60 ft. */
export const LOW_RISE_HEIGHT_LIMIT = 60 * FOOT;
/** ASCE 7-16/7-22 Figure 30.3-1 note: wall GC_p reduced by 10 % when the roof slope θ ≤ 10°. */
export const LOW_SLOPE_REDUCTION = 0.9;
export const LOW_SLOPE_LIMIT_DEG = 10;
/** Square feet per square metre. */
const FT2_PER_M2 = 1 / (FOOT * FOOT);

/** A straight line in log₁₀A between (areaLow, low) and (areaHigh, high), flat outside; areas in ft². */
export interface LogLinearCurve {
  areaLow: number;
  areaHigh: number;
  low: number;
  high: number;
}

export interface WallCurves {
  positive: LogLinearCurve;
  zone4: LogLinearCurve;
  zone5: LogLinearCurve;
}

/** ASCE 7-16/7-22 Figure 30.3-1, walls, h ≤ 60 ft: 10 → 500 ft². */
export const LOW_RISE_WALL: WallCurves = {
  positive: { areaLow: 10, areaHigh: 500, low: 1.0, high: 0.7 },
  zone4: { areaLow: 10, areaHigh: 500, low: -1.1, high: -0.8 },
  zone5: { areaLow: 10, areaHigh: 500, low: -1.4, high: -0.8 },
};

/** ASCE 7-16 Figure 30.5-1 / ASCE 7-22 Figure 30.4-1, walls, h > 60 ft: 20 → 500 ft² [memory — verify]. */
export const HIGH_RISE_WALL: WallCurves = {
  positive: { areaLow: 20, areaHigh: 500, low: 0.9, high: 0.6 },
  zone4: { areaLow: 20, areaHigh: 500, low: -0.9, high: -0.7 },
  zone5: { areaLow: 20, areaHigh: 500, low: -1.8, high: -1.0 },
};

/** Wall figure of each edition and height range (figure numbers of 7-22 [memory + third-party]). */
export function wallFigure(edition: WindEdition, lowRise: boolean): string {
  if (lowRise) return `${edition} Figure 30.3-1 (walls, h ≤ 60 ft)`;
  return edition === 'ASCE 7-16'
    ? 'ASCE 7-16 Figure 30.5-1 (walls, h > 60 ft)'
    : 'ASCE 7-22 Figure 30.4-1 (walls, h > 60 ft)';
}

/** GC_p on a curve at area A (ft²): linear in log₁₀A between the breakpoints, constant outside (Figure 30.3-1). */
export function logLinear(curve: LogLinearCurve, areaFt2: number): number {
  const a = Math.min(Math.max(areaFt2, curve.areaLow), curve.areaHigh);
  const t = Math.log10(a / curve.areaLow) / Math.log10(curve.areaHigh / curve.areaLow);
  return curve.low + (curve.high - curve.low) * t;
}

/**
 * Wall GC_p (positive and negative for the zone) at an effective wind area in m²; the low-rise values are
 * reduced by 10 % when θ ≤ 10° (ASCE 7-16/7-22 Figure 30.3-1 notes; Figure 30.5-1 / 30.4-1 for h > 60 ft).
 */
export function wallGCp(
  lowRise: boolean,
  zone: WallZone,
  area: number,
  roofSlopeDeg: number,
): { positive: number; negative: number } {
  const curves = lowRise ? LOW_RISE_WALL : HIGH_RISE_WALL;
  const areaFt2 = area * FT2_PER_M2;
  const factor = lowRise && roofSlopeDeg <= LOW_SLOPE_LIMIT_DEG ? LOW_SLOPE_REDUCTION : 1;
  return {
    positive: factor * logLinear(curves.positive, areaFt2),
    negative: factor * logLinear(zone === 4 ? curves.zone4 : curves.zone5, areaFt2),
  };
}

/** (GC_pi) magnitude: ±0.18 enclosed, ±0.55 partially enclosed (ASCE 7-16/7-22 Table 26.13-1). */
export function internalPressureCoefficient(enclosure: Enclosure): number {
  switch (enclosure) {
    case 'enclosed':
      return 0.18;
    case 'partially_enclosed':
      return 0.55;
    default:
      throw new CalcInputError(
        'site.enclosure',
        'the wall figures of chapter 30 cover enclosed and partially enclosed buildings only; an open building has no wall cladding under them — classify the building again or design the cladding by another provision',
      );
  }
}

/**
 * End-zone width a, m. h ≤ 60 ft: min(0.1·least dimension, 0.4h), not less than 0.04·least dimension nor 3 ft
 * (Figure 30.3-1 note). h > 60 ft: 0.1·least dimension, not less than 3 ft (Figure 30.5-1 note).
 */
export function edgeWidth(lowRise: boolean, h: number, leastDimension: number): number {
  if (lowRise) return Math.max(Math.min(0.1 * leastDimension, 0.4 * h), 0.04 * leastDimension, 3 * FOOT);
  return Math.max(0.1 * leastDimension, 3 * FOOT);
}
