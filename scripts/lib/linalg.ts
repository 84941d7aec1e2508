/** Small dense linear algebra for the fitting scripts (not used by the app). */
import { solveDense } from '../../thermo/solvers/linear.js';

/** Solves A·x = b (A n×n, copied) with the core's Gaussian elimination; throws when singular. */
export function solve(Ain: number[][], bin: number[]): number[] {
  const x = solveDense(
    Ain.map((r) => r.slice()),
    bin.slice(),
  );
  if (!x) throw new Error('singular matrix');
  return x;
}

/** Weighted linear least squares: minimise Σ w_i (Σ_k X_ik β_k − y_i)², with ridge λ. */
export function leastSquares(X: number[][], y: number[], w?: number[], ridge = 0): number[] {
  const m = X[0]!.length;
  const N = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  const r = new Array<number>(m).fill(0);
  X.forEach((row, i) => {
    const wi = w?.[i] ?? 1;
    for (let a = 0; a < m; a++) {
      r[a]! += wi * row[a]! * y[i]!;
      for (let b = 0; b < m; b++) N[a]![b]! += wi * row[a]! * row[b]!;
    }
  });
  for (let a = 0; a < m; a++) N[a]![a]! += ridge * (N[a]![a]! || 1);
  return solve(N, r);
}

/**
 * Levenberg–Marquardt on residuals(params) → number[], forward-difference Jacobian.
 * Returns the parameters and the final sum of squares.
 */
export function levenbergMarquardt(
  residuals: (p: number[]) => number[],
  start: number[],
  maxIter = 200,
): { params: number[]; ssq: number } {
  let p = start.slice();
  let r = residuals(p);
  let ssq = r.reduce((s, x) => s + x * x, 0);
  let lambda = 1e-3;
  for (let it = 0; it < maxIter; it++) {
    const J = p.map((_, k) => {
      const h = 1e-7 * Math.max(1, Math.abs(p[k]!));
      const q = p.slice();
      q[k]! += h;
      const rq = residuals(q);
      return rq.map((x, i) => (x - r[i]!) / h);
    });
    const n = p.length;
    const JTJ = Array.from({ length: n }, (_, a) =>
      Array.from({ length: n }, (_, b) => J[a]!.reduce((s, x, i) => s + x * J[b]![i]!, 0)),
    );
    const JTr = Array.from({ length: n }, (_, a) => J[a]!.reduce((s, x, i) => s + x * r[i]!, 0));
    let improved = false;
    for (let tries = 0; tries < 20; tries++) {
      const M = JTJ.map((row, a) => row.map((x, b) => (a === b ? x * (1 + lambda) + 1e-30 : x)));
      const step = solve(
        M,
        JTr.map((x) => -x),
      );
      const q = p.map((x, k) => x + step[k]!);
      let rq: number[];
      try {
        rq = residuals(q);
      } catch {
        lambda *= 10;
        continue;
      }
      const s = rq.reduce((acc, x) => acc + x * x, 0);
      if (Number.isFinite(s) && s < ssq) {
        const rel = (ssq - s) / ssq;
        p = q;
        r = rq;
        ssq = s;
        lambda = Math.max(lambda / 10, 1e-12);
        improved = true;
        if (rel < 1e-12) return { params: p, ssq };
        break;
      }
      lambda *= 10;
    }
    if (!improved) break;
  }
  return { params: p, ssq };
}
