/** Small dense linear algebra and iteration acceleration shared by the solvers. */

/** Gaussian elimination with partial pivoting; null when singular. */
export function solveDense(A: number[][], b: number[]): number[] | null {
  const n = b.length;
  const M = new Float64Array(n * n);
  for (let r = 0; r < n; r++) for (let c = 0; c < n; c++) M[r * n + c] = A[r]![c]!;
  const x = Float64Array.from(b);
  return solveInPlace(M, x, n) ? Array.from(x) : null;
}

/**
 * Gaussian elimination with partial pivoting on an n×n row-major matrix M and right-hand side
 * x, both overwritten (x by the solution): no allocation, for the inner loops of Newton's
 * method. False when M is singular or the solution is not finite.
 */
export function solveInPlace(M: Float64Array, x: Float64Array, n: number): boolean {
  for (let c = 0; c < n; c++) {
    let piv = c;
    for (let r = c + 1; r < n; r++)
      if (Math.abs(M[r * n + c]!) > Math.abs(M[piv * n + c]!)) piv = r;
    if (Math.abs(M[piv * n + c]!) < 1e-300) return false;
    if (piv !== c) {
      for (let k = 0; k < n; k++) {
        const t = M[c * n + k]!;
        M[c * n + k] = M[piv * n + k]!;
        M[piv * n + k] = t;
      }
      const t = x[c]!;
      x[c] = x[piv]!;
      x[piv] = t;
    }
    for (let r = c + 1; r < n; r++) {
      const f = M[r * n + c]! / M[c * n + c]!;
      for (let k = c; k < n; k++) M[r * n + k]! -= f * M[c * n + k]!;
      x[r]! -= f * x[c]!;
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r]!;
    for (let k = r + 1; k < n; k++) s -= M[r * n + k]! * x[k]!;
    x[r] = s / M[r * n + r]!;
    if (!Number.isFinite(x[r]!)) return false;
  }
  return true;
}

/**
 * Dominant-eigenvalue extrapolation of a linearly converging fixed-point iteration (Crowe &
 * Nishio 1975, AIChE J. 21, 528): with the last three iterates u0, u1, u2 approaching the
 * solution along one direction with ratio λ = (Δ2·Δ2)/(Δ2·Δ1), jump ahead by λ/(1 − λ)·Δ2.
 * Updates u2 in place and returns true when the step was taken (0 < λ < 0.95).
 */
export function extrapolate(u0: Float64Array, u1: Float64Array, u2: Float64Array): boolean {
  let dd = 0;
  let dp = 0;
  for (let i = 0; i < u2.length; i++) {
    const d2 = u2[i]! - u1[i]!;
    dd += d2 * d2;
    dp += d2 * (u1[i]! - u0[i]!);
  }
  const lambda = dp !== 0 ? dd / dp : 0;
  if (!(lambda > 0 && lambda < 0.95)) return false;
  const f = lambda / (1 - lambda);
  for (let i = 0; i < u2.length; i++) u2[i] = u2[i]! + f * (u2[i]! - u1[i]!);
  return true;
}
