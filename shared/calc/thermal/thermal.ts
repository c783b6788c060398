import { CalcInputError } from '@shared/calc/errors';
import { step, type TraceInput, type TraceStep, v } from '@shared/calc/trace';
import { M, ONE, RK, UK, WMK } from '@shared/calc/trace-units';
import { engineMessage, type ThermalWarning } from '@shared/format/message-schema';
import { R_IP_TO_SI, U_IP_TO_SI } from '@shared/units';
import {
  ENERGY_CODE_FILMS_SOURCE,
  ENERGY_CODE_SOURCE,
  energyCodeFilms,
  steelFramingEffectiveR,
} from './energy-code';
import { findMaterial } from './materials';
import type {
  AirLayer,
  Bridge,
  BridgeResult,
  FastenerBridge,
  FramedLayer,
  FramedSection,
  HeatFlow,
  Layer,
  MethodName,
  ThermalInput,
  ThermalResult,
  Ventilation,
} from './schema';

/*
 * Clear-field and effective thermal resistance of a layered wall (outside → inside), SI throughout.
 * ISO 6946:2017 for layers, surfaces, air layers, the combined method and Annex F fasteners; ASHRAE
 * Handbook—Fundamentals (2021) ch. 27 for parallel path, isothermal planes and the zone method for metal;
 * ASHRAE 90.1-2016 Appendix A (energy-code.ts) for the energy-code path of steel-framed walls. Which method
 * gives R₀ (DEVELOPERS.md D-012): a steel-framed wall the table covers → the energy-code path; other metal
 * framing → the lowest R of the methods offered; no metal → ISO 6946 combined.
 *
 * Table 8 is reproduced by the Annex D formula (h_a, h_r0 = 5.1) to its rounding. The verification tests name
 * the published source each constant was checked against, and how.
 */

const SRC_LAYER = 'ISO 6946:2017, thermal resistance of homogeneous layers';
const SRC_SURFACE = 'ISO 6946:2017 §6.8, Table 7';
const SRC_AIR = 'ISO 6946:2017 §6.9, Table 8';
const SRC_AIR_LOW_E = 'ISO 6946:2017 §6.9 and Annex D';
const SRC_AIR_SLIGHT = 'ISO 6946:2017 §6.9.3, slightly ventilated air layers';
const SRC_ISO_LIMITS = 'ISO 6946:2017 §6.7.2';
const SRC_SCOPE_ZONE = 'ISO 6946:2017 Scope; ASHRAE Handbook—Fundamentals (2021) ch. 27, zone method';
const SRC_FASTENER = 'ISO 6946:2017 Annex F';
const SRC_PARALLEL = 'ASHRAE Handbook—Fundamentals (2021) ch. 27, parallel-path method';
const SRC_ISOTHERMAL = 'ASHRAE Handbook—Fundamentals (2021) ch. 27, isothermal-planes method';
const SRC_ZONE = 'ASHRAE Handbook—Fundamentals (2021) ch. 27, zone method for metal sections';
const SRC_ENERGY_CODE = `${ENERGY_CODE_SOURCE}; ${ENERGY_CODE_FILMS_SOURCE}`;
const SRC_BRIDGE = 'ISO 14683:2017 / ISO 10211:2017, U = U₀ + (Σψ·L + Σχ)/A';
const SRC_U = 'ISO 6946:2017, U = 1/R_T';

const NOTE_METAL_SCOPE =
  'ISO 6946:2017 excludes insulation bridged by metal other than fasteners (Scope), so its combined method is not offered';
const NOTE_ISO_DEFAULT =
  'ISO 6946:2017 combined method: no metal bridges the layers, so the standard applies; it brackets R_T between its upper and lower limits and states the maximum error.';
const NOTE_HOMOGENEOUS = 'All layers are homogeneous: every method gives the same R_T.';

/** Fractions of a framed layer must sum to 1 within this tolerance. */
export const FRACTION_TOLERANCE = 1e-6;
/** ISO 6946:2017 §6.7.2 — the upper/lower-limit method is limited to R′T/R″T ≤ 1.5. */
export const ISO_LIMIT_RATIO_MAX = 1.5;
/** Annex F is not applied below this fastener conductivity, W/(m·K). */
export const FASTENER_MIN_CONDUCTIVITY = 1;
/** ISO 6946:2017 §6.9.3 — vent area A_v, mm² per m of length (vertical layers) or per m² (horizontal). */
export const AIR_VENT_AREA_UNIT = 'mm²/m';
/** §6.9.3 — at most this A_v the layer is unventilated, mm²/m. */
export const UNVENTILATED_MAX_VENT_AREA = 500;
/** §6.9.3 — above this A_v the layer is well ventilated, mm²/m. */
export const WELL_VENTILATED_MIN_VENT_AREA = 1500;

/** R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v: the two weights (ISO 6946:2017 §6.9.3). */
export const slightVentilationWeights = (ventArea: number): { a: number; b: number } => ({
  a: (WELL_VENTILATED_MIN_VENT_AREA - ventArea) / 1000,
  b: (ventArea - UNVENTILATED_MAX_VENT_AREA) / 1000,
});
/**
 * The parallel-path method follows every combination of sections through the framed layers (Π n_sections
 * paths); more than this many is no real wall and would take exponential time (8 sections × 40 layers).
 */
export const MAX_PARALLEL_PATHS = 10_000;
/** ASHRAE zone method: d is taken as no less than 0.5 in (still-air film), m (Fundamentals ch. 27). */
export const ZONE_MIN_DISTANCE = 0.0127;
/** Radiative coefficient of a black body at 10 °C, h_r0 = 4σT_m³, W/(m²·K) (ISO 6946:2017 Annex C/D). */
const H_R0 = 5.1;

/** What a practitioner calls each method (screens, sheet and the sentence saying which method decides). */
export const METHOD_LABELS: Readonly<Record<MethodName, string>> = {
  parallelPath: 'Parallel path (ASHRAE)',
  isothermalPlanes: 'Isothermal planes (ASHRAE)',
  isoCombined: 'ISO 6946 combined, (R′T + R″T)/2',
  zone: 'Zone method for metal framing (ASHRAE)',
  energyCode: 'Energy-code path for steel framing (ASHRAE 90.1 Appendix A)',
};

/** ISO 6946:2017 Table 7 — conventional surface resistances, m²·K/W. */
export const SURFACE_RESISTANCES: Readonly<Record<HeatFlow, { Rsi: number; Rse: number }>> = {
  upward: { Rsi: 0.1, Rse: 0.04 },
  horizontal: { Rsi: 0.13, Rse: 0.04 },
  downward: { Rsi: 0.17, Rse: 0.04 },
};

/** ISO 6946:2017 Table 8 — unventilated air layers with high-emissivity faces: thickness (m) → R (m²·K/W). */
export const AIR_LAYER_TABLE = {
  thickness: [0, 0.005, 0.007, 0.01, 0.015, 0.025, 0.05, 0.1, 0.3],
  upward: [0, 0.11, 0.13, 0.15, 0.16, 0.16, 0.16, 0.16, 0.16],
  horizontal: [0, 0.11, 0.13, 0.15, 0.17, 0.18, 0.18, 0.18, 0.18],
  downward: [0, 0.11, 0.13, 0.15, 0.17, 0.19, 0.21, 0.22, 0.23],
} as const;

// ---------------------------------------------------------------------------------------------- layers

/** R = d/λ (ISO 6946:2017, homogeneous layer). */
export const layerResistance = (thickness: number, conductivity: number): number => thickness / conductivity;

/** Rsi, Rse by heat-flow direction (ISO 6946:2017 §6.8 Table 7). */
export function surfaceResistances(heatFlow: HeatFlow): { Rsi: number; Rse: number } {
  const r = SURFACE_RESISTANCES[heatFlow];
  if (r === undefined)
    throw new CalcInputError('heatFlow', `must be horizontal, upward or downward (got ${heatFlow})`);
  return r;
}

/** Linear interpolation in ISO 6946:2017 Table 8 (unventilated, high-emissivity faces). */
function airLayerTable8(thickness: number, heatFlow: HeatFlow): number {
  const t = AIR_LAYER_TABLE.thickness;
  const r = AIR_LAYER_TABLE[heatFlow];
  let k = 1;
  while (k < t.length - 1 && thickness > t[k]!) k++;
  return r[k - 1]! + ((r[k]! - r[k - 1]!) * (thickness - t[k - 1]!)) / (t[k]! - t[k - 1]!);
}

/** R_g = 1/(h_a + E·h_r0), h_a by direction and thickness (ISO 6946:2017 Annex D). */
function airLayerAnnexD(thickness: number, heatFlow: HeatFlow, emittance: number): number {
  const conduction = 0.025 / thickness;
  const convection =
    heatFlow === 'horizontal' ? 1.25 : heatFlow === 'upward' ? 1.95 : 0.12 * thickness ** -0.44;
  return 1 / (Math.max(convection, conduction) + emittance * H_R0);
}

/**
 * Air layer R (ISO 6946:2017 §6.9): unventilated from Table 8 (or Annex D when the emittance E is given); a
 * slightly ventilated layer also takes its unventilated R, the wall's R_T then being blended with the
 * well-ventilated configuration (§6.9.3, in calculateThermal); well ventilated 0 (the caller discards it and
 * the layers outside).
 */
export function airLayerResistance(
  thickness: number,
  heatFlow: HeatFlow,
  ventilation: Ventilation,
  emittance?: number,
): number {
  if (ventilation === 'well') return 0;
  const unventilated =
    emittance === undefined
      ? airLayerTable8(thickness, heatFlow)
      : airLayerAnnexD(thickness, heatFlow, emittance);
  return unventilated;
}

/** Bridged layer by isothermal planes: R″_j = d / Σ f_q·λ_q (ISO 6946:2017 §6.7.2, lower limit). */
export function framedLayerIsothermalResistance(
  thickness: number,
  sections: readonly FramedSection[],
): number {
  let conductance = 0;
  for (const s of sections) conductance += s.fraction * s.conductivity;
  return thickness / conductance;
}

// --------------------------------------------------------------------------------------------- methods

type FramedPart = Pick<FramedLayer, 'thickness' | 'sections'>;

function pathConductance(
  seriesR: number,
  framed: readonly FramedPart[],
  k: number,
  fraction: number,
): number {
  if (k === framed.length) return fraction / seriesR;
  const layer = framed[k]!;
  let sum = 0;
  for (const s of layer.sections)
    sum += pathConductance(seriesR + layer.thickness / s.conductivity, framed, k + 1, fraction * s.fraction);
  return sum;
}

/**
 * Parallel path: 1/R_T = Σ f_m/R_T,m over every path through the sections (ASHRAE Handbook—Fundamentals
 * 2021 ch. 27). `seriesR` = Rsi + Rse + every unbridged layer; sections of different framed layers are
 * taken as uncorrelated (path fraction = product of section fractions).
 */
export const parallelPath = (seriesR: number, framed: readonly FramedPart[]): number =>
  1 / pathConductance(seriesR, framed, 0, 1);

/** Isothermal planes: R_T = seriesR + Σ d_j/Σ f_q·λ_q (ASHRAE Handbook—Fundamentals 2021 ch. 27). */
export function isothermalPlanes(seriesR: number, framed: readonly FramedPart[]): number {
  let r = seriesR;
  for (const layer of framed) r += framedLayerIsothermalResistance(layer.thickness, layer.sections);
  return r;
}

/** Upper limit R′T (ISO 6946:2017 §6.7.2) — the same arithmetic as the parallel-path method. */
export const iso6946Upper = parallelPath;

/** Lower limit R″T (ISO 6946:2017 §6.7.2) — the same arithmetic as the isothermal-planes method. */
export const iso6946Lower = isothermalPlanes;

/** R_T = (R′T + R″T)/2, e = (R′T − R″T)/(2R_T), ratio R′T/R″T ≤ 1.5 (ISO 6946:2017 §6.7.2). */
export function iso6946Combined(upper: number, lower: number): { R: number; error: number; ratio: number } {
  const R = (upper + lower) / 2;
  return { R, error: (upper - lower) / (2 * R), ratio: upper / lower };
}

export interface ZoneMethodInput {
  /** Rsi + Rse + every layer other than the metal-framed one, m²·K/W. */
  restResistance: number;
  /** Depth of the metal-framed layer, m. */
  thickness: number;
  /** λ of the metal member (web), W/(m·K). */
  memberConductivity: number;
  /** Area fraction of the member web f = t_web/s. */
  memberFraction: number;
  /** Area-weighted λ of the cavity sections, W/(m·K). */
  cavityConductivity: number;
  /** Flange width m, m. */
  flangeWidth: number;
  /** Member spacing s, m. */
  spacing: number;
  /**
   * Distance d from the metal flange to the panel surface, m: the thickness of every layer between them on
   * the deeper side, insulation and declared-R layers included (raised to 0.5 in if smaller).
   */
  distance: number;
}

/**
 * Zone method: W = m + 2d, m the width of the metal heat-path terminal (flange), d the distance from the
 * panel surface to the metal, not less than 0.5 in; zone A by isothermal planes across W, zone B the cavity
 * path, U = (W/s)/R_A + (1 − W/s)/R_B (ASHRAE Handbook—Fundamentals 2021 ch. 27, zone method; d measured on
 * the thicker side, as the ORNL modified-zone-method notes describe the ASHRAE zone method).
 */
export function zoneMethod(p: ZoneMethodInput): { R: number; zoneWidth: number; RA: number; RB: number } {
  const web = p.memberFraction * p.spacing;
  const zoneWidth = Math.min(
    Math.max(p.flangeWidth + 2 * Math.max(p.distance, ZONE_MIN_DISTANCE), web),
    p.spacing,
  );
  const lambdaA = (p.memberConductivity * web + p.cavityConductivity * (zoneWidth - web)) / zoneWidth;
  const RA = p.restResistance + p.thickness / lambdaA;
  const RB = p.restResistance + p.thickness / p.cavityConductivity;
  const a = zoneWidth / p.spacing;
  return { R: 1 / (a / RA + (1 - a) / RB), zoneWidth, RA, RB };
}

// --------------------------------------------------------------------------------------------- bridges

/** Repeating point bridges ΔU = n·χ (ISO 14683:2017 / ISO 10211:2017). */
export const pointBridgeDeltaU = (chi: number, countPerArea: number): number => chi * countPerArea;

/** Linear bridges ΔU = ψ·L/A; for members at spacing s, L/A = 1/s (ISO 14683:2017). */
export const linearBridgeDeltaU = (psi: number, lengthPerArea: number): number => psi * lengthPerArea;

/** α = 0.8 fully penetrating, 0.8·d₁/d₀ recessed (ISO 6946:2017 Annex F). */
export const fastenerAlpha = (insulationDepth: number, penetratingLength: number): number =>
  (0.8 * penetratingLength) / insulationDepth;

/** ΔU_f = α·λ_f·A_f·n_f/d₀·(R₁/R_T,h)² (ISO 6946:2017 Annex F). */
export const fastenerDeltaU = (
  alpha: number,
  conductivity: number,
  area: number,
  countPerArea: number,
  insulationDepth: number,
  insulationR: number,
  totalR: number,
): number => ((alpha * conductivity * area * countPerArea) / insulationDepth) * (insulationR / totalR) ** 2;

// ------------------------------------------------------------------------------------------ validation

const isPositive = (x: number): boolean => x > 0 && x < Number.POSITIVE_INFINITY;

function positiveAt(value: number, list: string, index: number, field: string, what: string): void {
  if (!isPositive(value))
    throw new CalcInputError(
      `${list}.${index}.${field}`,
      `${what} must be a finite number greater than 0 (got ${value})`,
    );
}

function validateFramed(layer: FramedLayer, i: number): void {
  positiveAt(layer.thickness, 'layers', i, 'thickness', 'thickness');
  if (layer.sections.length === 0)
    throw new CalcInputError(`layers.${i}.sections`, 'needs at least one section');
  let sum = 0;
  for (let q = 0; q < layer.sections.length; q++) {
    const s = layer.sections[q]!;
    positiveAt(s.conductivity, `layers.${i}.sections`, q, 'conductivity', 'conductivity λ');
    positiveAt(s.fraction, `layers.${i}.sections`, q, 'fraction', 'area fraction');
    sum += s.fraction;
  }
  if (!(Math.abs(sum - 1) <= FRACTION_TOLERANCE))
    throw new CalcInputError(`layers.${i}.sections`, `area fractions must sum to 1 (got ${sum})`);
  if (!layer.metal) return;
  if (layer.sections.length < 2)
    throw new CalcInputError(
      `layers.${i}.sections`,
      'a metal-framed layer needs the member and at least one cavity section',
    );
  if (layer.flangeWidth === undefined)
    throw new CalcInputError(`layers.${i}.flangeWidth`, 'the zone method needs the metal flange width');
  if (layer.spacing === undefined)
    throw new CalcInputError(`layers.${i}.spacing`, 'the zone method needs the member spacing');
  positiveAt(layer.flangeWidth, 'layers', i, 'flangeWidth', 'flange width');
  positiveAt(layer.spacing, 'layers', i, 'spacing', 'member spacing');
}

/** A_v must match the class chosen (ISO 6946:2017 §6.9.3); a slightly ventilated layer needs it. */
function validateVentArea(layer: AirLayer, i: number): void {
  const Av = layer.ventArea;
  const field = `layers.${i}.ventArea`;
  if (Av === undefined) {
    if (layer.ventilation === 'slightly')
      throw new CalcInputError(
        field,
        `a slightly ventilated air layer needs its vent area A_v (${AIR_VENT_AREA_UNIT}, more than ${UNVENTILATED_MAX_VENT_AREA} and at most ${WELL_VENTILATED_MIN_VENT_AREA}): ISO 6946:2017 §6.9.3 interpolates between unventilated and well ventilated by it`,
      );
    return;
  }
  if (!(Av >= 0 && Av < Number.POSITIVE_INFINITY))
    throw new CalcInputError(field, `must be a finite number ≥ 0 (got ${Av})`);
  const cls =
    Av <= UNVENTILATED_MAX_VENT_AREA
      ? 'unventilated'
      : Av > WELL_VENTILATED_MIN_VENT_AREA
        ? 'well'
        : 'slightly';
  if (cls !== layer.ventilation)
    throw new CalcInputError(
      field,
      `A_v = ${Av} ${AIR_VENT_AREA_UNIT} makes the layer ${cls === 'well' ? 'well ventilated' : cls === 'slightly' ? 'slightly ventilated' : 'unventilated'} (ISO 6946:2017 §6.9.3: ≤ ${UNVENTILATED_MAX_VENT_AREA} unventilated, > ${WELL_VENTILATED_MIN_VENT_AREA} well ventilated) — choose that, or correct A_v`,
    );
}

function validateLayer(layer: Layer, i: number): void {
  switch (layer.kind) {
    case 'homogeneous':
      positiveAt(layer.thickness, 'layers', i, 'thickness', 'thickness');
      positiveAt(layer.conductivity, 'layers', i, 'conductivity', 'conductivity λ');
      if (layer.materialId !== undefined && findMaterial(layer.materialId) === undefined)
        throw new CalcInputError(`layers.${i}.materialId`, `unknown material "${layer.materialId}"`);
      return;
    case 'resistance':
      positiveAt(layer.resistance, 'layers', i, 'resistance', 'declared resistance');
      if (layer.thickness !== undefined) positiveAt(layer.thickness, 'layers', i, 'thickness', 'thickness');
      return;
    case 'air':
      positiveAt(layer.thickness, 'layers', i, 'thickness', 'thickness');
      if (layer.thickness > 0.3)
        throw new CalcInputError(
          `layers.${i}.thickness`,
          `ISO 6946 Table 8 stops at 0.3 m (got ${layer.thickness}); treat a deeper space as an unheated space`,
        );
      validateVentArea(layer, i);
      if (
        layer.emissivityFactor !== undefined &&
        !(layer.emissivityFactor > 0 && layer.emissivityFactor <= 1)
      )
        throw new CalcInputError(
          `layers.${i}.emissivityFactor`,
          `must lie in (0, 1] (got ${layer.emissivityFactor})`,
        );
      return;
    case 'framed':
      validateFramed(layer, i);
      return;
    default:
      throw new CalcInputError(`layers.${i}.kind`, 'must be homogeneous, resistance, air or framed');
  }
}

// ------------------------------------------------------------------------------------------ calculation

/**
 * Index of the first layer kept: layers outside the innermost well-ventilated air layer are disregarded
 * (ISO 6946:2017 §6.9.4). One rule for the thermal and moisture engines, the checks and the pages.
 */
export function firstKeptLayer(
  layers: readonly { kind?: string; ventilation?: string }[] | undefined,
): number {
  let start = 0;
  (layers ?? []).forEach((l, i) => {
    if (l?.kind === 'air' && l.ventilation === 'well') start = i + 1;
  });
  return start;
}

function traceLayer(layer: Exclude<Layer, FramedLayer>, i: number, heatFlow: HeatFlow): TraceStep {
  switch (layer.kind) {
    case 'homogeneous': {
      const R = layerResistance(layer.thickness, layer.conductivity);
      return step(
        `thermal.layer.${i}.R`,
        `${layer.name}: thermal resistance`,
        'R = d/λ',
        SRC_LAYER,
        { d: v(layer.thickness, M), λ: v(layer.conductivity, WMK) },
        R,
        RK,
      );
    }
    case 'resistance':
      return step(
        `thermal.layer.${i}.R`,
        `${layer.name}: declared thermal resistance`,
        'R = declared value',
        'Manufacturer declaration',
        { R: v(layer.resistance, RK) },
        layer.resistance,
        RK,
      );
    case 'air': {
      const E = layer.emissivityFactor;
      const R = airLayerResistance(layer.thickness, heatFlow, layer.ventilation, E);
      const half = layer.ventilation === 'slightly' ? ' (unventilated value; §6.9.3 blends R_T)' : '';
      return E === undefined
        ? step(
            `thermal.layer.${i}.R`,
            `${layer.name}: air layer resistance`,
            `R_g from Table 8 by thickness and heat-flow direction${half}`,
            SRC_AIR,
            { d: v(layer.thickness, M) },
            R,
            RK,
          )
        : step(
            `thermal.layer.${i}.R`,
            `${layer.name}: air layer resistance`,
            `R_g = 1/(h_a + E·h_r0)${half}`,
            SRC_AIR_LOW_E,
            { d: v(layer.thickness, M), E: v(E, ONE), h_r0: v(H_R0, UK) },
            R,
            RK,
          );
    }
  }
}

interface Bridged {
  deltaU: number;
  trace: TraceStep;
}

function pointOrLinear(b: Exclude<Bridge, FastenerBridge>, j: number): Bridged {
  let deltaU: number;
  let formula: string;
  let inputs: Record<string, TraceInput>;
  if (b.kind === 'point') {
    const n = 'countPerArea' in b ? b.countPerArea : 1 / (b.spacingHorizontal * b.spacingVertical);
    deltaU = pointBridgeDeltaU(b.chi, n);
    formula = 'countPerArea' in b ? 'ΔU = n·χ' : 'ΔU = χ/(s_h·s_v)';
    inputs = { χ: v(b.chi, 'W/K'), n: v(n, '1/m²') };
  } else {
    const L = 'lengthPerArea' in b ? b.lengthPerArea : 1 / b.spacing;
    deltaU = linearBridgeDeltaU(b.psi, L);
    formula = 'lengthPerArea' in b ? 'ΔU = ψ·L/A' : 'ΔU = ψ/s';
    inputs = { ψ: v(b.psi, WMK), 'L/A': v(L, 'm/m²') };
  }
  const label = `${b.name}: ${b.kind} bridges`;
  return {
    deltaU,
    trace: step(`thermal.bridge.${j}.deltaU`, label, formula, SRC_BRIDGE, inputs, deltaU, UK),
  };
}

function fastener(
  b: FastenerBridge,
  j: number,
  layers: readonly Layer[],
  start: number,
  R0: number,
): Bridged {
  if (b.bothEndsMetal === true)
    throw new CalcInputError(
      `bridges.${j}.bothEndsMetal`,
      'ISO 6946 Annex F does not apply when both ends of the fastener touch metal sheets; enter it as a point bridge with a χ value',
    );
  positiveAt(b.conductivity, 'bridges', j, 'conductivity', 'fastener conductivity');
  positiveAt(b.diameter, 'bridges', j, 'diameter', 'fastener diameter');
  positiveAt(b.countPerArea, 'bridges', j, 'countPerArea', 'fasteners per m²');
  const layer = layers[b.layerIndex];
  if (layer === undefined || layer.kind !== 'homogeneous')
    throw new CalcInputError(`bridges.${j}.layerIndex`, 'must point at a homogeneous insulation layer');
  if (b.layerIndex < start)
    throw new CalcInputError(
      `bridges.${j}.layerIndex`,
      'that layer lies outside a well-ventilated air layer and is discarded',
    );
  const d0 = layer.thickness;
  let d1 = d0;
  if (b.penetration === 'recessed') {
    if (b.recessDepth === undefined || !(b.recessDepth >= 0 && b.recessDepth < d0))
      throw new CalcInputError(
        `bridges.${j}.recessDepth`,
        `a recessed fastener needs a recess depth from 0 to below ${d0} m`,
      );
    d1 = d0 - b.recessDepth;
  }
  const R1 = layerResistance(d0, layer.conductivity);
  const alpha = fastenerAlpha(d0, d1);
  const area = (Math.PI * b.diameter * b.diameter) / 4;
  const applies = b.conductivity >= FASTENER_MIN_CONDUCTIVITY;
  const deltaU = applies ? fastenerDeltaU(alpha, b.conductivity, area, b.countPerArea, d0, R1, R0) : 0;
  return {
    deltaU,
    trace: step(
      `thermal.bridge.${j}.deltaU`,
      `${b.name}: mechanical fasteners through ${layer.name}`,
      'ΔU_f = α·λ_f·A_f·n_f/d₀·(R₁/R_T,h)², α = 0.8·d₁/d₀',
      SRC_FASTENER,
      {
        α: v(alpha, ONE),
        λ_f: v(b.conductivity, WMK),
        A_f: v(area, 'm²'),
        n_f: v(b.countPerArea, '1/m²'),
        'd₀': v(d0, M),
        'd₁': v(d1, M),
        'R₁': v(R1, RK),
        'R_T,h': v(R0, RK),
      },
      deltaU,
      UK,
      applies ? undefined : 'Not applied: ISO 6946 Annex F needs no correction when λ_f < 1 W/(m·K)',
    ),
  };
}

function bridgeDeltaU(b: Bridge, j: number, layers: readonly Layer[], start: number, R0: number): Bridged {
  if (b.kind === 'fastener') return fastener(b, j, layers, start, R0);
  const value = b.kind === 'point' ? b.chi : b.psi;
  if (!(value >= 0 && value < Number.POSITIVE_INFINITY))
    throw new CalcInputError(
      `bridges.${j}.${b.kind === 'point' ? 'chi' : 'psi'}`,
      `must be a finite number ≥ 0 (got ${value})`,
    );
  if ('countPerArea' in b) positiveAt(b.countPerArea, 'bridges', j, 'countPerArea', 'count per m²');
  else if ('lengthPerArea' in b) positiveAt(b.lengthPerArea, 'bridges', j, 'lengthPerArea', 'length per m²');
  else if ('spacing' in b) positiveAt(b.spacing, 'bridges', j, 'spacing', 'spacing');
  else {
    positiveAt(b.spacingHorizontal, 'bridges', j, 'spacingHorizontal', 'horizontal spacing');
    positiveAt(b.spacingVertical, 'bridges', j, 'spacingVertical', 'vertical spacing');
  }
  return pointOrLinear(b, j);
}

/** Area-weighted λ of every section but the member (the section with the highest λ). */
function splitMember(sections: readonly FramedSection[]): {
  member: FramedSection;
  cavityConductivity: number;
} {
  let member = sections[0]!;
  for (const s of sections) if (s.conductivity > member.conductivity) member = s;
  let f = 0;
  let fl = 0;
  for (const s of sections)
    if (s !== member) {
      f += s.fraction;
      fl += s.fraction * s.conductivity;
    }
  return { member, cavityConductivity: fl / f };
}

/** Thickness of the layers from `from` to `to` (exclusive), declared-R layers by their own thickness. */
function depth(layers: readonly Layer[], from: number, to: number): number {
  let d = 0;
  for (let i = from; i < to; i++) d += layers[i]!.thickness ?? 0;
  return d;
}

/**
 * In a wall with metal framing every declared-R layer must say how thick it is: the zone method's d runs
 * through it, and counting it as 0 would narrow zone A and overstate R (a 100 mm board entered as R gave
 * R₀ 17 % higher than the same board entered as d/λ).
 */
function requireDeclaredThickness(layers: readonly Layer[], start: number): void {
  for (let i = start; i < layers.length; i++) {
    const l = layers[i]!;
    if (l.kind === 'resistance' && l.thickness === undefined)
      throw new CalcInputError(
        `layers.${i}.thickness`,
        'a declared-R layer in a wall with metal framing needs its thickness: the zone method measures the distance from the metal flange to the surface through it',
      );
  }
}

/**
 * Energy-code path of a steel-framed wall: R_T = R_film,e + ΣR of the other layers + R_framing,eff (table) +
 * R_film,i (ASHRAE 90.1-2016 Appendix A, Table A9.2-2 and §A9.4.1). `otherLayersR` is every kept layer but
 * the framed ones, surfaces excluded. Refused (with the reason) where the table does not reach.
 */
function energyCodePath(
  layers: readonly Layer[],
  start: number,
  metalIndex: number,
  cavityConductivity: number,
  heatFlow: HeatFlow,
  otherLayersR: number,
): { info: NonNullable<ThermalResult['energyCode']>; step: TraceStep | null } {
  const layer = layers[metalIndex] as FramedLayer;
  const refused = (text: string) => ({
    info: { status: 'refused' as const, text, source: ENERGY_CODE_SOURCE, framingR: null },
    step: null,
  });
  const otherFramed = layers.findIndex((l, i) => i >= start && i !== metalIndex && l.kind === 'framed');
  if (otherFramed >= 0)
    return refused(
      `the table's series sum takes one framed layer, and ${layers[otherFramed]!.name} is framed too`,
    );
  const ratedR = layer.thickness / cavityConductivity;
  const lookup = steelFramingEffectiveR(layer.thickness, layer.spacing!, ratedR, heatFlow);
  if (lookup.status === 'refused') return refused(lookup.reason);
  const films = energyCodeFilms(heatFlow);
  const R = films.exterior + otherLayersR + lookup.framingR + films.interior;
  return {
    info: { status: 'applied', text: lookup.row, source: ENERGY_CODE_SOURCE, framingR: lookup.framingR },
    step: step(
      'thermal.R.energyCode',
      `Total resistance, energy-code path (${layer.name})`,
      'R_T = R_film,e + ΣR_other layers + R_framing,eff + R_film,i',
      SRC_ENERGY_CODE,
      {
        'R_film,e': v(films.exterior, RK),
        'ΣR_other layers': v(otherLayersR, RK),
        'R_cavity,rated': v(ratedR, RK),
        'R_framing,eff': v(lookup.framingR, RK),
        'R_film,i': v(films.interior, RK),
      },
      R,
      RK,
      `Effective framing/cavity R from the table: ${lookup.row}; rated cavity R = d/λ of the cavity fill; the standard's air films replace Rse and Rsi`,
    ),
  };
}

/**
 * Which method gives R₀ (DEVELOPERS.md D-012): the energy-code path where it applies to a steel-framed wall;
 * other metal framing → the lowest R of the methods offered (never the least conservative); no metal → ISO
 * 6946 combined, the standard's own method.
 */
function decidingMethod(
  byMethod: Partial<Record<MethodName, number>>,
  offered: readonly MethodName[],
  metal: boolean,
  energyCode: ThermalResult['energyCode'],
  framed: boolean,
): { method: MethodName; basis: ThermalResult['basis'] } {
  if (!metal)
    return {
      method: 'isoCombined',
      basis: { kind: 'standard', text: framed ? NOTE_ISO_DEFAULT : NOTE_HOMOGENEOUS },
    };
  if (energyCode?.status === 'applied')
    return {
      method: 'energyCode',
      basis: {
        kind: 'energyCode',
        text: `R₀ is taken by the energy-code path for steel framing — the effective framing/cavity R of ${energyCode.source} (${energyCode.text}) in series with the other layers — the method the energy standard prescribes for this wall; the other methods are shown beside it.`,
      },
    };
  let lowest = offered[0]!;
  for (const m of offered) if (byMethod[m]! < byMethod[lowest]!) lowest = m;
  return {
    method: lowest,
    basis: {
      kind: 'mostConservative',
      text: `No energy-code path applies (${energyCode?.text ?? 'no steel framing table'}), so R₀ is the lowest of the methods offered — ${METHOD_LABELS[lowest]} — and never rests on the least conservative one.`,
    },
  };
}

/** The slightly ventilated air layer of a wall and its §6.9.3 weights, or null (one such layer at most). */
function slightVentilation(
  layers: readonly Layer[],
  start: number,
): { index: number; ventArea: number; unit: string; a: number; b: number } | null {
  let found: { index: number; ventArea: number; unit: string; a: number; b: number } | null = null;
  for (let i = start; i < layers.length; i++) {
    const l = layers[i]!;
    if (l.kind !== 'air' || l.ventilation !== 'slightly') continue;
    if (found)
      throw new CalcInputError(
        `layers.${i}.ventilation`,
        'ISO 6946 §6.9.3 blends one slightly ventilated air layer; enter the others as unventilated or well ventilated',
      );
    const w = slightVentilationWeights(l.ventArea!);
    found = { index: i, ventArea: l.ventArea!, unit: AIR_VENT_AREA_UNIT, ...w };
  }
  return found;
}

interface ZoneValues {
  R: number;
  zoneWidth: number;
  RA: number;
  RB: number;
  distance: number;
}
interface MethodValues {
  pp: number;
  ip: number;
  zone: ZoneValues | null;
  code: { R: number; info: NonNullable<ThermalResult['energyCode']>; step: TraceStep | null } | null;
}

/** Every method's R_T of one configuration of the wall (kept from `start`, with its Rse and series sum). */
function methodValues(
  layers: readonly Layer[],
  heatFlow: HeatFlow,
  start: number,
  Rsi: number,
  Rse: number,
  seriesR: number,
  framed: readonly FramedLayer[],
  metalIndex: number,
): MethodValues {
  const pp = parallelPath(seriesR, framed);
  const ip = isothermalPlanes(seriesR, framed);
  if (metalIndex < 0) return { pp, ip, zone: null, code: null };
  requireDeclaredThickness(layers, start);
  const layer = layers[metalIndex] as FramedLayer;
  const { member, cavityConductivity } = splitMember(layer.sections);
  const restResistance = ip - framedLayerIsothermalResistance(layer.thickness, layer.sections);
  const distance = Math.max(depth(layers, start, metalIndex), depth(layers, metalIndex + 1, layers.length));
  const z = zoneMethod({
    restResistance,
    thickness: layer.thickness,
    memberConductivity: member.conductivity,
    memberFraction: member.fraction,
    cavityConductivity,
    flangeWidth: layer.flangeWidth!,
    spacing: layer.spacing!,
    distance,
  });
  const code = energyCodePath(layers, start, metalIndex, cavityConductivity, heatFlow, seriesR - Rsi - Rse);
  return {
    pp,
    ip,
    zone: { ...z, distance },
    code: { R: code.step?.value ?? Number.NaN, info: code.info, step: code.step },
  };
}

/** a·u + b·w for every method (ISO 6946:2017 §6.9.3); the zone geometry and table row stay u's. */
function blendMethods(u: MethodValues, w: MethodValues, a: number, b: number): MethodValues {
  const mix = (x: number, y: number) => a * x + b * y;
  return {
    pp: mix(u.pp, w.pp),
    ip: mix(u.ip, w.ip),
    zone: u.zone && w.zone ? { ...u.zone, R: mix(u.zone.R, w.zone.R) } : null,
    code:
      u.code?.step && w.code?.step
        ? { ...u.code, R: mix(u.code.R, w.code.R) }
        : u.code
          ? { ...u.code, step: null }
          : null,
  };
}

/** Clear-field and effective thermal performance of a wall; `input` is already parsed by thermalInputSchema. */
export function calculateThermal(input: ThermalInput): ThermalResult {
  const { layers, heatFlow, bridges } = input;
  if (layers.length === 0) throw new CalcInputError('layers', 'needs at least one layer');
  for (let i = 0; i < layers.length; i++) validateLayer(layers[i]!, i);
  const trace: TraceStep[] = [];
  const warnings: ThermalWarning[] = [];

  const start = firstKeptLayer(layers);
  if (start === layers.length)
    throw new CalcInputError(`layers.${start - 1}`, 'no layer is left inside the well-ventilated air layer');
  const table = surfaceResistances(heatFlow);
  const Rsi = table.Rsi;
  const Rse = start > 0 ? Rsi : table.Rse;
  trace.push(
    step(
      'thermal.Rsi',
      'Internal surface resistance Rsi',
      'Rsi by heat-flow direction',
      SRC_SURFACE,
      {},
      Rsi,
      RK,
    ),
    step(
      'thermal.Rse',
      'External surface resistance Rse',
      start > 0 ? 'Rse = Rsi (well-ventilated air layer)' : 'Rse from Table 7',
      start > 0 ? 'ISO 6946:2017 §6.9.4' : SRC_SURFACE,
      {},
      Rse,
      RK,
      start > 0
        ? `Layers 0–${start - 1} lie outside a well-ventilated air layer and are disregarded`
        : undefined,
    ),
  );

  let seriesR = Rsi + Rse;
  const framed: FramedLayer[] = [];
  /** R of each kept unbridged layer by index (for the well-ventilated configuration of §6.9.3). */
  const layerR = new Map<number, number>();
  let metalIndex = -1;
  let paths = 1;
  const vent = slightVentilation(layers, start);
  for (let i = start; i < layers.length; i++) {
    const layer = layers[i]!;
    let t: TraceStep;
    if (layer.kind === 'framed') {
      framed.push(layer);
      paths *= layer.sections.length;
      if (paths > MAX_PARALLEL_PATHS)
        throw new CalcInputError(
          `layers.${i}.sections`,
          `the framed layers combine into ${paths} or more heat-flow paths (sections of one framed layer × sections of the next …); the parallel-path method is limited to ${MAX_PARALLEL_PATHS} — merge framed layers or sections`,
        );
      if (layer.metal) {
        if (metalIndex >= 0)
          throw new CalcInputError(
            `layers.${i}.metal`,
            'the zone method handles one metal-framed layer; enter the second metal member as a linear bridge (ψ)',
          );
        metalIndex = i;
      }
      t = step(
        `thermal.layer.${i}.R`,
        `${layer.name}: bridged layer, sections in parallel`,
        '1/R_j = Σ f_q/R_qj',
        SRC_ISO_LIMITS,
        { d: v(layer.thickness, M), sections: v(layer.sections.length, ONE) },
        framedLayerIsothermalResistance(layer.thickness, layer.sections),
        RK,
      );
    } else {
      t = traceLayer(layer, i, heatFlow);
      seriesR += t.value;
      layerR.set(i, t.value);
    }
    trace.push(t);
  }
  if (vent && metalIndex >= 0 && metalIndex < vent.index)
    throw new CalcInputError(
      `layers.${vent.index}.ventilation`,
      'a slightly ventilated air layer inside the metal framing is not covered: ISO 6946 §6.9.3 blends the wall with and without the layers outside it, and the framing would be one of them',
    );

  const u = methodValues(layers, heatFlow, start, Rsi, Rse, seriesR, framed, metalIndex);
  let m = u;
  if (vent) {
    // ISO 6946:2017 §6.9.3: R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v, R_T,v with the layers
    // outside the air layer disregarded and Rse = Rsi (§6.9.4).
    let seriesV = 2 * Rsi;
    for (const [i, R] of layerR) if (i > vent.index) seriesV += R;
    const framedV = framed.filter((l) => layers.indexOf(l) > vent.index);
    const w = methodValues(layers, heatFlow, vent.index + 1, Rsi, Rsi, seriesV, framedV, metalIndex);
    m = blendMethods(u, w, vent.a, vent.b);
    trace.push(
      step(
        'thermal.slightVentilation',
        `${layers[vent.index]!.name}: slightly ventilated air layer`,
        'R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v, for every method',
        SRC_AIR_SLIGHT,
        {
          A_v: v(vent.ventArea, vent.unit),
          'R_T,u (isothermal planes)': v(u.ip, RK),
          'R_T,v (isothermal planes)': v(w.ip, RK),
        },
        m.ip,
        RK,
        'R_T,u with the air layer unventilated; R_T,v with it and the layers outside disregarded and Rse = Rsi. Each method below is blended the same way.',
      ),
    );
  }
  const { pp, ip } = m;
  const blended = vent ? ' (blended for the slightly ventilated air layer, §6.9.3)' : '';
  const pathMethods = [
    ['parallelPath', 'parallel-path', '1/R_T = Σ f_m/R_T,m over every path', SRC_PARALLEL, pp],
    [
      'isothermalPlanes',
      'isothermal-planes',
      'R_T = Rsi + ΣR_j + Rse, bridged layers 1/R_j = Σ f_q/R_qj',
      SRC_ISOTHERMAL,
      ip,
    ],
  ] as const;
  for (const [key, method, formula, source, value] of pathMethods)
    trace.push(
      step(
        `thermal.R.${key}`,
        `Total resistance, ${method} method`,
        formula,
        source,
        { 'Rsi + ΣR_unbridged + Rse': v(seriesR, RK) },
        value,
        RK,
        vent ? `Value${blended}` : undefined,
      ),
    );

  let isoUpper: number | null = null;
  let isoLower: number | null = null;
  let isoCombined: number | null = null;
  let isoError: number | null = null;
  let zone: number | null = null;
  let energyCodeR: number | null = null;
  let energyCode: ThermalResult['energyCode'] = null;
  const offeredMethods: MethodName[] = ['parallelPath', 'isothermalPlanes'];
  const byMethod: Partial<Record<MethodName, number>> = { parallelPath: pp, isothermalPlanes: ip };

  if (metalIndex >= 0) {
    const layer = layers[metalIndex] as FramedLayer;
    const z = u.zone!;
    zone = m.zone!.R;
    offeredMethods.push('zone');
    byMethod.zone = zone;
    trace.push(
      step(
        'thermal.R.zone',
        `Total resistance, zone method (${layer.name})`,
        'W = m + 2d; 1/R_T = (W/s)/R_A + (1 − W/s)/R_B',
        SRC_ZONE,
        {
          m: v(layer.flangeWidth!, M),
          d: v(Math.max(z.distance, ZONE_MIN_DISTANCE), M),
          W: v(z.zoneWidth, M),
          s: v(layer.spacing!, M),
          R_A: v(z.RA, RK),
          R_B: v(z.RB, RK),
        },
        zone,
        RK,
        `d is the distance from the flange to the surface on the deeper side — every layer between them, declared-R layers by their thickness — at least 0.5 in; the member is the section with the highest λ${blended}`,
      ),
    );
    energyCode = u.code!.info;
    if (u.code?.step && m.code) {
      energyCodeR = m.code.R;
      offeredMethods.push('energyCode');
      byMethod.energyCode = energyCodeR;
      trace.push({ ...u.code.step, value: energyCodeR, note: `${u.code.step.note ?? ''}${blended}` });
    }
  } else {
    const c = iso6946Combined(pp, ip);
    isoUpper = pp;
    isoLower = ip;
    isoCombined = c.R;
    isoError = c.error;
    offeredMethods.push('isoCombined');
    byMethod.isoCombined = c.R;
    trace.push(
      step(
        'thermal.R.isoUpper',
        'Upper limit of total resistance R′T',
        '1/R′T = Σ f_j/R_Tj',
        SRC_ISO_LIMITS,
        {},
        pp,
        RK,
      ),
      step(
        'thermal.R.isoLower',
        'Lower limit of total resistance R″T',
        'R″T = Rsi + ΣR_j + Rse',
        SRC_ISO_LIMITS,
        {},
        ip,
        RK,
      ),
      step(
        'thermal.R.isoCombined',
        'Total resistance, ISO 6946 combined method',
        'R_T = (R′T + R″T)/2',
        SRC_ISO_LIMITS,
        { 'R′T': v(pp, RK), 'R″T': v(ip, RK) },
        c.R,
        RK,
      ),
      step(
        'thermal.isoError',
        'Maximum relative error of the combined method',
        'e = (R′T − R″T)/(2R_T)',
        SRC_ISO_LIMITS,
        { 'R′T': v(pp, RK), 'R″T': v(ip, RK), R_T: v(c.R, RK) },
        c.error,
        ONE,
        c.ratio > ISO_LIMIT_RATIO_MAX ? 'R′T/R″T exceeds 1.5: outside the method’s limit' : undefined,
      ),
    );
    if (c.ratio > ISO_LIMIT_RATIO_MAX)
      warnings.push(
        engineMessage('combined_method_limit', '', { ratio: c.ratio, limit: ISO_LIMIT_RATIO_MAX }),
      );
  }

  const { method: defaultMethod, basis } = decidingMethod(
    byMethod,
    offeredMethods,
    metalIndex >= 0,
    energyCode,
    framed.length > 0,
  );
  const R0 = byMethod[defaultMethod]!;
  const offered = offeredMethods.map((m) => byMethod[m]!);
  const mean = offered.reduce((a, b) => a + b, 0) / offered.length;
  const methodSpread = (Math.max(...offered) - Math.min(...offered)) / mean;
  const U0 = 1 / R0;
  trace.push(
    step(
      'thermal.R0',
      'Clear-field total resistance R₀',
      `R₀ = R_T by the ${METHOD_LABELS[defaultMethod]}`,
      defaultMethod === 'energyCode' ? SRC_ENERGY_CODE : metalIndex >= 0 ? SRC_SCOPE_ZONE : SRC_ISO_LIMITS,
      {},
      R0,
      RK,
      metalIndex >= 0 ? `${basis.text} ${NOTE_METAL_SCOPE}.` : basis.text,
    ),
    step(
      'thermal.U0',
      'Clear-field thermal transmittance U₀',
      'U₀ = 1/R₀',
      SRC_U,
      { 'R₀': v(R0, RK) },
      U0,
      UK,
    ),
  );

  let Ueff = U0;
  const bridgeResults: BridgeResult[] = [];
  for (let j = 0; j < bridges.length; j++) {
    const b = bridges[j]!;
    const r = bridgeDeltaU(b, j, layers, start, R0);
    trace.push(r.trace);
    Ueff += r.deltaU;
    bridgeResults.push({ name: b.name, kind: b.kind, deltaU: r.deltaU, share: 0 });
  }
  let sharesSum = U0 / Ueff;
  for (const b of bridgeResults) {
    b.share = b.deltaU / Ueff;
    sharesSum += b.share;
  }
  const Reff = 1 / Ueff;
  trace.push(
    step(
      'thermal.Ueff',
      'Effective thermal transmittance',
      'U_eff = U₀ + ΣΔU',
      SRC_BRIDGE,
      { 'U₀': v(U0, UK) },
      Ueff,
      UK,
    ),
    step(
      'thermal.Reff',
      'Effective total resistance',
      'R_eff = 1/U_eff',
      SRC_U,
      { U_eff: v(Ueff, UK) },
      Reff,
      RK,
    ),
    step(
      'thermal.sharesSum',
      'Check: clear-field and bridge shares of U_eff',
      'U₀/U_eff + Σ ΔU/U_eff = 1',
      SRC_BRIDGE,
      {},
      sharesSum,
      ONE,
    ),
  );

  return {
    R0,
    U0,
    Ueff,
    Reff,
    ip: { R0: R0 / R_IP_TO_SI, Reff: Reff / R_IP_TO_SI, U0: U0 / U_IP_TO_SI, Ueff: Ueff / U_IP_TO_SI },
    Rsi,
    Rse,
    methods: {
      parallelPath: pp,
      isothermalPlanes: ip,
      isoUpper,
      isoLower,
      isoCombined,
      isoError,
      zone,
      energyCode: energyCodeR,
    },
    energyCode,
    basis,
    offeredMethods,
    defaultMethod,
    methodSpread,
    bridges: bridgeResults,
    clearFieldShare: U0 / Ueff,
    sharesSum,
    trace,
    warnings,
  };
}
