import { cellIndex } from './grid';
import type { BridgeResult } from './schema';

/*
 * A plane of a solved temperature field, what a map draws: the temperature bands of our palette, runs of one
 * band merged into rectangles, and the isotherms by marching squares (Lorensen & Cline 1987, the 2-D case) on
 * the cell centres. SI: metres and °C.
 */

/** A plane of the field: cell edges along x and y, temperatures row by row (y outer; null = no material). */
export interface Section {
  x: number[];
  y: number[];
  values: (number | null)[];
}

/**
 * The section a map draws: the 2-D field as it is; of a 3-D model, the x–y plane through the middle of the
 * cell in z (a clip's or fastener's mid-plane, where it is warmest outside and coldest inside).
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

/**
 * Bands from warm to cold: light to dark in even lightness steps, the hue turning from straw through rust to
 * indigo, so neighbouring bands differ in hue on screen and in grey on a black-and-white print.
 */
export const PALETTE = [
  '#fbf4d6',
  '#f4dc93',
  '#ebbd68',
  '#de9651',
  '#c8734d',
  '#a95a5a',
  '#83506e',
  '#5d4878',
  '#3b3f6e',
  '#1f2a4d',
] as const;

/** Band of θ between the warm (band 0) and the cold (last band) environment temperature. */
export function bandOf(theta: number, warm: number, cold: number): number {
  const n = PALETTE.length;
  const t = (warm - theta) / (warm - cold);
  return Math.min(n - 1, Math.max(0, Math.floor(t * n)));
}

/** The band edges between warm and cold (the isotherms drawn): PALETTE.length − 1 levels, warm to cold. */
export const bandEdges = (warm: number, cold: number): number[] =>
  PALETTE.slice(1).map((_, b) => warm - ((b + 1) * (warm - cold)) / PALETTE.length);

export interface BandRect {
  x: number;
  y: number;
  w: number;
  h: number;
  band: number;
}

/** The section's cells as rectangles of one band (runs of one band along a row merged). */
export function bandRects(section: Section, warm: number, cold: number): BandRect[] {
  const { x, y, values } = section;
  const nx = x.length - 1;
  const rects: BandRect[] = [];
  for (let j = 0; j < y.length - 1; j++) {
    let i = 0;
    while (i < nx) {
      const v = values[j * nx + i];
      if (v === null || v === undefined) {
        i++;
        continue;
      }
      const band = bandOf(v, warm, cold);
      let k = i + 1;
      while (k < nx) {
        const u = values[j * nx + k];
        if (u === null || u === undefined || bandOf(u, warm, cold) !== band) break;
        k++;
      }
      rects.push({ x: x[i]!, y: y[j]!, w: x[k]! - x[i]!, h: y[j + 1]! - y[j]!, band });
      i = k;
    }
  }
  return rects;
}

/** A straight piece of an isotherm: [x1, y1, x2, y2], m. */
export type Segment = [number, number, number, number];

/**
 * The isotherm θ = level through the section by marching squares on the cell centres: each square of four
 * centres (none without material) is cut where θ crosses the level along its edges, by linear interpolation;
 * a saddle (opposite corners on the same side) is resolved by the mean of the four corners.
 */
export function isotherm(section: Section, level: number): Segment[] {
  const { x, y, values } = section;
  const nx = x.length - 1;
  const ny = y.length - 1;
  const cx = (i: number) => (x[i]! + x[i + 1]!) / 2;
  const cy = (j: number) => (y[j]! + y[j + 1]!) / 2;
  const out: Segment[] = [];
  for (let j = 0; j + 1 < ny; j++)
    for (let i = 0; i + 1 < nx; i++) {
      // Corners counter-clockwise from the lowest: (i, j), (i+1, j), (i+1, j+1), (i, j+1).
      const v = [
        values[j * nx + i],
        values[j * nx + i + 1],
        values[(j + 1) * nx + i + 1],
        values[(j + 1) * nx + i],
      ];
      if (v.some((t) => t === null || t === undefined)) continue;
      const t = v as number[];
      const px = [cx(i), cx(i + 1), cx(i + 1), cx(i)];
      const py = [cy(j), cy(j), cy(j + 1), cy(j + 1)];
      const above = t.map((u) => u >= level);
      // Where the level crosses edge e (corner e → corner e+1), if it does.
      const cross = (e: number): [number, number] | null => {
        const a = e;
        const b = (e + 1) % 4;
        if (above[a] === above[b]) return null;
        const f = (level - t[a]!) / (t[b]! - t[a]!);
        return [px[a]! + f * (px[b]! - px[a]!), py[a]! + f * (py[b]! - py[a]!)];
      };
      const hits = [0, 1, 2, 3].map(cross);
      const cut = hits.flatMap((h, e) => (h ? [e] : []));
      if (cut.length === 2) {
        const [p, q] = [hits[cut[0]!]!, hits[cut[1]!]!];
        out.push([p[0], p[1], q[0], q[1]]);
      } else if (cut.length === 4) {
        // Saddle: the corners on the centre's side are joined through it; cut off the other two (each
        // between the two edges that meet at it: corner 1 between edges 0 and 1, corner 0 between 3 and 0).
        const centreAbove = (t[0]! + t[1]! + t[2]! + t[3]!) / 4 >= level;
        const pairs =
          above[0] === centreAbove
            ? [
                [0, 1],
                [2, 3],
              ]
            : [
                [3, 0],
                [1, 2],
              ];
        for (const [a, b] of pairs) {
          const [p, q] = [hits[a!]!, hits[b!]!];
          out.push([p[0], p[1], q[0], q[1]]);
        }
      }
    }
  return out;
}

/** Every band edge's isotherm, warm to cold. */
export const isotherms = (section: Section, warm: number, cold: number) =>
  bandEdges(warm, cold).map((level) => ({ level, segments: isotherm(section, level) }));

/**
 * The section on a uniform grid of near-square cells, at most `n` along the longer side (the stored map of a
 * computed bridge): each cell takes the temperature of the solve's cell at its centre, to 0.001 K.
 */
export function coarseSection(s: Section, n: number): Section {
  const nx = s.x.length - 1;
  const [x0, x1, y0, y1] = [s.x[0]!, s.x[nx]!, s.y[0]!, s.y[s.y.length - 1]!];
  const size = Math.max(x1 - x0, y1 - y0) / n;
  const cx = Math.min(n, Math.max(1, Math.round((x1 - x0) / size)));
  const cy = Math.min(n, Math.max(1, Math.round((y1 - y0) / size)));
  const x = Array.from({ length: cx + 1 }, (_, i) => x0 + ((x1 - x0) * i) / cx);
  const y = Array.from({ length: cy + 1 }, (_, j) => y0 + ((y1 - y0) * j) / cy);
  const values: (number | null)[] = [];
  for (let j = 0; j < cy; j++) {
    const fj = cellIndex(s.y, (y[j]! + y[j + 1]!) / 2);
    for (let i = 0; i < cx; i++) {
      const v = s.values[fj * nx + cellIndex(s.x, (x[i]! + x[i + 1]!) / 2)];
      values.push(v === null || v === undefined ? null : Math.round(v * 1000) / 1000);
    }
  }
  return { x, y, values };
}
