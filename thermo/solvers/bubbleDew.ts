/**
 * Bubble and dew pressures of a mixture at T (fugacity coefficients as in mixtureModel.ts).
 */
import { ConvergenceError } from '../errors.js';
import { extrapolate, solveDense } from './linear.js';
import { phaseAt, type MixtureAtT } from './mixtureModel.js';
import { pureSaturation } from './pure.js';
import type { SolverReport } from './result.js';
import { wilsonKOf } from './wilson.js';

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
  const it = start ? { p: start.p, K: Float64Array.from(start.K) } : raoultStart(mx, z, kind);
  const ctx = context(mx, z, kind);
  const ss = substitute(ctx, it);
  if ('point' in ss) return ss.point;
  const nw = newton(ctx, ss, start?.p);
  if ('point' in nw) return nw.point;
  throw new ConvergenceError(
    `${kind} pressure`,
    `no ${kind} point found at T = ${mx.T} K (above the blend's critical region?)`,
    nw.iterations,
    nw.residual,
  );
}

/** What the two stages share: the problem and the incipient phase's composition from K. */
interface Context {
  readonly mx: MixtureAtT;
  readonly z: ArrayLike<number>;
  readonly kind: 'bubble' | 'dew';
  readonly bulkChoice: 'liquid' | 'vapour';
  readonly incChoice: 'liquid' | 'vapour';
  /** Scratch for the incipient phase's composition. */
  readonly w: Float64Array;
}

/** An unfinished iterate: pressure, K-values, steps taken and the last residual. */
interface Iterate {
  p: number;
  K: Float64Array;
  iterations: number;
  residual: number;
}

function context(mx: MixtureAtT, z: ArrayLike<number>, kind: 'bubble' | 'dew'): Context {
  const bulkChoice = kind === 'bubble' ? 'liquid' : 'vapour';
  const incChoice = kind === 'bubble' ? 'vapour' : 'liquid';
  return { mx, z, kind, bulkChoice, incChoice, w: new Float64Array(mx.n) };
}

/** Normalised incipient composition from K into `out`; returns the unnormalised sum. */
function incipientOf(c: Context, Kv: ArrayLike<number>, out: Float64Array): number {
  const { z, kind } = c;
  const n = c.mx.n;
  let S = 0;
  for (let i = 0; i < n; i++) {
    out[i] = kind === 'bubble' ? Kv[i]! * z[i]! : z[i]! / Kv[i]!;
    S += out[i]!;
  }
  for (let i = 0; i < n; i++) out[i] = out[i]! / S;
  return S;
}

function finish(c: Context, p: number, K: Float64Array, it: number, resid: number) {
  incipientOf(c, K, c.w);
  const point: SaturationPoint = {
    p,
    incipient: Float64Array.from(c.w),
    vBulk: phaseAt(c.mx, p, c.z, c.bulkChoice).v,
    vIncipient: phaseAt(c.mx, p, c.w, c.incChoice).v,
    converged: true,
    iterations: it,
    residual: resid,
    reason: 'converged',
  };
  return { point };
}

/** Raoult-style start from pure vapour pressures (Wilson's estimate above a component's Tc). */
function raoultStart(
  mx: MixtureAtT,
  z: ArrayLike<number>,
  kind: 'bubble' | 'dew',
): { p: number; K: Float64Array } {
  const { n, T, product } = mx;
  let s = 0;
  const ps = product.components.map((m) => {
    if (T < m.Tc - 0.5) {
      try {
        return pureSaturation(m, T).p;
      } catch {
        /* fall through to Wilson */
      }
    }
    return wilsonKOf(m, T, 1); // Wilson's estimate of p_sat, Pa
  });
  if (kind === 'bubble') for (let i = 0; i < n; i++) s += z[i]! * ps[i]!;
  else {
    for (let i = 0; i < n; i++) s += z[i]! / ps[i]!;
    s = 1 / s;
  }
  const p = s;
  return { p, K: Float64Array.from(ps, (x) => x / p) };
}

/**
 * Successive substitution, accelerated every fourth step by the dominant-eigenvalue
 * extrapolation (Crowe & Nishio 1975, AIChE J. 21, 528): the iterates of (ln K, ln p) approach
 * the solution along one direction, with ratio λ; jump ahead by λ/(1 − λ) of the last step.
 * At most 25 steps; returns the point, or the iterate for Newton to finish.
 */
function substitute(
  c: Context,
  start: { p: number; K: Float64Array },
): { point: SaturationPoint } | Iterate {
  const { mx, z, kind, w } = c;
  const n = mx.n;
  let { p } = start;
  const K = start.K;
  let resid = Infinity;
  let it = 0;
  const u0 = new Float64Array(n + 1);
  const u1 = new Float64Array(n + 1);
  const u2 = new Float64Array(n + 1);
  for (; it < 25; it++) {
    incipientOf(c, K, w);
    const bulk = phaseAt(mx, p, z, c.bulkChoice, false);
    const inc = phaseAt(mx, p, w, c.incChoice, false);
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
    if (resid < 1e-11) return finish(c, p, K, it + 1, resid);
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
  return { p, K, iterations: it, residual: resid };
}

/** Residuals of equal fugacity and Σ = 1 at u = (ln K, ln p); false on the trivial solution. */
function residuals(c: Context, u: Float64Array, out: Float64Array): boolean {
  const { mx, z, kind, w } = c;
  const n = mx.n;
  const pp = Math.exp(u[n]!);
  const Kv = u.subarray(0, n).map(Math.exp);
  const S = incipientOf(c, Kv, w);
  const bulk = phaseAt(mx, pp, z, c.bulkChoice, false);
  const inc = phaseAt(mx, pp, w, c.incChoice, false);
  if (bulk.nRoots === 1 && inc.nRoots === 1 && Math.abs(bulk.Z - inc.Z) < 1e-9) return false;
  for (let i = 0; i < n; i++) {
    out[i] =
      kind === 'bubble'
        ? u[i]! + inc.lnPhi[i]! - bulk.lnPhi[i]!
        : u[i]! + bulk.lnPhi[i]! - inc.lnPhi[i]!;
  }
  out[n] = S - 1;
  return true;
}

/** Newton on u = (ln K_1 … ln K_n, ln p) with a finite-difference Jacobian; at most 60 steps. */
function newton(
  c: Context,
  from: Iterate,
  pStart: number | undefined,
): { point: SaturationPoint } | Iterate {
  const n = c.mx.n;
  let { p, iterations: it, residual: resid } = from;
  const K = from.K;
  const u = new Float64Array(n + 1);
  if (!Number.isFinite(p) || p <= 0) p = pStart ?? c.mx.product.components[0]!.pc * 0.5;
  for (let i = 0; i < n; i++) u[i] = Math.log(K[i]!);
  u[n] = Math.log(p);
  const f0 = new Float64Array(n + 1);
  const f1 = new Float64Array(n + 1);
  for (let nit = 0; nit < 60; nit++, it++) {
    if (!residuals(c, u, f0)) break;
    resid = Math.max(...f0.map(Math.abs));
    let trivial = 0;
    for (let i = 0; i < n; i++) trivial += u[i]! * u[i]!;
    if (trivial < 1e-8) break;
    if (resid < 1e-10) {
      for (let i = 0; i < n; i++) K[i] = Math.exp(u[i]!);
      return finish(c, Math.exp(u[n]!), K, it + 1, resid);
    }
    const J: number[][] = Array.from({ length: n + 1 }, () => new Array<number>(n + 1).fill(0));
    for (let k = 0; k <= n; k++) {
      const h = 1e-7;
      const uk = u[k]!;
      u[k] = uk + h;
      const ok = residuals(c, u, f1);
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
  return { p, K, iterations: it, residual: resid };
}
