/**
 * Mixtures with the van der Waals one-fluid rule:
 *   a = Σ_i Σ_j x_i·x_j·√(a_i·a_j)·(1 − k_ij(T)),  k_ij(T) = k_ij + k'_ij·t + k''_ij·t²,
 *   plus an asymmetric term where a pair has one (eos/asymmetricMixing.ts),
 *   t = T/T_REF − 1 (data/kij.ts),  b = Σ x_i·b_i,  c = Σ x_i·c_i (translation).
 * Fugacity coefficients of the generic cubic:
 *   ln φ_i = (b_i/b)(Z − 1) − ln(Z − B) − (A/B)·(2·Σ_j x_j·a_ij/a − b_i/b)·L − c_i·p/(R·T),
 * with L = ln((Z + δ1·B)/(Z + δ2·B))/(δ1 − δ2). The translation term is the same in every
 * phase, so it is left out of the equilibrium iterations.
 */
import { R_J_molK } from '../constants.js';
import { ConvergenceError } from '../errors.js';
import { compressibilityRoots, logTerm } from '../eos/cubic.js';
import { T_REF_KIJ } from '../data/kij.js';
import { mixtureModelVolume } from '../eos/blendVolume.js';
import { addAsymmetricAttraction } from '../eos/asymmetricMixing.js';
import type { ResolvedProduct } from '../product.js';
import type { RootChoice } from './pure.js';
import { pureSaturation } from './pure.js';
import { extrapolate, solveDense } from './linear.js';
import type { SolverReport } from './result.js';

const R = R_J_molK;

/** Temperature-dependent pure-component coefficients of a mixture, computed once per T. */
export interface MixtureAtT {
  readonly T: number;
  readonly n: number;
  /** a_ij = √(a_i a_j)(1 − k_ij), row-major n×n. */
  readonly aij: Float64Array;
  readonly b: Float64Array;
  /** Critical temperatures and cubic critical volumes of the components (for the volume correction). */
  readonly Tc: Float64Array;
  readonly vcCub: Float64Array;
  readonly M: Float64Array;
  readonly product: ResolvedProduct;
}

export function mixtureAtT(product: ResolvedProduct, T: number): MixtureAtT {
  const n = product.components.length;
  const a = new Float64Array(n);
  const b = new Float64Array(n);
  const Tc = new Float64Array(n);
  const vcCub = new Float64Array(n);
  const M = new Float64Array(n);
  product.components.forEach((m, i) => {
    a[i] = m.ac * m.alpha(T).alpha;
    b[i] = m.b;
    Tc[i] = m.Tc;
    vcCub[i] = m.vcCub;
    M[i] = m.molarMass;
  });
  const aij = new Float64Array(n * n);
  const t = T / T_REF_KIJ - 1;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const k =
        (product.kij[i]?.[j] ?? 0) +
        t * ((product.kijSlope?.[i]?.[j] ?? 0) + t * (product.kijCurve?.[i]?.[j] ?? 0));
      aij[i * n + j] = Math.sqrt(a[i]! * a[j]!) * (1 - k);
    }
  return { T, n, aij, b, Tc, vcCub, M, product };
}

export interface PhaseState {
  Z: number;
  /** ln φ_i without the translation term. */
  lnPhi: Float64Array;
  /** The model's molar volume, m³/mol. */
  v: number;
  /** The cubic's molar volume, m³/mol. */
  vCub: number;
  /** Number of real roots the cubic had (1 or 3). */
  nRoots: number;
}

const family = (mx: MixtureAtT) => mx.product.components[0]!.family;

/**
 * Phase properties at (T, p) for composition x on the chosen root. Iterations that need only
 * ln φ pass `withVolume = false` (then `v` is NaN) and skip the volume correction.
 */
export function phaseAt(
  mx: MixtureAtT,
  p: number,
  x: ArrayLike<number>,
  choice: RootChoice,
  withVolume = true,
): PhaseState {
  const { n, aij, b, T } = mx;
  const fam = family(mx);
  let am = 0;
  let bm = 0;
  const s = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let si = 0;
    for (let j = 0; j < n; j++) si += x[j]! * aij[i * n + j]!;
    s[i] = si;
    am += x[i]! * si;
    bm += x[i]! * b[i]!;
  }
  const asym = mx.product.kijAsym;
  if (asym) am -= addAsymmetricAttraction(aij, asym, x, n, s);
  const A = (am * p) / (R * R * T * T);
  const B = (bm * p) / (R * T);
  const roots = compressibilityRoots(fam, A, B);
  if (roots.length === 0)
    throw new ConvergenceError('cubic roots', 'no root above the co-volume', 0, NaN);
  const zL = roots[0]!;
  const zV = roots[roots.length - 1]!;
  const lnPhiFor = (Z: number) => {
    const L = logTerm(fam, Z, B);
    const base = -Math.log(Z - B);
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const bi = b[i]! / bm;
      out[i] = bi * (Z - 1) + base - (A / B) * ((2 * s[i]!) / am - bi) * L;
    }
    return out;
  };
  let Z: number;
  let lnPhi: Float64Array;
  if (roots.length === 1 || choice === 'liquid') {
    Z = zL;
    lnPhi = lnPhiFor(zL);
  } else if (choice === 'vapour') {
    Z = zV;
    lnPhi = lnPhiFor(zV);
  } else {
    const fL = lnPhiFor(zL);
    const fV = lnPhiFor(zV);
    let gL = 0;
    let gV = 0;
    for (let i = 0; i < n; i++) {
      gL += x[i]! * fL[i]!;
      gV += x[i]! * fV[i]!;
    }
    [Z, lnPhi] = gL <= gV ? [zL, fL] : [zV, fV];
  }
  const vCub = (Z * R * T) / p;
  return {
    Z,
    lnPhi,
    v: withVolume ? mixtureModelVolume(mx, x, vCub, am, bm) : NaN,
    vCub,
    nRoots: roots.length,
  };
}

/** The volume-correction mixing rule of blends lives in eos/blendVolume.ts. */
export { mixtureModelVolume } from '../eos/blendVolume.js';

/** Wilson's K-value estimate: K_i = (pc_i/p)·exp(5.373(1 + ω_i)(1 − Tc_i/T)). */
export function wilsonK(product: ResolvedProduct, T: number, p: number): Float64Array {
  return Float64Array.from(
    product.components,
    (m) => (m.pc / p) * Math.exp(5.373 * (1 + m.omega) * (1 - m.Tc / T)),
  );
}

export interface SaturationPoint extends SolverReport {
  /** Pa */
  p: number;
  /** Composition of the incipient phase (vapour at a bubble point, liquid at a dew point). */
  incipient: Float64Array;
  /** Translated molar volume of the given-composition phase, m³/mol. */
  vBulk: number;
  /** Translated molar volume of the incipient phase, m³/mol. */
  vIncipient: number;
}

function norm1(x: Float64Array): number {
  let s = 0;
  for (const v of x) s += v;
  return s;
}

/**
 * Bubble (kind = 'bubble') or dew (kind = 'dew') pressure at T for the given composition.
 * First successive substitution on K_i = φ_i,L/φ_i,V with the pressure update p ← p·Σ K_i x_i
 * (bubble) or p ← p/Σ y_i/K_i (dew); where that is slow (near the blend's critical region)
 * Newton's method on (ln K_i, ln p) with a finite-difference Jacobian takes over (Michelsen &
 * Mollerup, Thermodynamic Models: Fundamentals and Computational Aspects, ch. 12). Residual:
 * max of |Σ − 1| and the fugacity residuals. Rejects the trivial solution (phases of equal
 * composition), which means T is above the blend's critical region.
 */
export function saturationPressure(
  mx: MixtureAtT,
  z: ArrayLike<number>,
  kind: 'bubble' | 'dew',
  start?: { p: number; K: Float64Array },
): SaturationPoint {
  const { n, T, product } = mx;
  let p: number;
  let K: Float64Array;
  if (start) {
    p = start.p;
    K = Float64Array.from(start.K);
  } else {
    // Raoult-style start from pure vapour pressures (Wilson's estimate above a component's Tc).
    let s = 0;
    const ps = product.components.map((m) => {
      if (T < m.Tc - 0.5) {
        try {
          return pureSaturation(m, T).p;
        } catch {
          /* fall through to Wilson */
        }
      }
      return m.pc * Math.exp(5.373 * (1 + m.omega) * (1 - m.Tc / T));
    });
    if (kind === 'bubble') for (let i = 0; i < n; i++) s += z[i]! * ps[i]!;
    else {
      for (let i = 0; i < n; i++) s += z[i]! / ps[i]!;
      s = 1 / s;
    }
    p = s;
    K = Float64Array.from(ps, (x) => x / p);
  }
  const bulkChoice = kind === 'bubble' ? 'liquid' : 'vapour';
  const incChoice = kind === 'bubble' ? 'vapour' : 'liquid';
  const w = new Float64Array(n);
  const incipientOf = (Kv: ArrayLike<number>, out: Float64Array) => {
    let S = 0;
    for (let i = 0; i < n; i++) {
      out[i] = kind === 'bubble' ? Kv[i]! * z[i]! : z[i]! / Kv[i]!;
      S += out[i]!;
    }
    for (let i = 0; i < n; i++) out[i] = out[i]! / S;
    return S;
  };
  const finish = (it: number, resid: number): SaturationPoint => {
    incipientOf(K, w);
    return {
      p,
      incipient: Float64Array.from(w),
      vBulk: phaseAt(mx, p, z, bulkChoice).v,
      vIncipient: phaseAt(mx, p, w, incChoice).v,
      converged: true,
      iterations: it,
      residual: resid,
      reason: 'converged',
    };
  };
  let resid = Infinity;
  let it = 0;
  // Successive substitution, accelerated every fourth step by the dominant-eigenvalue
  // extrapolation (Crowe & Nishio 1975, AIChE J. 21, 528): the iterates of (ln K, ln p) approach
  // the solution along one direction, with ratio λ; jump ahead by λ/(1 − λ) of the last step.
  const u0 = new Float64Array(n + 1);
  const u1 = new Float64Array(n + 1);
  const u2 = new Float64Array(n + 1);
  for (; it < 25; it++) {
    incipientOf(K, w);
    const bulk = phaseAt(mx, p, z, bulkChoice, false);
    const inc = phaseAt(mx, p, w, incChoice, false);
    let S2 = 0;
    let trivial = 0;
    for (let i = 0; i < n; i++) {
      const lnK =
        kind === 'bubble' ? bulk.lnPhi[i]! - inc.lnPhi[i]! : inc.lnPhi[i]! - bulk.lnPhi[i]!;
      K[i] = Math.exp(lnK);
      trivial += lnK * lnK;
      S2 += kind === 'bubble' ? K[i]! * z[i]! : z[i]! / K[i]!;
    }
    resid = Math.abs(S2 - 1);
    if (trivial < 1e-8) break;
    if (resid < 1e-11) return finish(it + 1, resid);
    const pNew = kind === 'bubble' ? p * S2 : p / S2;
    // Damp large jumps so a poor start cannot throw the iteration out of the two-root region.
    p = Math.min(Math.max(pNew, p / 3), p * 3);
    if (!Number.isFinite(p) || p <= 0) break;
    u0.set(u1);
    u1.set(u2);
    for (let i = 0; i < n; i++) u2[i] = Math.log(K[i]!);
    u2[n] = Math.log(p);
    if (it >= 2 && it % 4 === 3 && extrapolate(u0, u1, u2)) {
      for (let i = 0; i < n; i++) K[i] = Math.exp(u2[i]!);
      p = Math.exp(u2[n]!);
    }
  }
  // Newton on u = (ln K_1 … ln K_n, ln p).
  const F = (u: Float64Array, out: Float64Array): boolean => {
    const pp = Math.exp(u[n]!);
    const Kv = u.subarray(0, n).map(Math.exp);
    const S = incipientOf(Kv, w);
    const bulk = phaseAt(mx, pp, z, bulkChoice, false);
    const inc = phaseAt(mx, pp, w, incChoice, false);
    if (bulk.nRoots === 1 && inc.nRoots === 1 && Math.abs(bulk.Z - inc.Z) < 1e-9) return false;
    for (let i = 0; i < n; i++) {
      out[i] =
        kind === 'bubble'
          ? u[i]! + inc.lnPhi[i]! - bulk.lnPhi[i]!
          : u[i]! + bulk.lnPhi[i]! - inc.lnPhi[i]!;
    }
    out[n] = S - 1;
    return true;
  };
  const u = new Float64Array(n + 1);
  if (!Number.isFinite(p) || p <= 0) p = start?.p ?? product.components[0]!.pc * 0.5;
  for (let i = 0; i < n; i++) u[i] = Math.log(K[i]!);
  u[n] = Math.log(p);
  const f0 = new Float64Array(n + 1);
  const f1 = new Float64Array(n + 1);
  for (let nit = 0; nit < 60; nit++, it++) {
    if (!F(u, f0)) break;
    resid = Math.max(...f0.map(Math.abs));
    let trivial = 0;
    for (let i = 0; i < n; i++) trivial += u[i]! * u[i]!;
    if (trivial < 1e-8) break;
    if (resid < 1e-10) {
      p = Math.exp(u[n]!);
      for (let i = 0; i < n; i++) K[i] = Math.exp(u[i]!);
      return finish(it + 1, resid);
    }
    const J: number[][] = Array.from({ length: n + 1 }, () => new Array<number>(n + 1).fill(0));
    for (let k = 0; k <= n; k++) {
      const h = 1e-7;
      const uk = u[k]!;
      u[k] = uk + h;
      const ok = F(u, f1);
      u[k] = uk;
      if (!ok) break;
      for (let r = 0; r <= n; r++) J[r]![k] = (f1[r]! - f0[r]!) / h;
    }
    const step = solveDense(
      J,
      Array.from(f0, (x) => -x),
    );
    if (!step) break;
    const big = Math.max(...step.map(Math.abs));
    const scale = big > 0.3 ? 0.3 / big : 1;
    for (let k = 0; k <= n; k++) u[k] = u[k]! + scale * step[k]!;
  }
  throw new ConvergenceError(
    `${kind} pressure`,
    `no ${kind} point found at T = ${T} K (above the blend's critical region?)`,
    it,
    resid,
  );
}

/**
 * Rachford–Rice: solves Σ z_i(K_i − 1)/(1 + β(K_i − 1)) = 0 for the vapour fraction β on its
 * physical interval, by Newton kept inside a bisection bracket. Returns β in [0, 1] clipped
 * when the feed lies outside the two-phase window of these K (then one phase is implied).
 */
export function rachfordRice(z: ArrayLike<number>, K: ArrayLike<number>): number {
  const n = z.length;
  let kmin = Infinity;
  let kmax = -Infinity;
  for (let i = 0; i < n; i++) {
    kmin = Math.min(kmin, K[i]!);
    kmax = Math.max(kmax, K[i]!);
  }
  const f = (beta: number) => {
    let s = 0;
    for (let i = 0; i < n; i++) s += (z[i]! * (K[i]! - 1)) / (1 + beta * (K[i]! - 1));
    return s;
  };
  if (f(0) <= 0) return 0;
  if (f(1) >= 0) return 1;
  let lo = kmax > 1 ? 1 / (1 - kmax) : 0;
  let hi = kmin < 1 ? 1 / (1 - kmin) : 1;
  lo = Math.max(lo, 0);
  hi = Math.min(hi, 1);
  let beta = 0.5 * (lo + hi);
  for (let it = 0; it < 100; it++) {
    let fv = 0;
    let df = 0;
    for (let i = 0; i < n; i++) {
      const d = K[i]! - 1;
      const den = 1 + beta * d;
      fv += (z[i]! * d) / den;
      df -= (z[i]! * d * d) / (den * den);
    }
    if (fv > 0) lo = beta;
    else hi = beta;
    let next = beta - fv / df;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - beta) < 1e-15) return next;
    beta = next;
  }
  return beta;
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

export { saturationPointAt } from './saturationPoint.js';
