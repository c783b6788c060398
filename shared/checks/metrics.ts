import { MOVEMENT_CAPABILITY } from '../calc/joints/joints';
import type { JointInput } from '../calc/joints/schema';
import { saturationPressureIso13788 } from '../calc/moisture/psychrometrics';
import type { MoistureResult } from '../calc/moisture/schema';
import { RSI_SURFACE } from '../calc/moisture/surface';
import type { Layer } from '../calc/thermal/schema';
import { firstKeptLayer } from '../calc/thermal/thermal';
import { engineMessage } from '../format/message-schema';
import type { Metric, MetricOutcome } from './report';

/*
 * Metrics a code table can demand that the calculation modules do not report by themselves. Each is a
 * convention of this program; the convention is stated beside it and printed with the check.
 */

/**
 * A material counts as thermal insulation when λ ≤ 0.065 W/(m·K). Convention of this program: a threshold
 * of this size is commonly used to tell insulation products from other building materials [memory — not a
 * code definition; the adopted code's own definition of "continuous insulation" governs].
 */
export const INSULATION_MAX_CONDUCTIVITY = 0.065;

const layerStep = (i: number) => `thermal.layer.${i}.R`;

/**
 * Continuous-insulation R: Σ d/λ of the homogeneous layers with λ ≤ 0.065 W/(m·K), not in a framed layer,
 * inside any well-ventilated air layer. Bridges crossing them (clips, fasteners) are counted in U_eff, not
 * here. Declared-resistance layers are not counted (their material is not known).
 */
export function continuousInsulationR(layers: readonly Layer[]): Metric {
  const start = firstKeptLayer(layers);
  let R = 0;
  const names: string[] = [];
  const steps: string[] = [];
  layers.forEach((l, i) => {
    if (i < start || l.kind !== 'homogeneous' || l.conductivity > INSULATION_MAX_CONDUCTIVITY) return;
    R += l.thickness / l.conductivity;
    names.push(l.name);
    steps.push(layerStep(i));
  });
  const declared = layers.filter((l, i) => i >= start && l.kind === 'resistance').map((l) => l.name);
  const note = engineMessage('ci_counted', '', {
    counted: names,
    declared,
    maxLambda: INSULATION_MAX_CONDUCTIVITY,
  });
  return { value: R, unit: 'm²·K/W', traceStepIds: steps, note };
}

/**
 * Cavity-insulation R: Σ over framed layers of d/λ of the section with the lowest λ, counted when that λ is
 * ≤ 0.065 W/(m·K) — the nominal R of the cavity fill, not derated for the framing (the framing is in U_eff).
 */
export function cavityInsulationR(layers: readonly Layer[]): Metric {
  const start = firstKeptLayer(layers);
  let R = 0;
  const counted: { fill: string; layer: string }[] = [];
  const steps: string[] = [];
  layers.forEach((l, i) => {
    if (i < start || l.kind !== 'framed') return;
    const fill = l.sections.reduce((a, b) => (b.conductivity < a.conductivity ? b : a));
    if (fill.conductivity > INSULATION_MAX_CONDUCTIVITY) return;
    R += l.thickness / fill.conductivity;
    counted.push({ fill: fill.name, layer: l.name });
    steps.push(layerStep(i));
  });
  const note = engineMessage('cavity_counted', '', { counted, maxLambda: INSULATION_MAX_CONDUCTIVITY });
  return { value: R, unit: 'm²·K/W', traceStepIds: steps, note };
}

/**
 * Highest relative humidity at the clear-field interior surface over the 12 months:
 * φ_si = p_i / p_sat(θ_si), with the design p_i and θ_si (Rsi = 0.25 m²·K/W) of the moisture result and
 * p_sat by the ISO 13788:2012 formula the moisture module uses.
 */
export function maxSurfaceRh(result: MoistureResult): Metric {
  let worst = { rh: Number.NEGATIVE_INFINITY, month: 1 };
  for (const m of result.months) {
    const rh = m.interiorVapourPressure / saturationPressureIso13788(m.surface.surfaceTemperature);
    if (rh > worst.rh) worst = { rh, month: m.month };
  }
  return {
    value: worst.rh,
    unit: 'fraction',
    traceStepIds: ['moisture.fRsi'],
    note: engineMessage('surface_rh_highest', '', { month: worst.month, rsi: RSI_SURFACE }),
  };
}

/** Lowest ASTM C920 movement capability of the schedule's sealants, % (100/50 counts by its 50 % compression). */
export function minSealantMovementClass(joints: readonly JointInput[]): MetricOutcome {
  if (joints.length === 0) return { value: null, reason: engineMessage('joints_empty', 'joints', {}) };
  let worst = { value: Number.POSITIVE_INFINITY, joint: '', movementClass: '' };
  for (const j of joints) {
    const c = MOVEMENT_CAPABILITY[j.sealant.movementClass];
    const v = Math.min(c.extension, c.compression);
    if (v < worst.value) worst = { value: v, joint: j.name, movementClass: j.sealant.movementClass };
  }
  const { joint, movementClass } = worst;
  return {
    value: worst.value,
    unit: '%',
    traceStepIds: [],
    note: engineMessage('sealant_lowest', '', { joint, movementClass }),
  };
}

/** "L/180" → 180. */
export const deflectionDenominator = (limit: string): number => Number(limit.replace(/^L\//, ''));
