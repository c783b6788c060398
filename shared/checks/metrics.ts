import { MOVEMENT_CAPABILITY } from '../calc/joints/joints';
import type { JointInput } from '../calc/joints/schema';
import { saturationPressureIso13788 } from '../calc/moisture/psychrometrics';
import type { MoistureResult } from '../calc/moisture/schema';
import type { Layer } from '../calc/thermal/schema';
import { firstKeptLayer } from '../calc/thermal/thermal';
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
  const note = [
    names.length > 0 ? `Counted: ${names.join(', ')}.` : 'No homogeneous layer has λ ≤ 0.065 W/(m·K).',
    'Convention: homogeneous layers with λ ≤ 0.065 W/(m·K) outside the framing, R = d/λ.',
    declared.length > 0 ? `Declared-resistance layers not counted: ${declared.join(', ')}.` : '',
  ]
    .filter(Boolean)
    .join(' ');
  return { value: R, unit: 'm²·K/W', traceStepIds: steps, note };
}

/**
 * Cavity-insulation R: Σ over framed layers of d/λ of the section with the lowest λ, counted when that λ is
 * ≤ 0.065 W/(m·K) — the nominal R of the cavity fill, not derated for the framing (the framing is in U_eff).
 */
export function cavityInsulationR(layers: readonly Layer[]): Metric {
  const start = firstKeptLayer(layers);
  let R = 0;
  const names: string[] = [];
  const steps: string[] = [];
  layers.forEach((l, i) => {
    if (i < start || l.kind !== 'framed') return;
    const fill = l.sections.reduce((a, b) => (b.conductivity < a.conductivity ? b : a));
    if (fill.conductivity > INSULATION_MAX_CONDUCTIVITY) return;
    R += l.thickness / fill.conductivity;
    names.push(`${fill.name} in ${l.name}`);
    steps.push(layerStep(i));
  });
  const note =
    names.length > 0
      ? `Counted: ${names.join(', ')}. Convention: d/λ of the lowest-λ section of each framed layer.`
      : 'No framed layer is filled with insulation (λ ≤ 0.065 W/(m·K)).';
  return { value: R, unit: 'm²·K/W', traceStepIds: steps, note };
}

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

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
    note: `Highest in ${MONTHS[worst.month - 1]}: φ_si = p_i/p_sat(θ_si) at the clear-field interior surface (Rsi = 0.25 m²·K/W).`,
  };
}

/** Lowest ASTM C920 movement capability of the schedule's sealants, % (100/50 counts by its 50 % compression). */
export function minSealantMovementClass(joints: readonly JointInput[]): MetricOutcome {
  if (joints.length === 0) return { value: null, reason: 'the joint schedule is empty' };
  let worst = { value: Number.POSITIVE_INFINITY, name: '' };
  for (const j of joints) {
    const c = MOVEMENT_CAPABILITY[j.sealant.movementClass];
    const v = Math.min(c.extension, c.compression);
    if (v < worst.value) worst = { value: v, name: `${j.name} (class ${j.sealant.movementClass})` };
  }
  return { value: worst.value, unit: '%', traceStepIds: [], note: `Lowest: ${worst.name}.` };
}

/** "L/180" → 180. */
export const deflectionDenominator = (limit: string): number => Number(limit.replace(/^L\//, ''));
