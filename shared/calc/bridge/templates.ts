import type { z } from 'zod';
import { CalcInputError } from '../errors';
import type { Layer } from '../thermal/schema';
import {
  airLayerResistance,
  firstKeptLayer,
  framedLayerIsothermalResistance,
  surfaceResistances,
} from '../thermal/thermal';
import { bridgeGrid, DEFAULT_MAX_CELLS } from './bridge';
import { EDGE_TOLERANCE } from './grid';
import { type BridgeBox, type BridgeModelInput, bridgeModelSchema } from './schema';
import {
  type ClipTemplate,
  clipTemplateSchema,
  type FastenerTemplate,
  fastenerTemplateSchema,
  type GirtTemplate,
  girtTemplateSchema,
  TEMPLATE_MESH_3D,
  type TemplateLayer,
  type wallSchema,
} from './template-schema';

export type { ClipTemplate, FastenerTemplate, GirtTemplate, TemplateLayer };

/*
 * Parametric details built from an assembly's own layers (outside → inside): a continuous girt through some
 * of them (2-D → ψ per metre) and an intermittent clip through them (3-D → χ per clip). Each gives a bridge
 * model whose reference is the same wall without the metal, U = 1 / (Rse + Σ d/λ + Rsi) (ISO 6946:2017 eq. 7).
 */

export type Box = { name: string; lambda: number; min: number[]; max: number[] };

/**
 * The parts of `box` outside every hole: the box cut along every hole edge inside it, keeping the pieces
 * whose centre lies in no hole (so that boxes of different λ never overlap).
 */
export function carve(box: Box, holes: { min: number[]; max: number[] }[]): Box[] {
  const axes = box.min.map((lo, a) => {
    const cuts = new Set([lo, box.max[a]!]);
    for (const h of holes)
      for (const v of [h.min[a]!, h.max[a]!])
        if (v > lo + EDGE_TOLERANCE && v < box.max[a]! - EDGE_TOLERANCE) cuts.add(v);
    return [...cuts].sort((x, y) => x - y);
  });
  let pieces: { min: number[]; max: number[] }[] = [{ min: [], max: [] }];
  for (const cuts of axes)
    pieces = pieces.flatMap((p) =>
      cuts.slice(1).map((hi, i) => ({ min: [...p.min, cuts[i]!], max: [...p.max, hi] })),
    );
  const inside = (c: number[], h: { min: number[]; max: number[] }) =>
    c.every((v, a) => v > h.min[a]! && v < h.max[a]!);
  return pieces
    .filter(
      (p) =>
        !holes.some((h) =>
          inside(
            p.min.map((v, a) => (v + p.max[a]!) / 2),
            h,
          ),
        ),
    )
    .map((p) => ({ ...box, ...p }));
}

/** Depth of each layer's outside face from the wall's outside face, then the wall's depth. */
export function layerFaces(layers: { thickness: number }[]): number[] {
  const y: number[] = [0];
  for (const l of layers) y.push(y[y.length - 1]! + l.thickness);
  return y;
}

/** Depth positions of the layers: y of each layer's outside face, and the total. */
function stackOf(input: z.infer<typeof wallSchema>) {
  const { layers, crosses } = input;
  if (crosses.to >= layers.length)
    throw new CalcInputError(
      'crosses.to',
      `there are ${layers.length} layers (indices 0–${layers.length - 1})`,
    );
  if (crosses.from > crosses.to) throw new CalcInputError('crosses.from', 'must not come after crosses.to');
  const y = layerFaces(layers);
  return { y, y0: y[crosses.from]!, y1: y[crosses.to + 1]!, depth: y[layers.length]! };
}

/** U of the wall without the metal: 1 / (Rse + Σ d/λ + Rsi) (ISO 6946:2017 eq. 7). */
export const clearU = (input: Pick<z.infer<typeof wallSchema>, 'layers' | 'rse' | 'rsi'>) =>
  1 / (input.rse + input.layers.reduce((s, l) => s + l.thickness / l.lambda, 0) + input.rsi);

export const refuseAbove = (value: number, max: number, field: string, what: string) => {
  if (value > max - EDGE_TOLERANCE)
    throw new CalcInputError(field, `${what} (${value} m) must be less than ${max} m`);
};

/**
 * A continuous Z or C girt at mid-span of a 2-D strip one spacing wide (its edges half-way to the next girts:
 * symmetry planes, ISO 10211:2017 §5.2.2) → ψ of the girt, W/(m·K), against the clear wall.
 */
export function girtModel(raw: GirtTemplate): BridgeModelInput {
  const input = girtTemplateSchema.parse(raw);
  const { y, y0, y1, depth } = stackOf(input);
  const { spacing: s, thickness: t, outerFlange: bo, innerFlange: bi } = input;
  refuseAbove(2 * t, y1 - y0, 'thickness', 'twice the steel thickness');
  refuseAbove(bo, s / 2, 'outerFlange', 'the outer flange');
  refuseAbove(bi, s / 2, 'innerFlange', 'the inner flange');
  const x = s / 2;
  const innerFrom = input.profile === 'z' ? x + t - bi : x;
  const steel: Box[] = [
    { name: 'girt, outer flange', lambda: input.metalLambda, min: [x, y0], max: [x + bo, y0 + t] },
    { name: 'girt, web', lambda: input.metalLambda, min: [x, y0 + t], max: [x + t, y1 - t] },
    {
      name: 'girt, inner flange',
      lambda: input.metalLambda,
      min: [innerFrom, y1 - t],
      max: [innerFrom + bi, y1],
    },
  ];
  const layers = input.layers.flatMap((l, i) =>
    carve({ name: l.name, lambda: l.lambda, min: [0, y[i]!], max: [s, y[i + 1]!] }, steel),
  );
  return {
    dimension: '2d',
    boxes: [...steel, ...layers] as BridgeBox[],
    boundaries: [
      { name: 'outside', side: 'outside', temperature: 0, resistance: input.rse, min: [0, 0], max: [s, 0] },
      {
        name: 'inside',
        side: 'inside',
        temperature: 20,
        resistance: input.rsi,
        min: [0, depth],
        max: [s, depth],
      },
    ],
    reference: { elements: [{ name: 'wall without the girt', u: clearU(input), size: s }] },
    mesh: input.mesh,
  };
}

/** Edge cells the default 3-D mesh coarsens to, m, when a wall of many layers would exceed the cell budget. */
const COARSER_EDGE_CELLS = [0.0005, 0.001, 0.002, 0.005];

/**
 * The default 3-D mesh unless its grid would exceed DEFAULT_MAX_CELLS: then the first coarser edge cell that
 * fits (a wall of many layers or a wide cell; each edge adds graded cells on every axis). A mesh the caller
 * chose (interfaceCell or growth given) is kept as given.
 */
function fitMesh(model: BridgeModelInput, asked: { interfaceCell?: number; growth?: number } | undefined) {
  if (asked?.interfaceCell !== undefined || asked?.growth !== undefined) return model;
  const cells = (interfaceCell: number) =>
    bridgeGrid(bridgeModelSchema.parse({ ...model, mesh: { ...model.mesh, interfaceCell, subdivide: 1 } }))
      .cells;
  if (cells(TEMPLATE_MESH_3D.interfaceCell) <= DEFAULT_MAX_CELLS) return model;
  const edge = COARSER_EDGE_CELLS.find((c) => cells(c) <= DEFAULT_MAX_CELLS) ?? COARSER_EDGE_CELLS.at(-1)!;
  return { ...model, mesh: { ...model.mesh, interfaceCell: edge } };
}

/**
 * A 3-D cell sx × sz of the wall (its faces half-way to the next bridges: symmetry planes, ISO 10211:2017
 * §5.2.2) with `parts` through it, the layers carved around them, outside 0 °C at y = 0, inside 20 °C at the
 * last layer's face; the reference is the same cell without the parts.
 */
function cellModel3d(
  input: z.infer<typeof wallSchema>,
  sx: number,
  sz: number,
  parts: Box[],
  without: string,
): BridgeModelInput {
  const { y, depth } = stackOf(input);
  const layers = input.layers.flatMap((l, i) =>
    carve({ name: l.name, lambda: l.lambda, min: [0, y[i]!, 0], max: [sx, y[i + 1]!, sz] }, parts),
  );
  const face = (side: 'inside' | 'outside', at: number, rs: number) => ({
    name: side,
    side,
    temperature: side === 'inside' ? 20 : 0,
    resistance: rs,
    min: [0, at, 0],
    max: [sx, at, sz],
  });
  return {
    dimension: '3d',
    boxes: [...parts, ...layers] as BridgeBox[],
    boundaries: [face('outside', 0, input.rse), face('inside', depth, input.rsi)],
    reference: { elements: [{ name: without, u: clearU(input), size: sx * sz }], lines: [] },
    mesh: input.mesh,
  };
}

/**
 * One clip in a 3-D cell of the clip grid (spacingX × spacingZ, its faces half-way to the next clips:
 * symmetry planes): a plate `width` wide and `thickness` thick through the crossed layers, with an optional
 * thermal break pad at its inside end → χ per clip, W/K, against the clear wall.
 */
export function clipModel(raw: ClipTemplate): BridgeModelInput {
  const input = clipTemplateSchema.parse(raw);
  const { y0, y1 } = stackOf(input);
  const { spacingX: sx, spacingZ: sz, width: w, thickness: t, pad } = input;
  refuseAbove(w, sx, 'width', 'the clip width');
  refuseAbove(t, sz, 'thickness', 'the clip thickness');
  if (pad)
    refuseAbove(pad.thickness, y1 - y0, 'pad.thickness', 'the pad, longer than the layers the clip crosses,');
  const [xa, za] = [(sx - w) / 2, (sz - t) / 2];
  const plateEnd = pad ? y1 - pad.thickness : y1;
  const parts: Box[] = [
    { name: 'clip', lambda: input.metalLambda, min: [xa, y0, za], max: [xa + w, plateEnd, za + t] },
  ];
  if (pad)
    parts.push({
      name: 'thermal break pad',
      lambda: pad.lambda,
      min: [xa, plateEnd, za],
      max: [xa + w, y1, za + t],
    });
  return fitMesh(cellModel3d(input, sx, sz, parts, 'wall without the clip'), raw.mesh);
}

/**
 * A fastener (screw, anchor) in a 3-D cell of the fastener grid: a shank of `diameter` through the crossed
 * layers, its head `recess` below their outside face → χ per fastener, W/K, against the clear wall. The round
 * shank is a square of the same area (side d·√π/2): the boxes are axis-aligned.
 */
export function fastenerModel(raw: FastenerTemplate): BridgeModelInput {
  const input = fastenerTemplateSchema.parse(raw);
  const { y0, y1 } = stackOf(input);
  const { spacingX: sx, spacingZ: sz, diameter: d, recess } = input;
  const side = (d * Math.sqrt(Math.PI)) / 2;
  refuseAbove(side, Math.min(sx, sz), 'diameter', 'the fastener, as a square of its area,');
  refuseAbove(recess, y1 - y0, 'recess', 'the recess, as deep as the layers the fastener crosses,');
  const [xa, za] = [(sx - side) / 2, (sz - side) / 2];
  const shank: Box = {
    name: 'fastener',
    lambda: input.metalLambda,
    min: [xa, y0 + recess, za],
    max: [xa + side, y1, za + side],
  };
  return fitMesh(cellModel3d(input, sx, sz, [shank], 'wall without the fastener'), raw.mesh);
}

/**
 * The layers that count (outside → inside; those outside a well-ventilated air layer dropped, ISO 6946:2017
 * §6.9.4) as boxes of λ = d / R: an air layer's R from ISO 6946 (slightly ventilated: unventilated R), a framed
 * layer's isothermal-planes R, a declared R over its thickness (1 mm when none is given). `rse` is Rsi when a
 * ventilated layer was dropped (§6.9.4: the still-air resistance on both faces).
 */
export function templateWall(
  layers: readonly Layer[],
  heatFlow: 'horizontal' | 'upward' | 'downward' = 'horizontal',
): { layers: TemplateLayer[]; rsi: number; rse: number; indices: number[] } {
  const { Rsi, Rse } = surfaceResistances(heatFlow);
  const start = firstKeptLayer(layers);
  const out: TemplateLayer[] = [];
  const indices: number[] = [];
  layers.forEach((l, i) => {
    if (i < start) return;
    const d = l.thickness ?? 0.001;
    const r =
      l.kind === 'homogeneous'
        ? d / l.conductivity
        : l.kind === 'resistance'
          ? l.resistance
          : l.kind === 'air'
            ? airLayerResistance(d, heatFlow, l.ventilation, l.emissivityFactor)
            : framedLayerIsothermalResistance(d, l.sections);
    if (!(d > 0) || !(r > 0)) return;
    out.push({ name: l.name || `layer ${i + 1}`, thickness: d, lambda: d / r });
    indices.push(i);
  });
  return { layers: out, rsi: Rsi, rse: start > 0 ? Rsi : Rse, indices };
}
