/**
 * The conduction matrix of a rectilinear grid (7-point stencil, symmetric, positive definite once any cell
 * touches an environment): A·θ = b with A_pp = diag_p and A_pq = −g of the face between p and q.
 * gx[p] is the face between p and p+1 (0 on the last cell of a row), gy[p] between p and p+nx,
 * gz[p] between p and p+nx·ny.
 */
export interface StencilMatrix {
  nx: number;
  ny: number;
  nz: number;
  diag: Float64Array;
  gx: Float64Array;
  gy: Float64Array;
  gz: Float64Array;
}

export interface PcgOutcome {
  iterations: number;
  /** ‖b − A·θ‖ / ‖b‖ at the end. */
  residual: number;
}

/** out = A·v (three sweeps, one per axis, each face adding to both of its cells). */
export function multiply(m: StencilMatrix, v: Float64Array, out: Float64Array): void {
  const { diag, gx, gy, gz } = m;
  const n = diag.length;
  const sy = m.nx;
  const sz = m.nx * m.ny;
  for (let p = 0; p < n; p++) out[p] = diag[p]! * v[p]!;
  for (let p = 0; p + 1 < n; p++) {
    const g = gx[p]!;
    if (g !== 0) {
      out[p] = out[p]! - g * v[p + 1]!;
      out[p + 1] = out[p + 1]! - g * v[p]!;
    }
  }
  for (let p = 0; p + sy < n; p++) {
    const g = gy[p]!;
    if (g !== 0) {
      out[p] = out[p]! - g * v[p + sy]!;
      out[p + sy] = out[p + sy]! - g * v[p]!;
    }
  }
  for (let p = 0; p + sz < n; p++) {
    const g = gz[p]!;
    if (g !== 0) {
      out[p] = out[p]! - g * v[p + sz]!;
      out[p + sz] = out[p + sz]! - g * v[p]!;
    }
  }
}

/**
 * Pivots of the incomplete Cholesky factorisation without fill-in, IC(0): M = (D̃ + L) D̃⁻¹ (D̃ + Lᵀ) with
 * d̃_p = a_pp − Σ_{q<p} a_pq² / d̃_q over the lower neighbours (Meijerink & van der Vorst, Math. Comp. 31,
 * 1977, eq. 3.3); it exists for this M-matrix (diagonally dominant, non-positive off-diagonal).
 */
export function icPivots(m: StencilMatrix): Float64Array {
  const { diag, gx, gy, gz } = m;
  const n = diag.length;
  const sy = m.nx;
  const sz = m.nx * m.ny;
  const d = new Float64Array(n);
  for (let p = 0; p < n; p++) {
    let v = diag[p]!;
    if (p >= 1) v -= (gx[p - 1]! * gx[p - 1]!) / d[p - 1]!;
    if (p >= sy) v -= (gy[p - sy]! * gy[p - sy]!) / d[p - sy]!;
    if (p >= sz) v -= (gz[p - sz]! * gz[p - sz]!) / d[p - sz]!;
    d[p] = v > diag[p]! * 1e-12 ? v : diag[p]!;
  }
  return d;
}

/** z = M⁻¹·r with the IC(0) factors: forward (D̃ + L)·w = r, then backward (D̃ + Lᵀ)·z = D̃·w. */
export function icApply(m: StencilMatrix, d: Float64Array, r: Float64Array, z: Float64Array): void {
  const { gx, gy, gz } = m;
  const n = d.length;
  const sy = m.nx;
  const sz = m.nx * m.ny;
  for (let p = 0; p < n; p++) {
    let v = r[p]!;
    if (p >= 1) v += gx[p - 1]! * z[p - 1]!;
    if (p >= sy) v += gy[p - sy]! * z[p - sy]!;
    if (p >= sz) v += gz[p - sz]! * z[p - sz]!;
    z[p] = v / d[p]!;
  }
  for (let p = n - 1; p >= 0; p--) {
    let v = 0;
    if (p + 1 < n) v += gx[p]! * z[p + 1]!;
    if (p + sy < n) v += gy[p]! * z[p + sy]!;
    if (p + sz < n) v += gz[p]! * z[p + sz]!;
    z[p] = z[p]! + v / d[p]!;
  }
}

const dot = (a: Float64Array, b: Float64Array) => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
};

/**
 * Preconditioned conjugate gradient (Hestenes & Stiefel 1952; Saad, Iterative Methods for Sparse Linear
 * Systems, 2nd ed., Algorithm 9.1) with the IC(0) preconditioner, from the start value in θ, until
 * ‖r‖ ≤ tolerance·‖b‖ or maxIterations. θ is overwritten with the solution.
 */
export function solvePcg(
  m: StencilMatrix,
  b: Float64Array,
  theta: Float64Array,
  tolerance = 1e-10,
  maxIterations = 20_000,
): PcgOutcome {
  const n = b.length;
  const d = icPivots(m);
  const r = new Float64Array(n);
  const z = new Float64Array(n);
  const q = new Float64Array(n);
  multiply(m, theta, q);
  for (let i = 0; i < n; i++) r[i] = b[i]! - q[i]!;
  const bNorm = Math.sqrt(dot(b, b)) || 1;
  let rNorm = Math.sqrt(dot(r, r));
  if (rNorm <= tolerance * bNorm) return { iterations: 0, residual: rNorm / bNorm };
  icApply(m, d, r, z);
  const p = Float64Array.from(z);
  let rz = dot(r, z);
  let k = 0;
  while (k < maxIterations) {
    k++;
    multiply(m, p, q);
    const alpha = rz / dot(p, q);
    for (let i = 0; i < n; i++) {
      theta[i] = theta[i]! + alpha * p[i]!;
      r[i] = r[i]! - alpha * q[i]!;
    }
    rNorm = Math.sqrt(dot(r, r));
    if (rNorm <= tolerance * bNorm) break;
    icApply(m, d, r, z);
    const rzNext = dot(r, z);
    const beta = rzNext / rz;
    rz = rzNext;
    for (let i = 0; i < n; i++) p[i] = z[i]! + beta * p[i]!;
  }
  return { iterations: k, residual: rNorm / bNorm };
}
