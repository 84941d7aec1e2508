/** Tangent-plane stability of a mixture feed at (T, p). */
import { phaseAt, type MixtureAtT } from './mixtureModel.js';
import { wilsonK } from './wilson.js';

function norm1(x: Float64Array): number {
  let s = 0;
  for (const v of x) s += v;
  return s;
}

export interface StabilityResult {
  stable: boolean;
  /** K-values of the unstable trial phase with the lower tangent-plane distance. */
  K?: Float64Array;
  /**
   * The lower of the two trials' tangent-plane distances at their stationary points,
   * tm = 1 − ΣW (negative: the feed splits; about 0 at a trivial solution).
   */
  tm: number;
  /** Successive-substitution steps of both trial phases together (each stops at 200). */
  iterations: number;
}

/**
 * Michelsen's tangent-plane stability test (1982, Fluid Phase Equilib. 9, 1–19) with a
 * vapour-like and a liquid-like trial phase from Wilson's K. Returns stable when no trial
 * phase lowers the tangent-plane distance below −1e-8, with the K-values of the unstable
 * trial phase otherwise.
 */
export function stabilityTest(mx: MixtureAtT, z: ArrayLike<number>, p: number): StabilityResult {
  const { n } = mx;
  if (n === 1) return { stable: true, tm: 0, iterations: 0 };
  const feed = phaseAt(mx, p, z, 'stable', false);
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) d[i] = Math.log(Math.max(z[i]!, 1e-300)) + feed.lnPhi[i]!;
  const Kw = wilsonK(mx.product, mx.T, p);
  let best: { tm: number; K: Float64Array } | undefined;
  let tmMin = Infinity;
  let iterations = 0;
  for (const vapourLike of [true, false]) {
    const W = Float64Array.from(z, (zi, i) => (vapourLike ? zi * Kw[i]! : zi / Kw[i]!));
    let sumW = 0;
    let done = false;
    for (let it = 1; it <= 200 && !done; it++) {
      sumW = norm1(W);
      const w = Float64Array.from(W, (v) => v / sumW);
      const trial = phaseAt(mx, p, w, vapourLike ? 'vapour' : 'liquid', false);
      let change = 0;
      for (let i = 0; i < n; i++) {
        const next = Math.exp(d[i]! - trial.lnPhi[i]!);
        change = Math.max(change, Math.abs(Math.log(next / Math.max(W[i]!, 1e-300))));
        W[i] = next;
      }
      iterations++;
      done = change < 1e-10;
    }
    sumW = norm1(W);
    const tm = 1 - sumW;
    tmMin = Math.min(tmMin, tm);
    let trivial = 0;
    for (let i = 0; i < n; i++) trivial += (W[i]! / sumW - z[i]!) ** 2;
    if (tm < -1e-8 && trivial > 1e-8 && !(best && best.tm <= tm)) {
      const K = Float64Array.from(W, (v, i) =>
        vapourLike ? v / sumW / z[i]! : z[i]! / (v / sumW),
      );
      best = { tm, K };
    }
  }
  const report = { tm: tmMin, iterations };
  return best ? { stable: false, K: best.K, ...report } : { stable: true, ...report };
}
