import type { z } from 'zod';
import { CalcInputError } from '../errors';
import { EDGE_TOLERANCE } from './grid';
import type { BridgeBox, BridgeModelInput } from './schema';
import { type EdgeTemplate, edgeTemplateSchema } from './template-schema';
import { type Box, carve, clearU, layerFaces, refuseAbove } from './templates';

export type { EdgeTemplate };

/*
 * Linear edges of a wall built from its layers (outside → inside), 2-D per metre of edge → ψ, W/(m·K), with
 * external dimensions (ISO 14683:2017 §5.3: lengths on the outside faces): a floor slab meeting the wall, an
 * outside corner, and a window or door frame in the opening. Flanking walls run `flank` (1 m, ISO 10211:2017
 * §5.2.2: at least 1 m from the central element) to an adiabatic cut-off. Every inside surface takes rsi.
 */

type Edge = z.infer<typeof edgeTemplateSchema>;

type Region = { name: string; side: 'inside' | 'outside'; min: number[]; max: number[] };
const boundary = (e: Edge, r: Region) => ({
  ...r,
  temperature: r.side === 'inside' ? 20 : 0,
  resistance: r.side === 'inside' ? e.rsi : e.rse,
});

function model(
  e: Edge,
  boxes: Box[],
  regions: Region[],
  elements: { name: string; u: number; size: number }[],
) {
  return {
    dimension: '2d',
    boxes: boxes as BridgeBox[],
    boundaries: regions.map((r) => boundary(e, r)),
    reference: { elements },
    mesh: e.mesh,
  } satisfies BridgeModelInput;
}

/**
 * A floor slab meeting the wall (x through the wall, outside face at 0; y up): the slab, `thickness` thick,
 * replaces the layers from `slab.from` inwards and runs `reach` into the building; the wall runs `flank`
 * above and below. Inside above and below at 20 °C; reference: the wall over its whole outside height.
 */
function slabModel(e: Extract<Edge, { kind: 'slab' }>): BridgeModelInput {
  const x = layerFaces(e.layers);
  const depth = x[e.layers.length]!;
  const { from, thickness: h, reach } = e.slab;
  if (from >= e.layers.length)
    throw new CalcInputError(
      'slab.from',
      `there are ${e.layers.length} layers (indices 0–${e.layers.length - 1})`,
    );
  const [bottom, top] = [-e.flank, h + e.flank];
  const slab: Box = {
    name: 'floor slab',
    lambda: e.slab.lambda,
    min: [x[from]!, 0],
    max: [depth + reach, h],
  };
  const layers = e.layers.flatMap((l, i) =>
    carve({ name: l.name, lambda: l.lambda, min: [x[i]!, bottom], max: [x[i + 1]!, top] }, [slab]),
  );
  return model(
    e,
    [slab, ...layers],
    [
      { name: 'outside', side: 'outside', min: [0, bottom], max: [0, top] },
      { name: 'inside, below the slab', side: 'inside', min: [depth, bottom], max: [depth + reach, 0] },
      { name: 'inside, above the slab', side: 'inside', min: [depth, h], max: [depth + reach, top] },
    ],
    [{ name: 'wall (outside height)', u: clearU(e), size: top - bottom }],
  );
}

/**
 * An outside corner of two equal walls (outside faces on x = 0 and y = 0, the building in x, y > depth):
 * each layer an L mitred at its corner; each wall `flank` long on its outside face.
 */
function cornerModel(e: Extract<Edge, { kind: 'corner' }>): BridgeModelInput {
  const d = layerFaces(e.layers);
  const depth = d[e.layers.length]!;
  const l = e.flank;
  refuseAbove(depth, l, 'flank', 'the wall depth, measured against the flanking length,');
  const layers = e.layers.flatMap((layer, i) => [
    { name: layer.name, lambda: layer.lambda, min: [d[i]!, d[i]!], max: [l, d[i + 1]!] },
    { name: layer.name, lambda: layer.lambda, min: [d[i]!, d[i + 1]!], max: [d[i + 1]!, l] },
  ]);
  const u = clearU(e);
  return model(
    e,
    layers,
    [
      { name: 'outside, wall 1', side: 'outside', min: [0, 0], max: [l, 0] },
      { name: 'outside, wall 2', side: 'outside', min: [0, 0], max: [0, l] },
      { name: 'inside, wall 1', side: 'inside', min: [depth, depth], max: [l, depth] },
      { name: 'inside, wall 2', side: 'inside', min: [depth, depth], max: [depth, l] },
    ],
    [
      { name: 'wall 1 (outside length)', u, size: l },
      { name: 'wall 2 (outside length)', u, size: l },
    ],
  );
}

/**
 * A window or door frame at the opening's edge (x along the wall, the reveal at x = flank; y through the
 * wall): a frame `width` wide and `depth` deep, its outside face `offset` behind the wall's, the reveal's
 * faces outside and inside the frame exposed; cut at the glazing. Reference: the wall to the reveal and the
 * frame as a 1-D element, U_f = 1 / (Rse + d_f/λ_f + Rsi).
 */
function openingModel(e: Extract<Edge, { kind: 'opening' }>): BridgeModelInput {
  const y = layerFaces(e.layers);
  const depth = y[e.layers.length]!;
  const { width: w, depth: fd, offset: p } = e.frame;
  if (p + fd > depth + EDGE_TOLERANCE)
    throw new CalcInputError(
      'frame.depth',
      `the frame's inside face (${p + fd} m behind the outside face) lies beyond the wall's depth ${depth} m`,
    );
  const l = e.flank;
  const layers = e.layers.map((layer, i) => ({
    name: layer.name,
    lambda: layer.lambda,
    min: [0, y[i]!],
    max: [l, y[i + 1]!],
  }));
  const frame: Box = { name: 'frame', lambda: e.frame.lambda, min: [l, p], max: [l + w, p + fd] };
  const uFrame = 1 / (e.rse + fd / e.frame.lambda + e.rsi);
  return model(
    e,
    [frame, ...layers],
    [
      { name: 'outside', side: 'outside', min: [0, 0], max: [l, 0] },
      { name: 'outside, reveal and frame', side: 'outside', min: [l, 0], max: [l + w, p] },
      { name: 'inside', side: 'inside', min: [0, depth], max: [l, depth] },
      { name: 'inside, reveal and frame', side: 'inside', min: [l, p + fd], max: [l + w, depth] },
    ],
    [
      { name: 'wall (to the reveal)', u: clearU(e), size: l },
      { name: 'frame (1-D)', u: uFrame, size: w },
    ],
  );
}

/** The model of a linear edge → ψ per metre of edge, W/(m·K), external dimensions. */
export function edgeModel(raw: EdgeTemplate): BridgeModelInput {
  const e = edgeTemplateSchema.parse(raw);
  if (e.kind === 'slab') return slabModel(e);
  if (e.kind === 'corner') return cornerModel(e);
  return openingModel(e);
}
