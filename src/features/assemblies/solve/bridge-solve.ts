import type { BridgeModelInput, BridgeResult } from '@shared/calc/bridge/schema';
import {
  type ClipTemplate,
  clipModel,
  type GirtTemplate,
  girtModel,
  type TemplateLayer,
  templateWall,
} from '@shared/calc/bridge/templates';
import { materials } from '@shared/calc/thermal/materials';
import type { Bridge, Layer } from '@shared/calc/thermal/schema';
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

export type SolveInputs = GirtInputs | ClipInputs;

/** A thermally broken clip, by its name: start with a pad. */
const BROKEN = /therm\w*\s+(break|broken)/i;

/** The inputs a dialog starts from: spacings from the bridge, the metal through the first insulation layer. */
export function initialInputs(bridge: Bridge, layers: readonly Layer[]): SolveInputs {
  const wall = templateWall(layers);
  const k = Math.max(crossedLayer(layers, wall.indices, wall.layers), 0);
  if (bridge.kind === 'point') {
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
  return {
    kind: 'girt',
    profile: 'z',
    thickness: GENERIC.girt.thickness,
    outerFlange: GENERIC.girt.flange,
    innerFlange: GENERIC.girt.flange,
    spacing: bridge.kind === 'linear' ? linearSpacing(bridge) : 1,
    from: k,
    to: k,
  };
}

/** Depth of the layers the metal crosses, m: the girt's depth or the clip's length. */
export const crossedDepth = (wall: TemplateLayer[], from: number, to: number) =>
  wall.slice(from, to + 1).reduce((s, l) => s + l.thickness, 0);

/** The solver model of the inputs (throws `CalcInputError` naming the template field for impossible ones). */
export function solveModel(inputs: SolveInputs, layers: readonly Layer[]): BridgeModelInput {
  const { layers: wall, rsi, rse } = templateWall(layers);
  const base = { layers: wall, rsi, rse, crosses: { from: inputs.from, to: inputs.to } };
  const model =
    inputs.kind === 'girt'
      ? girtModel({
          ...base,
          profile: inputs.profile,
          thickness: inputs.thickness,
          outerFlange: inputs.outerFlange,
          innerFlange: inputs.innerFlange,
          spacing: inputs.spacing,
        } satisfies GirtTemplate)
      : clipModel({
          ...base,
          metalLambda: inputs.metalLambda,
          width: inputs.width,
          thickness: inputs.thickness,
          spacingX: inputs.spacingX,
          spacingZ: inputs.spacingZ,
          ...(inputs.pad ? { pad: inputs.pad } : {}),
        } satisfies ClipTemplate);
  return { ...model, field: true };
}

/** A plane of the temperature field: cell edges along x and y, temperatures row by row (y outer, null = none). */
export interface Section {
  x: number[];
  y: number[];
  values: (number | null)[];
}

/**
 * The section a map draws: the 2-D field as it is; of a 3-D clip, the x–y plane through the middle of the cell
 * in z (the clip's mid-plane, where it is warmest outside and coldest inside).
 */
export function sectionOf(result: Pick<BridgeResult, 'grid' | 'field'>): Section | null {
  const { x, y, z } = result.grid;
  if (!result.field) return null;
  const nx = x.length - 1;
  const ny = y.length - 1;
  const mid = (z[0]! + z[z.length - 1]!) / 2;
  let k = 0;
  while (k < z.length - 2 && z[k + 1]! <= mid) k++;
  const start = k * nx * ny;
  return { x, y, values: result.field.slice(start, start + nx * ny) };
}

/** What is kept with a computed χ or ψ, as its source. */
export const computedSourceText = (engineVersion: string, cells: number, date: Date) =>
  `computed by Skinwright ${engineVersion}, mesh ${cells.toLocaleString('en-GB')} cells, ${date
    .toISOString()
    .slice(0, 10)}`;
