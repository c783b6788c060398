import type { BridgeDetailInput } from '@shared/calc/bridge/computed';
import { detailModel } from '@shared/calc/bridge/detail';
import type { BridgeModelInput } from '@shared/calc/bridge/schema';
import { type TemplateLayer, templateWall } from '@shared/calc/bridge/templates';
import { findMaterial, materials } from '@shared/calc/thermal/materials';
import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { isInsulation } from '@shared/sheets/layer-class';

/*
 * From a bridge on the build-up page to a solver template and back: the assembly's layers as template layers,
 * the inputs a "Solve" dialog starts from, the section a temperature map draws, and the source text of a
 * computed χ or ψ. SI throughout.
 */

/** The metals a clip may be made of: the generic library's (ISO 10456:2007 Table 3). */
export const CLIP_METALS = materials.filter((m) => m.category === 'metal');

/** Generic design values a dialog starts from when the assembly does not say (the person replaces them). */
export const GENERIC = {
  /** A light cold-formed girt: 1.5 mm steel, 50 mm flanges. */
  girt: { thickness: 0.0015, flange: 0.05 },
  /** A bent-plate clip: 3 mm thick, 75 mm wide. */
  clip: { thickness: 0.003, width: 0.075 },
  /** A polyamide pad, λ 0.25 W/(m·K) (ISO 10456:2007 Table 3, polyamide), 5 mm thick. */
  pad: { thickness: 0.005, lambda: 0.25 },
  /** A 200 mm reinforced concrete slab (ISO 10456:2007 Table 3, λ 2.3 W/(m·K)). */
  slab: { thickness: 0.2, lambda: findMaterial('concrete-reinforced')?.conductivity ?? 2.3 },
  /** A 60 mm wide, 70 mm deep softwood frame (ISO 10456:2007 Table 3, λ 0.13 W/(m·K)), 50 mm in. */
  frame: { width: 0.06, depth: 0.07, offset: 0.05, lambda: findMaterial('softwood')?.conductivity ?? 0.13 },
} as const;

/** Spacing of a linear bridge, m: its own, or 1 / (length per area). */
const linearSpacing = (b: Extract<Bridge, { kind: 'linear' }>) =>
  'spacing' in b ? b.spacing : 1 / b.lengthPerArea;

/** Spacings of a point bridge, m: its own, or a square grid of the same count per area. */
const pointSpacings = (b: Extract<Bridge, { kind: 'point' }>) =>
  'spacingHorizontal' in b
    ? [b.spacingHorizontal, b.spacingVertical]
    : [Math.sqrt(1 / b.countPerArea), Math.sqrt(1 / b.countPerArea)];

/** Index (in the template's layers) of the first insulation layer, else the thickest: what the metal crosses. */
function crossedLayer(layers: readonly Layer[], indices: number[], wall: TemplateLayer[]): number {
  const ins = indices.findIndex((i) => isInsulation(layers[i]!));
  if (ins >= 0) return ins;
  return wall.reduce((best, l, k) => (l.thickness > wall[best]!.thickness ? k : best), 0);
}

export interface GirtInputs {
  kind: 'girt';
  profile: 'z' | 'c';
  thickness: number;
  outerFlange: number;
  innerFlange: number;
  spacing: number;
  from: number;
  to: number;
}

export interface ClipInputs {
  kind: 'clip';
  width: number;
  thickness: number;
  spacingX: number;
  spacingZ: number;
  metalLambda: number;
  pad: { thickness: number; lambda: number } | null;
  from: number;
  to: number;
}

export interface FastenerInputs {
  kind: 'fastener';
  diameter: number;
  metalLambda: number;
  /** Depth of the head below the outside face of the crossed layers, m. */
  recess: number;
  spacingX: number;
  spacingZ: number;
  from: number;
  to: number;
}

/** A floor slab meeting the wall: it replaces the layers from `from` inwards. */
export interface SlabInputs {
  kind: 'slab';
  from: number;
  thickness: number;
  lambda: number;
}

export interface CornerInputs {
  kind: 'corner';
}

/** A window or door frame at the opening's edge. */
export interface OpeningInputs {
  kind: 'opening';
  width: number;
  depth: number;
  offset: number;
  lambda: number;
}

export type EdgeInputs = SlabInputs | CornerInputs | OpeningInputs;
export type SolveInputs = GirtInputs | ClipInputs | FastenerInputs | EdgeInputs;
/** The details a linear bridge may be: a girt or rail, or one of the wall's edges. */
export type LinearDetail = 'girt' | EdgeInputs['kind'];
export const LINEAR_DETAILS: { kind: LinearDetail; label: string }[] = [
  { kind: 'girt', label: 'Girt or rail' },
  { kind: 'slab', label: 'Floor slab edge' },
  { kind: 'corner', label: 'Outside corner' },
  { kind: 'opening', label: 'Window or door perimeter' },
];

/** A thermally broken clip, by its name: start with a pad. */
const BROKEN = /therm\w*\s+(break|broken)/i;

/** The detail a linear bridge is, by its name (a girt unless it names an edge). */
export function linearDetailOf(name: string): LinearDetail {
  if (/slab|floor|base|sill plate|foundation/i.test(name)) return 'slab';
  if (/corner/i.test(name)) return 'corner';
  if (/window|door|opening|perimeter|reveal|jamb|head|sill/i.test(name)) return 'opening';
  return 'girt';
}

/** The inputs of a linear bridge's detail: the girt at the bridge's spacing, an edge with generic sizes. */
export function linearInputs(
  detail: LinearDetail,
  bridge: Extract<Bridge, { kind: 'linear' }>,
  layers: readonly Layer[],
): SolveInputs {
  const wall = templateWall(layers);
  const k = Math.max(crossedLayer(layers, wall.indices, wall.layers), 0);
  if (detail === 'slab')
    return { kind: 'slab', from: Math.min(k + 1, wall.layers.length - 1), ...GENERIC.slab };
  if (detail === 'corner') return { kind: 'corner' };
  if (detail === 'opening') return { kind: 'opening', ...GENERIC.frame };
  return {
    kind: 'girt',
    profile: 'z',
    thickness: GENERIC.girt.thickness,
    outerFlange: GENERIC.girt.flange,
    innerFlange: GENERIC.girt.flange,
    spacing: linearSpacing(bridge),
    from: k,
    to: k,
  };
}

/** The inputs a dialog starts from: spacings from the bridge, the metal through the first insulation layer. */
export function initialInputs(bridge: Bridge, layers: readonly Layer[]): SolveInputs {
  const wall = templateWall(layers);
  const k = Math.max(crossedLayer(layers, wall.indices, wall.layers), 0);
  if (bridge.kind === 'linear') return linearInputs(linearDetailOf(bridge.name), bridge, layers);
  if (bridge.kind === 'fastener') {
    const at = wall.indices.indexOf(bridge.layerIndex);
    const s = Math.sqrt(1 / bridge.countPerArea);
    return {
      kind: 'fastener',
      diameter: bridge.diameter,
      metalLambda: bridge.conductivity,
      recess: bridge.penetration === 'recessed' ? (bridge.recessDepth ?? 0) : 0,
      spacingX: s,
      spacingZ: s,
      from: at >= 0 ? at : k,
      to: at >= 0 ? at : k,
    };
  }
  const [sx, sz] = pointSpacings(bridge);
  return {
    kind: 'clip',
    width: GENERIC.clip.width,
    thickness: GENERIC.clip.thickness,
    spacingX: sx!,
    spacingZ: sz!,
    metalLambda: CLIP_METALS[0]?.conductivity ?? 50,
    pad: BROKEN.test(bridge.name) ? { ...GENERIC.pad } : null,
    from: k,
    to: k,
  };
}

/** Depth of the layers the metal crosses, m: the girt's depth or the clip's length. */
export const crossedDepth = (wall: TemplateLayer[], from: number, to: number) =>
  wall.slice(from, to + 1).reduce((s, l) => s + l.thickness, 0);

/** The detail of the inputs on this assembly's layers: a template and its inputs (stored with a computed value). */
export function detailOf(inputs: SolveInputs, layers: readonly Layer[]): BridgeDetailInput {
  const { layers: wall, rsi, rse } = templateWall(layers);
  const edge = { layers: wall, rsi, rse };
  if (inputs.kind === 'slab') {
    const { from, thickness, lambda } = inputs;
    return { template: 'edge', input: { ...edge, kind: 'slab', slab: { from, thickness, lambda } } };
  }
  if (inputs.kind === 'corner') return { template: 'edge', input: { ...edge, kind: 'corner' } };
  if (inputs.kind === 'opening') {
    const { width, depth, offset, lambda } = inputs;
    return { template: 'edge', input: { ...edge, kind: 'opening', frame: { width, depth, offset, lambda } } };
  }
  const base = { ...edge, crosses: { from: inputs.from, to: inputs.to } };
  if (inputs.kind === 'girt') {
    const { profile, thickness, outerFlange, innerFlange, spacing } = inputs;
    return { template: 'girt', input: { ...base, profile, thickness, outerFlange, innerFlange, spacing } };
  }
  if (inputs.kind === 'fastener') {
    const { metalLambda, diameter, recess, spacingX, spacingZ } = inputs;
    return { template: 'fastener', input: { ...base, metalLambda, diameter, recess, spacingX, spacingZ } };
  }
  const { metalLambda, width, thickness, spacingX, spacingZ, pad } = inputs;
  return {
    template: 'clip',
    input: { ...base, metalLambda, width, thickness, spacingX, spacingZ, ...(pad ? { pad } : {}) },
  };
}

/** The solver model of the inputs (throws `CalcInputError` naming the template field for impossible ones). */
export const solveModel = (inputs: SolveInputs, layers: readonly Layer[]): BridgeModelInput => ({
  ...detailModel(detailOf(inputs, layers)),
  field: true,
});

/** χ (3-D: clip, fastener) or ψ (2-D: girt, edges) — what the inputs' detail gives. */
export const solvesFor = (inputs: SolveInputs): 'chi' | 'psi' =>
  inputs.kind === 'clip' || inputs.kind === 'fastener' ? 'chi' : 'psi';

/**
 * χ per fastener by ISO 6946:2017 Annex F as the engine applies it to the fastener row: ΔU_f / n_f (null when
 * the row does not compute) — the value the solved χ is compared with.
 */
export function annexFChi(bridge: Extract<Bridge, { kind: 'fastener' }>, layers: Layer[]): number | null {
  try {
    const r = calculateThermal({ layers, heatFlow: 'horizontal', bridges: [bridge] });
    const dU = r.bridges[0]?.deltaU;
    return dU === undefined ? null : dU / bridge.countPerArea;
  } catch {
    return null;
  }
}

/** What is kept with a computed χ or ψ, as its source. */
export const computedSourceText = (engineVersion: string, cells: number, date: Date) =>
  `computed by Skinwright ${engineVersion}, mesh ${cells.toLocaleString('en-GB')} cells, ${date
    .toISOString()
    .slice(0, 10)}`;
