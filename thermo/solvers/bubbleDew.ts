/**
 * Bubble and dew pressures of a mixture at T (fugacity coefficients as in mixtureModel.ts).
 */
import { ConvergenceError } from '../errors.js';
import { extrapolate, solveInPlace } from './linear.js';
import { phaseAt, type MixtureAtT } from './mixtureModel.js';
import { pureSaturation } from './pure.js';
import type { SolverReport } from './result.js';
import { phaseDerivatives } from './phaseDerivatives.js';
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
 * Given a start (a neighbouring point of the curve), Newton's method on (ln K_i, ln p) with the
 * analytic Jacobian, which converges quadratically from there (Michelsen & Mollerup,
 * Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed., ch. 12). Without one,
 * or where Newton fails from it, successive substitution on K_i = φ_i,L/φ_i,V with the pressure
 * update p ← p·Σ K_i x_i (bubble) or p ← p/Σ y_i/K_i (dew), which converges from far away but
 * slowly near the blend's critical region, where Newton's method finishes. Converged when every
 * residual (|Σ − 1| and the fugacity residuals) is below 1e-10 (the substitution: |Σ − 1| below
 * 1e-11 and K-factors that moved less than 1e-10). Rejects the trivial solution (phases of
 * equal composition), which means T is above the blend's critical region, and a point of the
 * other kind (`misoriented`). The iteration count includes every stage.
 */
export function saturationPressure(
  mx: MixtureAtT,
  z: ArrayLike<number>,
  kind: 'bubble' | 'dew',
  start?: { p: number; K: Float64Array },
): SaturationPoint {
  const ctx = context(mx, z, kind);
  let spent = 0;
  if (start) {
    const warm = newton(ctx, start, 12);
    if ('point' in warm) return warm.point;
    spent = warm.iterations;
  }
  const it = start ? { p: start.p, K: Float64Array.from(start.K) } : raoultStart(mx, z, kind);
  const ss = substitute(ctx, it, spent);
  if ('point' in ss) return ss.point;
  const nw = newton(ctx, ss, 60);
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

/**
 * True when a converged point lies on the other curve: near the critical region both phases can
 * take the cubic's one root, and an iteration can land on the blend's dew point when asked for
 * its bubble point (the incipient phase the denser one), or the reverse. Not this kind of point.
 */
function misoriented(kind: 'bubble' | 'dew', zBulk: number, zIncipient: number): boolean {
  return kind === 'bubble' ? zIncipient <= zBulk : zIncipient >= zBulk;
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
 * At most 25 steps; returns the point, or the iterate for Newton to finish. `spent`: steps
 * already taken by an earlier stage (counted in the report).
 */
function substitute(
  c: Context,
  start: { p: number; K: Float64Array },
  spent: number,
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
    let moved = 0;
    for (let i = 0; i < n; i++) {
      const lnK =
        kind === 'bubble' ? bulk.lnPhi[i]! - inc.lnPhi[i]! : inc.lnPhi[i]! - bulk.lnPhi[i]!;
      moved = Math.max(moved, Math.abs(lnK - Math.log(K[i]!)));
      K[i] = Math.exp(lnK);
      trivial += lnK * lnK;
      S2 += kind === 'bubble' ? K[i]! * z[i]! : z[i]! / K[i]!;
    }
    resid = Math.abs(S2 - 1);
    if (trivial < 1e-8) break;
    // Converged when Σ = 1 and the K-factors have stopped moving (equal fugacities, the test
    // Newton's method applies). Near the critical region the substitution creeps: Σ can sit at 1
    // while the K-factors still drift towards the trivial solution (measured: 4e-6 a step).
    if (resid < 1e-11 && moved < 1e-10) {
      if (misoriented(kind, bulk.Z, inc.Z)) break;
      return finish(c, p, K, spent + it + 1, resid);
    }
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
  return { p, K, iterations: spent + it, residual: resid };
}

/**
 * Newton's method on u = (ln K_1 … ln K_n, ln p) with the analytic Jacobian (phaseDerivatives.ts):
 *   f_i = ln K_i ± (ln φ_i(incipient) − ln φ_i(bulk)),  f_n = Σ − 1,
 *   ∂f_i/∂ln K_j = δ_ij + Φ_ij·w_j  (Φ = n·∂ln φ/∂n of the incipient phase, w its composition;
 *   ln φ is homogeneous of degree 0 in the mole numbers, so normalising w adds nothing),
 *   ∂f_i/∂ln p = ±p·(∂ln φ_i/∂p(incipient) − ∂ln φ_i/∂p(bulk)),
 *   ∂f_n/∂ln K_j = K_j·z_j (bubble) or −z_j/K_j (dew),  ∂f_n/∂ln p = 0,
 * with + for a bubble point and − for a dew point. Converges quadratically, so a start near the
 * answer (a neighbouring point on the curve) takes one to three evaluations where successive
 * substitution took up to 17 near the top of a blend's curve. Stops when every residual is
 * below 1e-10; steps are cut to at most 0.3 in any variable. Fails (returns the iterate) on the
 * trivial solution, on a point of the other kind (`misoriented`), on a singular Jacobian, after
 * six steps without progress, or after maxSteps.
 */
function newton(
  c: Context,
  from: { p: number; K: Float64Array; iterations?: number; residual?: number },
  maxSteps: number,
): { point: SaturationPoint } | Iterate {
  const { mx, z, kind, w } = c;
  const n = mx.n;
  let it = from.iterations ?? 0;
  let resid = from.residual ?? Infinity;
  let p = from.p;
  const K = Float64Array.from(from.K);
  if (!Number.isFinite(p) || p <= 0) p = mx.product.components[0]!.pc * 0.5;
  const sign = kind === 'bubble' ? 1 : -1;
  const f = new Float64Array(n + 1);
  // Jacobian and step, (n + 1)×(n + 1) and n + 1, reused by every step.
  const m = n + 1;
  const J = new Float64Array(m * m);
  const d = new Float64Array(m);
  let best = Infinity;
  let sinceBest = 0;
  for (let step = 0; step < maxSteps; step++, it++) {
    const S = incipientOf(c, K, w);
    const bulk = phaseAt(mx, p, z, c.bulkChoice, false);
    const inc = phaseAt(mx, p, w, c.incChoice, false);
    const same = bulk.nRoots === 1 && inc.nRoots === 1 && Math.abs(bulk.Z - inc.Z) < 1e-9;
    let trivial = 0;
    resid = Math.abs(S - 1);
    for (let i = 0; i < n; i++) {
      const lnK = Math.log(K[i]!);
      trivial += lnK * lnK;
      f[i] = lnK + sign * (inc.lnPhi[i]! - bulk.lnPhi[i]!);
      resid = Math.max(resid, Math.abs(f[i]!));
    }
    f[n] = S - 1;
    if (same || trivial < 1e-8 || !Number.isFinite(resid)) break;
    if (resid < 1e-10) {
      if (misoriented(kind, bulk.Z, inc.Z)) break;
      return finish(c, p, K, it + 1, resid);
    }
    // Past the end of the curve there is nothing to converge to and the steps wander (measured:
    // the pressure swinging between two values, the residual flat); a genuine point close to
    // the critical region can also take a few steps before its residual falls, but it has
    // fallen to nine tenths of its best within six steps in every case measured.
    if (resid < 0.9 * best) {
      best = resid;
      sinceBest = 0;
    } else if (++sinceBest >= 6) break;
    const dInc = phaseDerivatives(mx, p, w, inc.Z);
    const dBulk = phaseDerivatives(mx, p, z, bulk.Z, false);
    const Phi = dInc.dlnPhidn!;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) J[i * m + j] = (i === j ? 1 : 0) + Phi[i * n + j]! * w[j]!;
      J[i * m + n] = sign * p * (dInc.dlnPhidp[i]! - dBulk.dlnPhidp[i]!);
      d[i] = -f[i]!;
    }
    for (let j = 0; j < n; j++) J[n * m + j] = kind === 'bubble' ? K[j]! * z[j]! : -z[j]! / K[j]!;
    J[n * m + n] = 0;
    d[n] = -f[n]!;
    if (!solveInPlace(J, d, m)) break;
    let big = 0;
    for (let k = 0; k < m; k++) big = Math.max(big, Math.abs(d[k]!));
    const scale = big > 0.3 ? 0.3 / big : 1;
    for (let i = 0; i < n; i++) K[i] = K[i]! * Math.exp(scale * d[i]!);
    p *= Math.exp(scale * d[n]!);
  }
  return { p, K, iterations: it, residual: resid };
}
