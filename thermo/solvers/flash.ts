/** Rachford–Rice and the two-phase PT flash of a mixture. */
import { ConvergenceError } from '../errors.js';
import { extrapolate } from './linear.js';
import { phaseAt, type MixtureAtT } from './mixtureModel.js';
import type { SolverReport } from './result.js';
import { wilsonK } from './wilson.js';

/**
 * Rachford–Rice: solves Σ z_i(K_i − 1)/(1 + β(K_i − 1)) = 0 for the vapour fraction β on its
 * physical interval, by Newton kept inside a bisection bracket. Returns β in [0, 1] clipped
 * when the feed lies outside the two-phase window of these K (then one phase is implied).
 */
export function rachfordRice(z: ArrayLike<number>, K: ArrayLike<number>): number {
  return rachfordRiceSteps(z, K).beta;
}

/**
 * Rachford–Rice as above, with the number of passes (Newton or bisection steps; 0 when β is
 * clipped, 101 if the cap of 100 was hit). For positive K the poles 1/(1 − K_i) lie outside
 * [0, 1], so [0, 1] itself is the bracket: the sum falls monotonically from f(0) > 0 to f(1) < 0.
 */
export function rachfordRiceSteps(
  z: ArrayLike<number>,
  K: ArrayLike<number>,
): { beta: number; iterations: number } {
  const n = z.length;
  const f = (beta: number) => {
    let s = 0;
    for (let i = 0; i < n; i++) s += (z[i]! * (K[i]! - 1)) / (1 + beta * (K[i]! - 1));
    return s;
  };
  if (f(0) <= 0) return { beta: 0, iterations: 0 };
  if (f(1) >= 0) return { beta: 1, iterations: 0 };
  let lo = 0;
  let hi = 1;
  let beta = 0.5;
  let it = 1;
  for (; it <= 100; it++) {
    let fv = 0;
    let df = 0;
    for (let i = 0; i < n; i++) {
      const d = K[i]! - 1;
      const den = 1 + beta * d;
      fv += (z[i]! * d) / den;
      df -= (z[i]! * d * d) / (den * den);
    }
    const step = fv / df;
    if (Math.abs(step) < 1e-15) break;
    if (fv > 0) lo = beta;
    else hi = beta;
    const next = beta - step;
    // β stays strictly inside (lo, hi) ⊂ (0, 1): at β = 1 a component with K = 0 (its K
    // underflowed) would divide by zero. A root closer to 1 than a double can show ends here.
    const mid = 0.5 * (lo + hi);
    if (!(next > lo && next < hi) && !(mid > lo && mid < hi)) break;
    beta = next > lo && next < hi ? next : mid;
  }
  return { beta, iterations: it };
}

export interface FlashResult extends SolverReport {
  /** Vapour mole fraction. */
  beta: number;
  x: Float64Array;
  y: Float64Array;
  /** Translated molar volumes, m³/mol. */
  vL: number;
  vV: number;
  K: Float64Array;
}

/**
 * Two-phase PT flash by successive substitution with Rachford–Rice, started from the given K
 * (or Wilson's). Residual: max |ln K_new − ln K|. The caller is responsible for knowing the
 * feed is two-phase at (T, p) (see `stabilityTest`), or for reading β at 0 or 1.
 */
export function flashPT(
  mx: MixtureAtT,
  z: ArrayLike<number>,
  p: number,
  K0?: Float64Array,
): FlashResult {
  const { n } = mx;
  const K = K0 ? Float64Array.from(K0) : wilsonK(mx.product, mx.T, p);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  let resid = Infinity;
  let beta = 0;
  let vL = NaN;
  let vV = NaN;
  // Dominant-eigenvalue acceleration every fourth step, as in saturationPressure.
  const u0 = new Float64Array(n);
  const u1 = new Float64Array(n);
  const u2 = new Float64Array(n);
  for (let it = 1; it <= 500; it++) {
    beta = rachfordRice(z, K);
    let sx = 0;
    let sy = 0;
    for (let i = 0; i < n; i++) {
      x[i] = z[i]! / (1 + beta * (K[i]! - 1));
      y[i] = K[i]! * x[i]!;
      sx += x[i]!;
      sy += y[i]!;
    }
    for (let i = 0; i < n; i++) {
      x[i] = x[i]! / sx;
      y[i] = y[i]! / sy;
    }
    const L = phaseAt(mx, p, x, 'liquid', false);
    const V = phaseAt(mx, p, y, 'vapour', false);
    resid = 0;
    u0.set(u1);
    u1.set(u2);
    for (let i = 0; i < n; i++) {
      const lnK = L.lnPhi[i]! - V.lnPhi[i]!;
      resid = Math.max(resid, Math.abs(lnK - Math.log(K[i]!)));
      K[i] = Math.exp(lnK);
      u2[i] = lnK;
    }
    if (resid >= 1e-10 && it >= 3 && it % 4 === 3 && extrapolate(u0, u1, u2)) {
      for (let i = 0; i < n; i++) K[i] = Math.exp(u2[i]!);
    }
    if (resid < 1e-10) {
      // Volumes only once, at the solution: the iterations need fugacities alone.
      vL = phaseAt(mx, p, x, 'liquid').v;
      vV = phaseAt(mx, p, y, 'vapour').v;
      return {
        beta,
        x,
        y,
        vL,
        vV,
        K,
        converged: true,
        iterations: it,
        residual: resid,
        reason: 'converged',
      };
    }
  }
  throw new ConvergenceError(
    'PT flash',
    `successive substitution stalled at T = ${mx.T} K, p = ${p} Pa`,
    500,
    resid,
  );
}
