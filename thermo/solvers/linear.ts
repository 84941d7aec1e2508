/** Small dense linear algebra and iteration acceleration shared by the solvers. */

/** Gaussian elimination with partial pivoting; null when singular. */
export function solveDense(A: number[][], b: number[]): number[] | null {
  const n = b.length;
  for (let c = 0; c < n; c++) {
    let piv = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(A[r]![c]!) > Math.abs(A[piv]![c]!)) piv = r;
    if (Math.abs(A[piv]![c]!) < 1e-300) return null;
    [A[c], A[piv]] = [A[piv]!, A[c]!];
    [b[c], b[piv]] = [b[piv]!, b[c]!];
    for (let r = c + 1; r < n; r++) {
      const f = A[r]![c]! / A[c]![c]!;
      for (let k = c; k < n; k++) A[r]![k]! -= f * A[c]![k]!;
      b[r]! -= f * b[c]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r]!;
    for (let k = r + 1; k < n; k++) s -= A[r]![k]! * x[k]!;
    x[r] = s / A[r]![r]!;
  }
  return x.every(Number.isFinite) ? x : null;
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
