import { CalcInputError } from '../errors';
import { axisPoints, cellIndex, cellRange, distinctEdges, EDGE_TOLERANCE } from './grid';
import { type StencilMatrix, solvePcg } from './pcg';
import type { BridgeBoundary, BridgeModel, BridgeResult } from './schema';

/** Default cell budget of one solve (about 2 s in Node on 2 cores for a 3-D clip). */
export const DEFAULT_MAX_CELLS = 250_000;

/** The grid of a model: points per axis (2-D: z is one cell 1 m deep) and its cell count. */
export interface BridgeGrid {
  x: number[];
  y: number[];
  z: number[];
  cells: number;
}

type Vec3 = [number, number, number];

/** A model point as [x, y, z] (2-D: z = 0.5, the middle of the 1 m slice); the field is named for refusals. */
function point3(model: BridgeModel, p: number[], field: string): Vec3 {
  const n = model.dimension === '2d' ? 2 : 3;
  if (p.length !== n)
    throw new CalcInputError(
      field,
      `a ${model.dimension.toUpperCase()} model takes ${n} coordinates (got ${p.length})`,
    );
  return [p[0]!, p[1]!, n === 3 ? p[2]! : 0.5];
}

interface Box3 {
  min: Vec3;
  max: Vec3;
  lambda: number;
}

/** The boxes as 3-D boxes; a box without volume or with λ ≤ 0 is refused (ISO 10211 §5: materials by λ). */
function boxesOf(model: BridgeModel): Box3[] {
  return model.boxes.map((b, i) => {
    if (!(b.lambda > 0) || !Number.isFinite(b.lambda))
      throw new CalcInputError(
        `boxes.${i}.lambda`,
        `λ must be a finite number greater than 0 (got ${b.lambda})`,
      );
    const min = point3(model, b.min, `boxes.${i}.min`);
    const max = point3(model, b.max, `boxes.${i}.max`);
    if (model.dimension === '2d') [min[2], max[2]] = [0, 1];
    for (let a = 0; a < 3; a++)
      if (!(max[a]! - min[a]! > EDGE_TOLERANCE))
        throw new CalcInputError(
          `boxes.${i}.max`,
          `"${b.name}" must be larger than its lowest corner along ${'xyz'[a]} (size ${max[a]! - min[a]!} m)`,
        );
    return { min, max, lambda: b.lambda };
  });
}

/** Overlap volume of two boxes > 0 (touching faces do not count). */
const overlaps = (a: Box3, b: Box3) =>
  [0, 1, 2].every((k) => Math.min(a.max[k]!, b.max[k]!) - Math.max(a.min[k]!, b.min[k]!) > EDGE_TOLERANCE);

/** Two overlapping boxes must be the same material (same λ), or which one holds is a guess. */
function refuseOverlaps(model: BridgeModel, boxes: Box3[]): void {
  for (let j = 1; j < boxes.length; j++)
    for (let i = 0; i < j; i++)
      if (boxes[i]!.lambda !== boxes[j]!.lambda && overlaps(boxes[i]!, boxes[j]!))
        throw new CalcInputError(
          `boxes.${j}`,
          `"${model.boxes[j]!.name}" overlaps "${model.boxes[i]!.name}" (boxes.${i}) with a different λ; split one of them`,
        );
}

/** Grid of the model: every box and boundary edge on each axis, graded between (see `axisPoints`). */
export function bridgeGrid(model: BridgeModel): BridgeGrid {
  const boxes = boxesOf(model);
  const axis = (a: number) => distinctEdges(boxes.flatMap((b) => [b.min[a]!, b.max[a]!]));
  const x = axisPoints(axis(0), model.mesh);
  const y = axisPoints(axis(1), model.mesh);
  const z = model.dimension === '2d' ? [0, 1] : axisPoints(axis(2), model.mesh);
  return { x, y, z, cells: (x.length - 1) * (y.length - 1) * (z.length - 1) };
}

/** λ of every cell (0 = no material): each box fills the cells whose centre lies inside it. */
function cellLambdas(grid: BridgeGrid, boxes: Box3[]): Float64Array {
  const nx = grid.x.length - 1;
  const ny = grid.y.length - 1;
  const lambda = new Float64Array(grid.cells);
  for (const b of boxes) {
    const [i0, i1] = cellRange(grid.x, b.min[0], b.max[0]);
    const [j0, j1] = cellRange(grid.y, b.min[1], b.max[1]);
    const [k0, k1] = cellRange(grid.z, b.min[2], b.max[2]);
    for (let k = k0; k <= k1; k++)
      for (let j = j0; j <= j1; j++)
        lambda.fill(b.lambda, (k * ny + j) * nx + i0, (k * ny + j) * nx + i1 + 1);
  }
  return lambda;
}

/** Conductance of a face between two cells, W/K: A / (Δ_p/(2λ_p) + Δ_q/(2λ_q)) — the harmonic mean of the half-cells in series (Patankar 1980, eq. 4.9). */
const faceConductance = (area: number, dp: number, lp: number, dq: number, lq: number) =>
  lp > 0 && lq > 0 ? area / (dp / (2 * lp) + dq / (2 * lq)) : 0;

/** An exposed cell face that takes an environment. */
interface SurfaceFace {
  cell: number;
  boundary: number;
  /** Conductance cell centre → environment, W/K: A / (Δ/(2λ) + Rs) (ISO 10211:2017 §7.1, Rs in series). */
  g: number;
  area: number;
  centre: Vec3;
  /** Axis of the face's normal (0 x, 1 y, 2 z) and its side of the cell (−1 low, +1 high). */
  axis: number;
  dir: number;
}

/** Boundary regions as 3-D boxes (2-D: the whole slice depth). */
function regionsOf(model: BridgeModel): { min: Vec3; max: Vec3 }[] {
  return model.boundaries.map((b, i) => {
    const min = point3(model, b.min, `boundaries.${i}.min`);
    const max = point3(model, b.max, `boundaries.${i}.max`);
    for (let a = 0; a < 3; a++)
      if (max[a]! < min[a]!)
        throw new CalcInputError(
          `boundaries.${i}.max`,
          `the highest corner lies below the lowest along ${'xyz'[a]}`,
        );
    return { min, max };
  });
}

const inRegion = (r: { min: Vec3; max: Vec3 }, c: Vec3) =>
  [0, 1, 2].every((a) => c[a]! >= r.min[a]! - EDGE_TOLERANCE && c[a]! <= r.max[a]! + EDGE_TOLERANCE);

/** The exposed faces (towards no material or out of the grid) that fall in a boundary region (the first that holds the face's centre); the others are adiabatic (ISO 10211 §5.2.4). */
function surfaceFaces(model: BridgeModel, grid: BridgeGrid, lambda: Float64Array): SurfaceFace[] {
  const regions = regionsOf(model);
  const nx = grid.x.length - 1;
  const ny = grid.y.length - 1;
  const nz = grid.z.length - 1;
  const pts = [grid.x, grid.y, grid.z];
  const n = [nx, ny, nz];
  const stride = [1, nx, nx * ny];
  const axes = model.dimension === '2d' ? [0, 1] : [0, 1, 2];
  const faces: SurfaceFace[] = [];
  const exposed = (p: number, idx: number[], a: number, dir: number) => {
    const nb = idx[a]! + dir;
    return nb < 0 || nb >= n[a]! || lambda[p + dir * stride[a]!] === 0;
  };
  for (let k = 0; k < nz; k++)
    for (let j = 0; j < ny; j++)
      for (let i = 0; i < nx; i++) {
        const p = (k * ny + j) * nx + i;
        const lp = lambda[p]!;
        if (lp === 0) continue;
        const idx = [i, j, k];
        for (const a of axes)
          for (const dir of [-1, 1]) {
            if (!exposed(p, idx, a, dir)) continue;
            const size = idx.map((c, b) => pts[b]![c + 1]! - pts[b]![c]!);
            const at = idx.map((c, b) => (pts[b]![c]! + pts[b]![c + 1]!) / 2) as Vec3;
            at[a] = pts[a]![dir < 0 ? idx[a]! : idx[a]! + 1]!;
            const boundary = regions.findIndex((r) => inRegion(r, at));
            if (boundary < 0) continue;
            const area = size.reduce((s, v, b) => (b === a ? s : s * v), 1);
            const rs = model.boundaries[boundary]!.resistance;
            faces.push({
              cell: p,
              boundary,
              g: area / (size[a]! / (2 * lp) + rs),
              area,
              centre: at,
              axis: a,
              dir,
            });
          }
      }
  return faces;
}

/** The stencil matrix and right-hand side: conduction between cells plus each surface face to its environment. */
function assemble(model: BridgeModel, grid: BridgeGrid, lambda: Float64Array, faces: SurfaceFace[]) {
  const nx = grid.x.length - 1;
  const ny = grid.y.length - 1;
  const nz = grid.z.length - 1;
  const n = grid.cells;
  const m: StencilMatrix = {
    nx,
    ny,
    nz,
    diag: new Float64Array(n),
    gx: new Float64Array(n),
    gy: new Float64Array(n),
    gz: new Float64Array(n),
  };
  const b = new Float64Array(n);
  const dx = (i: number) => grid.x[i + 1]! - grid.x[i]!;
  const dy = (j: number) => grid.y[j + 1]! - grid.y[j]!;
  const dz = (k: number) => grid.z[k + 1]! - grid.z[k]!;
  for (let k = 0; k < nz; k++)
    for (let j = 0; j < ny; j++)
      for (let i = 0; i < nx; i++) {
        const p = (k * ny + j) * nx + i;
        const l = lambda[p]!;
        if (i + 1 < nx) m.gx[p] = faceConductance(dy(j) * dz(k), dx(i), l, dx(i + 1), lambda[p + 1]!);
        if (j + 1 < ny) m.gy[p] = faceConductance(dx(i) * dz(k), dy(j), l, dy(j + 1), lambda[p + nx]!);
        if (k + 1 < nz) m.gz[p] = faceConductance(dx(i) * dy(j), dz(k), l, dz(k + 1), lambda[p + nx * ny]!);
      }
  for (let p = 0; p < n; p++) {
    const g = m.gx[p]! + m.gy[p]! + m.gz[p]!;
    m.diag[p] = m.diag[p]! + g;
    if (m.gx[p]! > 0) m.diag[p + 1] = m.diag[p + 1]! + m.gx[p]!;
    if (m.gy[p]! > 0) m.diag[p + nx] = m.diag[p + nx]! + m.gy[p]!;
    if (m.gz[p]! > 0) m.diag[p + nx * ny] = m.diag[p + nx * ny]! + m.gz[p]!;
  }
  for (const f of faces) {
    m.diag[f.cell] = m.diag[f.cell]! + f.g;
    b[f.cell] = b[f.cell]! + f.g * model.boundaries[f.boundary]!.temperature;
  }
  // A cell without material is its own equation θ = 0 (left out of every result).
  for (let p = 0; p < n; p++) if (lambda[p] === 0) m.diag[p] = 1;
  return { m, b };
}

/** Every connected piece of material must touch an environment, or its temperature is undefined. */
function refuseFloatingPieces(m: StencilMatrix, lambda: Float64Array, faces: SurfaceFace[]): void {
  const n = lambda.length;
  const grounded = new Uint8Array(n);
  const stack: number[] = [];
  for (const f of faces)
    if (!grounded[f.cell]) {
      grounded[f.cell] = 1;
      stack.push(f.cell);
    }
  const sy = m.nx;
  const sz = m.nx * m.ny;
  const visit = (q: number) => {
    if (!grounded[q]) {
      grounded[q] = 1;
      stack.push(q);
    }
  };
  while (stack.length > 0) {
    const p = stack.pop()!;
    if (m.gx[p]! > 0) visit(p + 1);
    if (p >= 1 && m.gx[p - 1]! > 0) visit(p - 1);
    if (m.gy[p]! > 0) visit(p + sy);
    if (p >= sy && m.gy[p - sy]! > 0) visit(p - sy);
    if (m.gz[p]! > 0) visit(p + sz);
    if (p >= sz && m.gz[p - sz]! > 0) visit(p - sz);
  }
  for (let p = 0; p < n; p++)
    if (lambda[p]! > 0 && !grounded[p])
      throw new CalcInputError(
        'boundaries',
        'part of the material touches no environment (no surface of it lies in a boundary region)',
      );
}

/** Boundary regions that hold no exposed face are a slip (a plane a little off the model). */
function refuseUnusedBoundaries(model: BridgeModel, faces: SurfaceFace[]): void {
  const used = new Set(faces.map((f) => f.boundary));
  model.boundaries.forEach((b, i) => {
    if (!used.has(i))
      throw new CalcInputError(
        `boundaries.${i}`,
        `"${b.name}" holds no exposed surface of the model; check its corners`,
      );
  });
}

/** Surface temperature of a face: θs = θenv − q·Rs with q = g·(θenv − θcell)/A (ISO 10211:2017 §7.1). */
const surfaceTemperature = (f: SurfaceFace, env: BridgeBoundary, cellTemperature: number) =>
  env.temperature - ((f.g * (env.temperature - cellTemperature)) / f.area) * env.resistance;

interface BoundaryTotals {
  heatFlow: number;
  area: number;
  min: number;
  max: number;
  minAt: Vec3;
}

/**
 * Lowest surface temperature a face gives, with where: its centre's, or — where the surface turns a corner
 * into the material beside it — the value linearly extrapolated from the face beyond to the face's edge, so
 * the coldest point of an inside corner is not missed by half a cell (derived; the surface field is smooth
 * there). Edges on the grid's bounds are cut-off or symmetry planes (no heat crosses): no extrapolation.
 */
function coldestOfFace(
  f: SurfaceFace,
  ts: number,
  surfaceAt: (cell: number, f: SurfaceFace) => number | undefined,
  grid: BridgeGrid,
  axes: number[],
): { t: number; at: Vec3 } {
  const pts = [grid.x, grid.y, grid.z];
  const n = pts.map((p) => p.length - 1);
  const stride = [1, n[0]!, n[0]! * n[1]!];
  const idx = [f.cell % n[0]!, Math.floor(f.cell / n[0]!) % n[1]!, Math.floor(f.cell / stride[2]!)];
  let t = ts;
  const at = f.centre.slice() as Vec3;
  for (const b of axes) {
    if (b === f.axis) continue;
    for (const s of [-1, 1]) {
      const beside = idx[b]! + s;
      const beyond = idx[b]! - s;
      if (beside < 0 || beside >= n[b]! || beyond < 0 || beyond >= n[b]!) continue;
      if (surfaceAt(f.cell + s * stride[b]!, f) !== undefined) continue;
      const other = surfaceAt(f.cell - s * stride[b]!, f);
      if (other === undefined) continue;
      const h = pts[b]![idx[b]! + 1]! - pts[b]![idx[b]!]!;
      const hOther = pts[b]![beyond + 1]! - pts[b]![beyond]!;
      t += ((ts - other) * (h / 2)) / ((h + hOther) / 2);
      at[b] = pts[b]![s < 0 ? idx[b]! : idx[b]! + 1]!;
    }
  }
  return t < ts ? { t, at } : { t: ts, at: f.centre };
}

/** Heat flow into the model through each boundary, Φ = Σ g·(θenv − θcell), and its surface temperature range. */
function boundaryTotals(
  model: BridgeModel,
  grid: BridgeGrid,
  faces: SurfaceFace[],
  theta: Float64Array,
): BoundaryTotals[] {
  const totals: BoundaryTotals[] = model.boundaries.map(() => ({
    heatFlow: 0,
    area: 0,
    min: Number.POSITIVE_INFINITY,
    max: Number.NEGATIVE_INFINITY,
    minAt: [0, 0, 0],
  }));
  const key = (cell: number, axis: number, dir: number) => cell * 6 + axis * 2 + (dir > 0 ? 1 : 0);
  const surface = new Map<number, number>();
  for (const f of faces)
    surface.set(
      key(f.cell, f.axis, f.dir),
      surfaceTemperature(f, model.boundaries[f.boundary]!, theta[f.cell]!),
    );
  const surfaceAt = (cell: number, f: SurfaceFace) => surface.get(key(cell, f.axis, f.dir));
  const axes = model.dimension === '2d' ? [0, 1] : [0, 1, 2];
  for (const f of faces) {
    const env = model.boundaries[f.boundary]!;
    const t = totals[f.boundary]!;
    t.heatFlow += f.g * (env.temperature - theta[f.cell]!);
    t.area += f.area;
    const ts = surface.get(key(f.cell, f.axis, f.dir))!;
    const coldest = coldestOfFace(f, ts, surfaceAt, grid, axes);
    if (coldest.t < t.min) {
      t.min = coldest.t;
      t.minAt = coldest.at;
    }
    if (ts > t.max) t.max = ts;
  }
  return totals;
}

/** Coupling coefficient L = Φ / (θ1 − θ2) with exactly two environment temperatures (ISO 10211:2017 eq. 3), else null. */
function couplingOf(model: BridgeModel, heatIn: number): number | null {
  const temps = [...new Set(model.boundaries.map((b) => b.temperature))];
  if (temps.length !== 2) return null;
  return heatIn / Math.abs(temps[0]! - temps[1]!);
}

/** ψ = L2D − Σ U_j·l_j (ISO 10211:2017 eq. 17; ISO 14683:2017 eq. 2). */
export const psiOf = (l2d: number, elements: { u: number; size: number }[]) =>
  l2d - elements.reduce((s, e) => s + e.u * e.size, 0);

/** χ = L3D − Σ U_i·A_i − Σ ψ_k·l_k (ISO 10211:2017 eq. 19). */
export const chiOf = (
  l3d: number,
  elements: { u: number; size: number }[],
  lines: { psi: number; length: number }[],
) => l3d - elements.reduce((s, e) => s + e.u * e.size, 0) - lines.reduce((s, l) => s + l.psi * l.length, 0);

/** f_Rsi = (θsi − θe) / (θi − θe) (ISO 10211:2017 eq. 22; ISO 13788:2012 eq. 3). */
function fRsiOf(model: BridgeModel, minInside: number | null): number | null {
  const inside = model.boundaries.filter((b) => b.side === 'inside').map((b) => b.temperature);
  const outside = model.boundaries.filter((b) => b.side === 'outside').map((b) => b.temperature);
  if (minInside === null || new Set(inside).size !== 1 || new Set(outside).size !== 1) return null;
  const di = inside[0]! - outside[0]!;
  return di === 0 ? null : (minInside - outside[0]!) / di;
}

/** Refuses a model the grid would make larger than the budget, before anything is allocated. */
export function requireWithinBudget(grid: BridgeGrid, maxCells: number): void {
  if (grid.cells > maxCells)
    throw new CalcInputError(
      'mesh',
      `the grid would have ${grid.cells} cells, more than the ${maxCells} allowed; coarsen the mesh (a larger interfaceCell or maxCell) or model less`,
    );
}

/**
 * Steady-state conduction through the model by finite volumes on its rectilinear grid (ISO 10211:2017 §5–§7,
 * annex A: a method that passes the reference cases), solved by conjugate gradient with a relaxed incomplete Cholesky preconditioner.
 * Impossible input is refused before solving; `maxCells` is the work budget.
 */
export function solveBridge(model: BridgeModel, maxCells = DEFAULT_MAX_CELLS): BridgeResult {
  const boxes = boxesOf(model);
  refuseOverlaps(model, boxes);
  const grid = bridgeGrid(model);
  requireWithinBudget(grid, maxCells);
  const lambda = cellLambdas(grid, boxes);
  const faces = surfaceFaces(model, grid, lambda);
  refuseUnusedBoundaries(model, faces);
  const { m, b } = assemble(model, grid, lambda, faces);
  refuseFloatingPieces(m, lambda, faces);
  const temps = model.boundaries.map((x) => x.temperature);
  const theta = new Float64Array(grid.cells).fill((Math.max(...temps) + Math.min(...temps)) / 2);
  for (let p = 0; p < grid.cells; p++) if (lambda[p] === 0) theta[p] = 0;
  const outcome = solvePcg(m, b, theta);
  if (!theta.every(Number.isFinite) || !(outcome.residual < 1e-6))
    throw new CalcInputError(
      'mesh',
      `the solver did not converge (residual ${outcome.residual}); coarsen or simplify the model`,
    );
  return results(model, grid, lambda, faces, theta, outcome);
}

function results(
  model: BridgeModel,
  grid: BridgeGrid,
  lambda: Float64Array,
  faces: SurfaceFace[],
  theta: Float64Array,
  outcome: { iterations: number; residual: number },
): BridgeResult {
  const totals = boundaryTotals(model, grid, faces, theta);
  const heatIn = totals.reduce((s, t) => s + Math.max(t.heatFlow, 0), 0);
  const heatOut = totals.reduce((s, t) => s + Math.max(-t.heatFlow, 0), 0);
  const coupling = couplingOf(model, heatIn);
  const ref = model.reference;
  const inside = totals.filter((_, i) => model.boundaries[i]!.side === 'inside');
  const coldest = inside.reduce<BoundaryTotals | null>((c, t) => (c === null || t.min < c.min ? t : c), null);
  const minInside = coldest
    ? {
        temperature: coldest.min,
        at: model.dimension === '2d' ? coldest.minAt.slice(0, 2) : coldest.minAt,
      }
    : null;
  return {
    dimension: model.dimension,
    cells: grid.cells,
    grid: { x: grid.x, y: grid.y, z: grid.z },
    solver: {
      method: 'finite volume, conjugate gradient with relaxed incomplete Cholesky preconditioning',
      iterations: outcome.iterations,
      residual: outcome.residual,
      energyBalance: heatIn > 0 ? Math.abs(heatIn - heatOut) / heatIn : 0,
    },
    boundaries: totals.map((t, i) => ({
      name: model.boundaries[i]!.name,
      side: model.boundaries[i]!.side,
      heatFlow: t.heatFlow,
      area: t.area,
      minSurfaceTemperature: t.min,
      maxSurfaceTemperature: t.max,
    })),
    heatFlow: heatIn,
    coupling,
    psi: coupling !== null && ref && model.dimension === '2d' ? psiOf(coupling, ref.elements) : null,
    chi:
      coupling !== null && ref && model.dimension === '3d' ? chiOf(coupling, ref.elements, ref.lines) : null,
    minInsideSurface: minInside,
    fRsi: fRsiOf(model, minInside?.temperature ?? null),
    field: model.field ? Array.from(theta, (t, p) => (lambda[p]! > 0 ? t : null)) : null,
  };
}

/**
 * Temperature at a point of the material, °C: interpolation between the centres of the cells around it
 * (held at the outermost centres towards the model's edges), each weighted by its λ as well, so that a point
 * on a face between two materials takes θ = (λ1·θ1 + λ2·θ2)/(λ1 + λ2), the continuity of heat flux across
 * it for equal half-cells (Patankar 1980, §4.2-3). Needs the field.
 */
export function temperatureAt(model: BridgeModel, result: BridgeResult, point: number[]): number {
  if (!result.field)
    throw new CalcInputError('field', 'solve with field: true to read temperatures at points');
  const grid = { ...result.grid, cells: result.cells };
  const lambda = cellLambdas(grid, boxesOf(model));
  const axes = [result.grid.x, result.grid.y, result.grid.z];
  const p = [point[0]!, point[1]!, point.length > 2 ? point[2]! : 0.5];
  const nx = axes[0]!.length - 1;
  const ny = axes[1]!.length - 1;
  const weights = axes.map((pts, a) => {
    const centres = (i: number) => (pts[i]! + pts[i + 1]!) / 2;
    const n = pts.length - 1;
    let i = cellIndex(pts, p[a]!);
    if (p[a]! < centres(i)) i--;
    if (i < 0) return [0, 0, 0] as const;
    if (i >= n - 1) return [n - 1, n - 1, 0] as const;
    const w = (p[a]! - centres(i)) / (centres(i + 1) - centres(i));
    return [i, i + 1, w] as const;
  });
  let sum = 0;
  let wsum = 0;
  for (let c = 0; c < 8; c++) {
    const pick = [c & 1, (c >> 1) & 1, (c >> 2) & 1];
    let w = 1;
    const idx = pick.map((s, a) => {
      const [i0, i1, t] = weights[a]!;
      w *= s ? t : 1 - t;
      return s ? i1 : i0;
    });
    const cell = (idx[2]! * ny + idx[1]!) * nx + idx[0]!;
    const value = result.field[cell];
    if (w === 0 || value === null || value === undefined) continue;
    sum += w * lambda[cell]! * value;
    wsum += w * lambda[cell]!;
  }
  if (wsum === 0) throw new CalcInputError('point', 'the point lies outside the material');
  return sum / wsum;
}
