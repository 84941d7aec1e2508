/** Tangent-plane stability of a mixture feed at (T, p). */
import { phaseAt, type MixtureAtT } from './mixtureModel.js';
import { wilsonK } from './wilson.js';

function norm1(x: Float64Array): number {
  let s = 0;
  for (const v of x) s += v;
  return s;
}

/**
 * Michelsen's tangent-plane stability test (1982, Fluid Phase Equilib. 9, 1–19) with a
 * vapour-like and a liquid-like trial phase from Wilson's K. Returns true when the feed at
 * (T, p) is stable as one phase, with the K-values of the unstable trial phase otherwise.
 */
export function stabilityTest(
  mx: MixtureAtT,
  z: ArrayLike<number>,
  p: number,
): { stable: boolean; K?: Float64Array } {
  const { n } = mx;
  if (n === 1) return { stable: true };
  const feed = phaseAt(mx, p, z, 'stable', false);
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) d[i] = Math.log(Math.max(z[i]!, 1e-300)) + feed.lnPhi[i]!;
  const Kw = wilsonK(mx.product, mx.T, p);
  let best: { tm: number; K: Float64Array } | undefined;
  for (const vapourLike of [true, false]) {
    const W = Float64Array.from(z, (zi, i) => (vapourLike ? zi * Kw[i]! : zi / Kw[i]!));
    let sumW = 0;
    for (let it = 0; it < 200; it++) {
      sumW = norm1(W);
      const w = Float64Array.from(W, (v) => v / sumW);
      const trial = phaseAt(mx, p, w, vapourLike ? 'vapour' : 'liquid', false);
      let change = 0;
      for (let i = 0; i < n; i++) {
        const next = Math.exp(d[i]! - trial.lnPhi[i]!);
        change = Math.max(change, Math.abs(Math.log(next / Math.max(W[i]!, 1e-300))));
        W[i] = next;
      }
      if (change < 1e-10) break;
    }
    sumW = norm1(W);
    let trivial = 0;
    for (let i = 0; i < n; i++) trivial += (W[i]! / sumW - z[i]!) ** 2;
    if (sumW > 1 + 1e-8 && trivial > 1e-8) {
      const K = Float64Array.from(W, (v, i) =>
        vapourLike ? v / sumW / z[i]! : z[i]! / (v / sumW),
      );
      const tm = 1 - sumW;
      if (!best || tm < best.tm) best = { tm, K };
    }
  }
  return best ? { stable: false, K: best.K } : { stable: true };
}
