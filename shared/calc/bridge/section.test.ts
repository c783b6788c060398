import { describe, expect, it } from 'vitest';
import {
  bandEdges,
  bandOf,
  bandRects,
  coarseSection,
  isotherm,
  isotherms,
  PALETTE,
  type Section,
  sectionOf,
} from './section';

/** A section of n × m cells of size h whose cell-centre temperatures are θ(x, y). */
function sectionFrom(
  n: number,
  m: number,
  h: number,
  theta: (x: number, y: number) => number | null,
): Section {
  const x = Array.from({ length: n + 1 }, (_, i) => i * h);
  const y = Array.from({ length: m + 1 }, (_, j) => j * h);
  const values: (number | null)[] = [];
  for (let j = 0; j < m; j++) for (let i = 0; i < n; i++) values.push(theta((i + 0.5) * h, (j + 0.5) * h));
  return { x, y, values };
}

describe('isotherms by marching squares (Lorensen & Cline 1987, 2-D)', () => {
  it('a linear field θ = 20·x: the 10 °C isotherm is the line x = 0.5 from the first to the last centre row (derived)', () => {
    const s = sectionFrom(10, 8, 0.1, (x) => 20 * x);
    const segs = isotherm(s, 10);
    expect(segs.length).toBe(7); // one per square row
    for (const [x1, , x2] of segs) {
      expect(x1).toBeCloseTo(0.5, 12);
      expect(x2).toBeCloseTo(0.5, 12);
    }
    const ys = segs.flatMap(([, y1, , y2]) => [y1, y2]);
    expect(Math.min(...ys)).toBeCloseTo(0.05, 12);
    expect(Math.max(...ys)).toBeCloseTo(0.75, 12);
  });

  it('a radial field θ = r: the isotherm θ = 0.3 lies on the circle r = 0.3 (interpolation error ~h²/r, derived)', () => {
    const s = sectionFrom(100, 100, 0.01, (x, y) => Math.hypot(x - 0.5, y - 0.5));
    const segs = isotherm(s, 0.3);
    expect(segs.length).toBeGreaterThan(150);
    for (const [x1, y1] of segs) expect(Math.hypot(x1 - 0.5, y1 - 0.5)).toBeCloseTo(0.3, 3);
  });

  it('no isotherm through a square with a cell of no material', () => {
    // θ = x; the cells centred at (2.5, 1.5) and (3.5, 1.5) hold no material, so both squares between the
    // centre columns 2.5 and 3.5 (rows 0–1 and 1–2) are skipped, where θ = 3 would cross.
    const s = sectionFrom(4, 3, 1, (x, y) => (x > 2 && y > 1 && y < 2 ? null : x));
    expect(isotherm(s, 3)).toEqual([]);
    expect(isotherm(s, 1)).toHaveLength(2); // between the columns 0.5 and 1.5, all material
  });

  it('a saddle is cut so that the corners on the centre side stay joined', () => {
    // Corners (0,0)=1, (1,0)=0, (1,1)=1, (0,1)=0: the mean 0.5 ≥ 0.5 is "above", so the cold corners are cut off.
    const s: Section = { x: [0, 1, 2], y: [0, 1, 2], values: [1, 0, 0, 1] };
    const segs = isotherm(s, 0.5);
    expect(segs).toHaveLength(2);
    // Each segment isolates one cold centre: (1.5, 0.5) or (0.5, 1.5).
    const mids = segs.map(([a, b, c, d]) => [(a + c) / 2, (b + d) / 2]);
    expect(mids.some(([mx, my]) => mx! > 1 && my! < 1)).toBe(true);
    expect(mids.some(([mx, my]) => mx! < 1 && my! > 1)).toBe(true);
  });

  it('one isotherm per band edge, warm to cold', () => {
    const s = sectionFrom(20, 2, 0.05, (x) => 20 - 20 * x);
    const lines = isotherms(s, 20, 0);
    expect(lines.map((l) => l.level)).toEqual(bandEdges(20, 0));
    expect(lines.map((l) => l.level)).toEqual([18, 16, 14, 12, 10, 8, 6, 4, 2]);
    expect(lines.every((l) => l.segments.length > 0)).toBe(true);
  });
});

describe('map palette and bands', () => {
  /** WCAG 2.x relative luminance of a #rrggbb colour (sRGB, W3C WCAG 2.1 §1.4.3 definition). */
  const luminance = (hex: string) => {
    const [r, g, b] = [1, 3, 5].map((k) => {
      const c = Number.parseInt(hex.slice(k, k + 2), 16) / 255;
      return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
    });
    return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
  };

  it('reads in greyscale: each band darker than the one before, neighbours at least 1.15:1 apart', () => {
    const l = PALETTE.map(luminance);
    for (let b = 1; b < l.length; b++) {
      expect(l[b]!).toBeLessThan(l[b - 1]!);
      expect((l[b - 1]! + 0.05) / (l[b]! + 0.05)).toBeGreaterThan(1.15);
    }
  });

  it('bands: warm is band 0, cold the last; the rectangles cover every cell with material once', () => {
    expect(bandOf(20, 20, 0)).toBe(0);
    expect(bandOf(0, 20, 0)).toBe(PALETTE.length - 1);
    const s = sectionFrom(6, 3, 0.5, (x, y) => (x < 1 && y > 1 ? null : 20 - 6 * x));
    const area = bandRects(s, 20, 0).reduce((a, r) => a + r.w * r.h, 0);
    expect(area).toBeCloseTo(3 * 1.5 - 2 * 0.25, 12);
  });

  it('the mid-plane of a 3-D field (z between the middle edges)', () => {
    const grid = { x: [0, 1, 2], y: [0, 1], z: [0, 1, 2, 3] };
    expect(sectionOf({ grid, field: [1, 2, 3, 4, 5, 6] })?.values).toEqual([3, 4]);
    expect(sectionOf({ grid: { ...grid, z: [0, 1] }, field: [7, 8] })?.values).toEqual([7, 8]);
    expect(sectionOf({ grid, field: null })).toBeNull();
  });
});

describe('the stored map of a computed bridge', () => {
  it('a uniform grid of at most n cells along the longer side, each the solve cell at its centre', () => {
    // 200 × 50 cells of 5 mm, θ = 20·x (x in m): n = 40 gives 40 × 10 cells of 25 mm (derived).
    const s = sectionFrom(200, 50, 0.005, (x, y) => (y > 0.2 ? null : 20 * x));
    const c = coarseSection(s, 40);
    expect(c.x).toHaveLength(41);
    expect(c.y).toHaveLength(11);
    expect(c.values).toHaveLength(400);
    // The cell centred at x = 0.0125 lies in the fine cell 2 (0.010–0.015, centre 0.0125): θ = 0.25 °C.
    expect(c.values[0]).toBeCloseTo(0.25, 3);
    // Rows above y = 0.2 hold no material.
    expect(c.values.slice(360)).toEqual(Array(40).fill(null));
  });
});
