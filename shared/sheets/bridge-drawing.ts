import type { BridgeDetailInput } from '../calc/bridge/computed';
import { detailModel } from '../calc/bridge/detail';
import { classifyNamed, type DrawClass } from './layer-class';

/*
 * A computed bridge's detail as a to-scale section (the Solve dialog's drawing and the compliance sheet's): the
 * boxes of its model in the x–y plane — of a 3-D detail those cut by its mid-plane in z — each with the hatch
 * class of its material (by name and λ, as the wall section). SI: metres.
 */

export interface DrawnBox {
  name: string;
  lambda: number;
  cls: DrawClass;
  min: [number, number];
  max: [number, number];
}

export interface DetailDrawing {
  min: [number, number];
  max: [number, number];
  boxes: DrawnBox[];
  /** y grows downwards on paper (outside at the top) unless false: a slab edge is drawn with y up. */
  yDown: boolean;
}

/** The hatch of a box: concrete as masonry; metal only when λ says so (a framed layer named "steel studs" is not). */
function drawnClass(name: string, lambda: number): DrawClass {
  if (/slab|concrete/i.test(name)) return 'masonry';
  const cls = classifyNamed(name, lambda);
  return cls === 'metal' && lambda < 10 ? classifyNamed('', lambda) : cls;
}

/** The section of a detail, to scale, in model metres. */
export function detailDrawing(detail: BridgeDetailInput): DetailDrawing {
  // A mesh given keeps a 3-D template from sizing its grid (the boxes do not depend on it).
  const model = detailModel(
    detail.template === 'clip' || detail.template === 'fastener'
      ? ({
          ...detail,
          input: { ...detail.input, mesh: { ...detail.input.mesh, interfaceCell: 0.01 } },
        } as BridgeDetailInput)
      : detail,
  );
  const three = model.dimension === '3d';
  const zs = model.boxes.flatMap((b) => [b.min[2] ?? 0, b.max[2] ?? 0]);
  const mid = three ? (Math.min(...zs) + Math.max(...zs)) / 2 : 0;
  const boxes: DrawnBox[] = model.boxes
    .filter((b) => !three || (b.min[2]! <= mid && b.max[2]! >= mid))
    .map((b) => ({
      name: b.name,
      lambda: b.lambda,
      cls: drawnClass(b.name, b.lambda),
      min: [b.min[0]!, b.min[1]!],
      max: [b.max[0]!, b.max[1]!],
    }));
  const min: [number, number] = [
    Math.min(...boxes.map((b) => b.min[0])),
    Math.min(...boxes.map((b) => b.min[1])),
  ];
  const max: [number, number] = [
    Math.max(...boxes.map((b) => b.max[0])),
    Math.max(...boxes.map((b) => b.max[1])),
  ];
  const yDown = !(detail.template === 'edge' && detail.input.kind === 'slab');
  return { min, max, boxes, yDown };
}

/** Drawing scales 1:n offered, largest first (as the wall section). */
export const DRAWING_SCALES = [1, 2, 5, 10, 20, 50] as const;

/** The largest scale 1:n at which `size` metres fits `room` millimetres on paper (1:50 if none). */
export const scaleFor = (size: number, room: number): number =>
  DRAWING_SCALES.find((n) => (size * 1000) / n <= room) ?? DRAWING_SCALES[DRAWING_SCALES.length - 1];
