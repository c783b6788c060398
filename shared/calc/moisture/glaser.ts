import { CalcInputError } from '@shared/calc/errors';
import { saturationPressureIso13788 } from './psychrometrics';

/*
 * Steady-state Glaser profile of ISO 13788:2012 §6: temperatures from cumulative thermal resistance, vapour
 * pressure from cumulative s_d, condensation planes by the tangent ("taut string") construction. Nodes are
 * numbered from the exterior surface (0) to the interior surface (n − 1); s_d and R are counted from the
 * outside. Surface vapour resistances are neglected, so p = p_e at node 0 and p = p_i at node n − 1.
 * δ₀ and the rate formula reproduce the published worked examples in
 * tests/verification/moisture.verification.test.ts. Plain number arrays throughout: they are what the JSON result holds, and V8 handles small packed arrays of
 * doubles faster than small typed arrays, whose separate buffers cost more to allocate and collect.
 */

/** Water vapour permeability of still air used by the method, δ₀ = 2×10⁻¹⁰ kg/(m·s·Pa) (ISO 13788:2012 §3). */
export const DELTA_0 = 2e-10;

/**
 * Layers of higher thermal resistance are split into equal sub-layers of at most this R, m²·K/W, so that the
 * vapour line cannot cross the (convex) p_sat curve between two nodes unseen and a condensation zone shows
 * as adjacent planes [memory: sub-division rule of ISO 13788:2012 §6 — verify the clause and the value].
 */
export const SUBLAYER_MAX_R = 0.25;

/**
 * Most sub-layers the whole path may be split into. At 0.25 m²·K/W each that is R ≈ 250 m²·K/W of divisible
 * layers — some twenty times the most insulated real wall; a layer needing more is a slip in d or λ, and the
 * result (12 months × every node) would otherwise grow without bound.
 */
export const MAX_SUBLAYERS = 1000;

/** One layer as the Glaser profile sees it. */
export interface PathLayer {
  /** Thermal resistance R, m²·K/W (0 allowed: a membrane). */
  readonly resistance: number;
  /** s_d, m (greater than 0). */
  readonly sd: number;
  /** Index of the layer in the caller's input, used in node labels and error paths. */
  readonly layer: number;
  /** False keeps the layer whole (air layers: their temperature drop is not linear). */
  readonly divisible: boolean;
}

/** The diffusion path: node coordinates and where each node sits. */
export interface DiffusionPath {
  readonly nodeCount: number;
  /** Thermal resistance from the exterior air to each node, Rse included, m²·K/W. */
  readonly resistance: readonly number[];
  /** s_d from the exterior surface to each node, m. */
  readonly sd: readonly number[];
  /** Input layer on the outer / inner side of each node; −1 at the exterior / interior surface. */
  readonly outerLayer: readonly number[];
  readonly innerLayer: readonly number[];
  /** R_T = Rse + ΣR + Rsi, m²·K/W. */
  readonly totalResistance: number;
  /** s_d,T, m. */
  readonly totalSd: number;
  /** Sub-layers per input layer, in the order given. */
  readonly sublayers: readonly number[];
}

/** Number of equal sub-layers for a layer: ⌈R/R_max⌉, at least 1. */
export const sublayerCount = (resistance: number, divisible: boolean, maxR: number): number =>
  divisible && resistance > maxR ? Math.ceil(resistance / maxR) : 1;

/** Node coordinates (cumulative R and s_d from outside) for layers ordered outside → inside. */
export function assemblePath(
  layers: readonly PathLayer[],
  Rsi: number,
  Rse: number,
  maxSublayerR = SUBLAYER_MAX_R,
): DiffusionPath {
  const sublayers = layers.map((l) => {
    if (!(l.sd > 0 && Number.isFinite(l.sd)))
      throw new CalcInputError(`layers.${l.layer}.vapour`, `s_d must be greater than 0 (got ${l.sd})`);
    if (!(l.resistance >= 0 && Number.isFinite(l.resistance)))
      throw new CalcInputError(
        `layers.${l.layer}`,
        `thermal resistance must be a finite number of 0 or more (got ${l.resistance} m²·K/W)`,
      );
    return sublayerCount(l.resistance, l.divisible, maxSublayerR);
  });
  const total = sublayers.reduce((a, b) => a + b, 0);
  if (total > MAX_SUBLAYERS) {
    let j = 0;
    sublayers.forEach((n, k) => {
      if (n > sublayers[j]!) j = k;
    });
    const l = layers[j]!;
    throw new CalcInputError(
      `layers.${l.layer}`,
      `R = ${l.resistance.toPrecision(4)} m²·K/W needs ${sublayers[j]} sub-layers of at most ${maxSublayerR} m²·K/W; the profile allows ${MAX_SUBLAYERS} in all (${total} asked) — no real wall is that resistive: check the layer's thickness and λ`,
    );
  }
  const resistance = [Rse];
  const sd = [0];
  const outerLayer = [-1];
  const innerLayer: number[] = [];
  let R = Rse;
  let s = 0;
  layers.forEach((l, j) => {
    const n = sublayers[j]!;
    innerLayer.push(l.layer);
    for (let q = 1; q <= n; q++) {
      R += l.resistance / n;
      const next = s + l.sd / n;
      // Two nodes at the same s_d would make the vapour line vertical (p′ = Δp/0).
      if (!(next > s))
        throw new CalcInputError(
          `layers.${l.layer}.vapour`,
          `s_d ${l.sd} m${n > 1 ? ` (in ${n} sub-layers)` : ''} is too small beside the ${s} m of s_d outside it to be resolved`,
        );
      s = next;
      resistance.push(R);
      sd.push(s);
      outerLayer.push(l.layer);
      if (q < n) innerLayer.push(l.layer);
    }
  });
  innerLayer.push(-1);
  return {
    nodeCount: resistance.length,
    resistance,
    sd,
    outerLayer,
    innerLayer,
    totalResistance: R + Rsi,
    totalSd: s,
    sublayers,
  };
}

/** θ_k = θ_e + (R_k/R_T)·(θ_i − θ_e), °C — steady one-dimensional conduction (ISO 13788:2012 §6.2). */
export function nodeTemperatures(path: DiffusionPath, thetaI: number, thetaE: number): number[] {
  const scale = (thetaI - thetaE) / path.totalResistance;
  const theta: number[] = [];
  for (const R of path.resistance) theta.push(thetaE + R * scale);
  return theta;
}

/** p_sat at every node by the ISO 13788 formulas, Pa. */
export function saturationPressures(theta: readonly number[]): number[] {
  const psat: number[] = [];
  for (const t of theta) psat.push(saturationPressureIso13788(t));
  return psat;
}

/** Scratch and output arrays for one profile; allocate once per calculation with `glaserWork(n)`. */
export interface GlaserWork {
  /** Vapour pressure p at every node, Pa. */
  readonly p: number[];
  /** Net condensation rate g at every node, kg/(m²·s) (> 0 condensing, < 0 evaporating). */
  readonly rate: number[];
  /** Nodes on the vapour line's polyline (hull vertices and pinned wet nodes), in order. */
  readonly vertices: number[];
  /** Ordinates the line is pulled under: p_e, p_sat at the inner nodes, p_i. */
  readonly limit: number[];
}

const zeros = (n: number): number[] => new Array<number>(n).fill(0);

export const glaserWork = (nodeCount: number): GlaserWork => ({
  p: zeros(nodeCount),
  rate: zeros(nodeCount),
  vertices: zeros(nodeCount),
  limit: zeros(nodeCount),
});

/**
 * Vapour pressure line and net rates for one steady state (ISO 13788:2012 §6.3). The line runs from p_e at
 * the exterior surface to p_i at the interior surface and may nowhere exceed p_sat. Nodes still holding
 * water (`wet[k] > 0`) are pinned at p = p_sat. Between consecutive pins the line is the lower convex hull of
 * the p_sat(s_d) points — the taut string pulled under the saturation curve; every hull vertex is a
 * condensation plane. At each vertex c the net rate is
 *   g_c = δ₀·[(p_in − p_c)/(s_in − s_c) − (p_c − p_out)/(s_c − s_out)]
 * with the neighbouring vertices on the inner and outer side — for one plane this is ISO's
 * g_c = δ₀[(p_i − p_c)/s′_c − (p_c − p_e)/(s′_T − s′_c)]; a pinned plane whose g_c < 0 is evaporating.
 * Returns the number of vertices (2 when the straight line fits under p_sat and nothing is wet).
 */
export function glaserProfile(
  path: DiffusionPath,
  psat: readonly number[],
  pe: number,
  pi: number,
  wet: readonly number[],
  work: GlaserWork,
): number {
  const n = path.nodeCount;
  const last = n - 1;
  const s = path.sd;
  const { p, rate, vertices, limit: y } = work;
  for (let k = 1; k < last; k++) y[k] = psat[k]!;
  y[0] = pe;
  y[last] = pi;
  let h = 1;
  vertices[0] = 0;
  let base = 0;
  for (let k = 1; k < n; k++) {
    if (k !== last && !(wet[k]! > 0)) continue;
    // Lower hull (monotone chain) of the nodes from the previous pin to node k.
    for (let j = vertices[base]! + 1; j <= k; j++) {
      const sj = s[j]!;
      const yj = y[j]!;
      while (h - base >= 2) {
        const a = vertices[h - 2]!;
        const b = vertices[h - 1]!;
        if ((s[b]! - s[a]!) * (yj - y[a]!) - (y[b]! - y[a]!) * (sj - s[a]!) > 0) break;
        h--;
      }
      vertices[h++] = j;
    }
    base = h - 1;
  }
  rate.fill(0, 0, n);
  for (let v = 0; v < h - 1; v++) {
    const a = vertices[v]!;
    const b = vertices[v + 1]!;
    const ya = y[a]!;
    const sa = s[a]!;
    const slope = (y[b]! - ya) / (s[b]! - sa);
    for (let k = a; k < b; k++) p[k] = ya + slope * (s[k]! - sa);
    // Flux towards the exterior through the segment a–b is δ₀·slope: it enters node a, leaves node b.
    const g = DELTA_0 * slope;
    if (a !== 0) rate[a] = rate[a]! + g;
    if (b !== last) rate[b] = rate[b]! - g;
  }
  p[last] = pi;
  return h;
}
