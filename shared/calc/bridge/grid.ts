import type { BridgeMesh } from './schema';

/** Two coordinates closer than this (m) are one edge: 1 µm, far below any box edge (≥ 0.1 mm). */
export const EDGE_TOLERANCE = 1e-6;

/** Sorted distinct edges of one axis (closer than EDGE_TOLERANCE merge into the first). */
export function distinctEdges(values: number[]): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  const out: number[] = [];
  for (const v of sorted) if (out.length === 0 || v - out[out.length - 1]! > EDGE_TOLERANCE) out.push(v);
  return out;
}

/**
 * Cell sizes across one interval of length L between two material edges: `first` at the refined ends (both,
 * or only the low or high one), growing by `growth` away from them up to `maxCell`, then scaled to fill L
 * exactly. Geometric grading from the interfaces, where the gradients are steepest (Patankar, Numerical Heat
 * Transfer and Fluid Flow, 1980, §4.6).
 */
export function gradedSizes(
  length: number,
  first: number,
  growth: number,
  maxCell: number,
  ends: 'both' | 'low' | 'high' = 'both',
): number[] {
  if (length <= first) return [length];
  const span = ends === 'both' ? length / 2 : length;
  const half: number[] = [];
  let covered = 0;
  let size = first;
  while (covered < span) {
    half.push(size);
    covered += size;
    size = Math.min(size * growth, maxCell);
  }
  const sizes =
    ends === 'both' ? [...half, ...half.slice().reverse()] : ends === 'low' ? half : half.reverse();
  const scale = span / covered;
  return sizes.map((s) => s * scale);
}

/**
 * Grid points of one axis: its edges with graded cells between them, every cell split `subdivide` times.
 * Without `gradeBounds` the model's outer faces (cut-off and symmetry planes, surfaces) take no edge cells.
 */
export function axisPoints(edges: number[], mesh: BridgeMesh): number[] {
  const points = [edges[0]!];
  const last = edges.length - 1;
  for (let e = 1; e < edges.length; e++) {
    const a = edges[e - 1]!;
    const length = edges[e]! - a;
    const first = Math.min(mesh.interfaceCell, mesh.maxCell);
    const low = mesh.gradeBounds || e > 1;
    const high = mesh.gradeBounds || e < last;
    const ends = low && !high ? 'low' : high && !low ? 'high' : 'both';
    let at = a;
    for (const s of gradedSizes(length, first, mesh.growth, mesh.maxCell, ends)) {
      for (let k = 1; k <= mesh.subdivide; k++) points.push(at + (s * k) / mesh.subdivide);
      at += s;
    }
    points[points.length - 1] = edges[e]!;
  }
  return points;
}

/** Index of the cell of `points` that holds coordinate v (cells are [points[i], points[i+1]]), clamped. */
export function cellIndex(points: number[], v: number): number {
  let lo = 0;
  let hi = points.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (points[mid]! <= v) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** First and last cell index whose centre lies in [a, b] on this axis (last < first when none). */
export function cellRange(points: number[], a: number, b: number): [number, number] {
  let first = cellIndex(points, a);
  if ((points[first]! + points[first + 1]!) / 2 < a) first++;
  let last = cellIndex(points, b);
  if ((points[last]! + points[last + 1]!) / 2 > b) last--;
  return [first, last];
}
