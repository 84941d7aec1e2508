/**
 * The product as the tank check sees it: saturation (memoised per temperature), the closed-tank
 * state at a fixed overall density, and the searches for the liquid-full and relief
 * temperatures. Built on the core's public API only.
 *
 * Pure fluids use `closedTank` for every state. A blend's closed-tank flash costs several
 * bubble-point solutions, so in the two-phase region a blend's state is taken from its bubble
 * point instead: pressure = bubble pressure of the whole contents (an upper bound of the real
 * two-phase pressure, since the vapour takes the light ends — the cautious side), liquid
 * fraction = (ρ − ρV)/(ρL − ρV) with the bubble-point liquid and incipient-vapour densities.
 * Single-phase states of a blend still come from `closedTank`.
 */
import { closedTank, criticalTemperature, saturation } from '../api.js';
import { InputError } from '../errors.js';
import { resolveProduct, type Product } from '../product.js';
import { T_60F_K } from '../constants.js';
import type { TankPhase } from './types.js';

export interface Sat {
  /** Pa absolute */
  p: number;
  rhoL: number;
  rhoV: number;
}

export interface State {
  phase: TankPhase;
  /** Pa absolute */
  pAbs: number;
  /** Liquid volume fraction 0…1. */
  lf: number;
  /** Density of the liquid present (saturated in two-phase), kg/m³, or null. */
  rhoL: number | null;
  /** Density of the vapour present, kg/m³, or null. */
  rhoV: number | null;
  /** True when taken from the bubble point of a blend rather than a flash. */
  approximate: boolean;
}

const PHASE: Record<string, TankPhase> = {
  'two-phase': 'two-phase',
  liquid: 'liquid-full',
  vapour: 'vapour-only',
  supercritical: 'supercritical',
};

export interface ProductBasics {
  label: string;
  pure: boolean;
  /** K; lowest temperature the core accepts for this product. */
  Tmin: number;
  /** K (Kay's rule for a blend). */
  Tc: number;
  /** Saturated liquid density at 60 °F, kg/m³. */
  rho60: number;
}

const basicsCache = new Map<string, ProductBasics>();

/** Product constants that do not depend on the readings (memoised by the product's JSON). */
export function productBasics(product: Product): ProductBasics {
  const key = JSON.stringify(product);
  const hit = basicsCache.get(key);
  if (hit) return hit;
  const r = resolveProduct(product);
  const Tc = criticalTemperature(product);
  let rho60: number;
  try {
    rho60 = saturation(product, T_60F_K).rhoL;
  } catch (e) {
    if (e instanceof InputError && e.field === 'T') {
      throw new InputError('product', 'a liquefied gas: liquid under its own vapour pressure at 60 °F (15.6 °C)', r.label);
    }
    throw e;
  }
  const b: ProductBasics = { label: r.label, pure: r.components.length === 1, Tmin: r.Tmin, Tc, rho60 };
  if (basicsCache.size > 200) basicsCache.clear();
  basicsCache.set(key, b);
  return b;
}

export class ProductModel {
  readonly basics: ProductBasics;
  private readonly sats = new Map<number, Sat | null>();

  constructor(readonly product: Product) {
    this.basics = productBasics(product);
  }

  /** Saturation (pure) or bubble point (blend) at T, or null above the critical point / region. */
  sat(T: number): Sat | null {
    const hit = this.sats.get(T);
    if (hit !== undefined) return hit;
    let s: Sat | null = null;
    if (!(this.basics.pure && T > this.basics.Tc - 0.5)) {
      try {
        const r = saturation(this.product, T);
        s = { p: r.p, rhoL: r.rhoL, rhoV: r.rhoV };
      } catch (e) {
        if (!(e instanceof InputError && e.field === 'T')) throw e;
      }
    }
    this.sats.set(T, s);
    return s;
  }

  /** Closed-tank state at T for overall density rho (kg/m³). */
  state(T: number, rho: number): State {
    if (!this.basics.pure) {
      const s = this.sat(T);
      if (s && rho < s.rhoL && rho > s.rhoV) {
        return { phase: 'two-phase', pAbs: s.p, lf: (rho - s.rhoV) / (s.rhoL - s.rhoV), rhoL: s.rhoL, rhoV: s.rhoV, approximate: true };
      }
    }
    const c = closedTank(this.product, T, rho);
    return { phase: PHASE[c.phase] ?? 'supercritical', pAbs: c.p, lf: c.liquidFraction, rhoL: c.rhoL, rhoV: c.rhoV, approximate: false };
  }
}

/**
 * Root of an increasing-or-decreasing function on [a, b] with f(a), f(b) of opposite signs:
 * Illinois regula falsi, stopping when the bracket is narrower than tol.
 */
export function bracketRoot(f: (x: number) => number, a: number, fa: number, b: number, fb: number, tol: number): number {
  let side = 0;
  for (let i = 0; i < 60; i++) {
    if (Math.abs(b - a) < tol) break;
    let x = (a * fb - b * fa) / (fb - fa);
    if (!(x > Math.min(a, b) && x < Math.max(a, b))) x = 0.5 * (a + b);
    const fx = f(x);
    if (fx === 0) return x;
    if (Math.sign(fx) === Math.sign(fb)) {
      b = x;
      fb = fx;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = x;
      fa = fx;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return Math.abs(fa) < Math.abs(fb) ? a : b;
}

/**
 * Temperature in [Tlo, Thi] where the increasing function f crosses zero, starting from known
 * points (at least one). Secant steps (overshooting a little, 0.5…40 K) until the sign changes,
 * then `bracketRoot`. Returns null when f keeps its sign up to the end of the range.
 */
export function findCrossing(f: (T: number) => number, known: readonly (readonly [number, number])[], Tlo: number, Thi: number, tol: number): number | null {
  const pts = known.filter(([T, v]) => T >= Tlo && T <= Thi && Number.isFinite(v)).slice().sort((p, q) => p[0] - q[0]);
  if (pts.length === 0) return null;
  for (const [T, v] of pts) if (v === 0) return T;
  for (let i = 1; i < pts.length; i++) {
    const [Ta, fa] = pts[i - 1]!;
    const [Tb, fb] = pts[i]!;
    if (Math.sign(fa) !== Math.sign(fb)) return bracketRoot(f, Ta, fa, Tb, fb, tol);
  }
  const up = pts[0]![1] < 0; // all the same sign: the root is above when f < 0
  // The two known points nearest to the root side.
  let [a, fa] = up ? pts[pts.length - 1]! : pts[0]!;
  const second = up ? pts[pts.length - 2] : pts[1];
  let prev: readonly [number, number] | undefined = second;
  for (let i = 0; i < 40; i++) {
    let step = up ? 10 : -10;
    if (prev && prev[1] !== fa && prev[0] !== a) {
      const slope = (fa - prev[1]) / (a - prev[0]);
      if (slope > 0) step = (-fa / slope) * 1.15;
    }
    step = Math.sign(step || (up ? 1 : -1)) * Math.min(40, Math.max(0.5, Math.abs(step)));
    const b = up ? Math.min(Thi, a + step) : Math.max(Tlo, a + step);
    if (b === a) return null;
    const fb = f(b);
    if (fb === 0) return b;
    if (Math.sign(fb) !== Math.sign(fa)) return bracketRoot(f, a, fa, b, fb, tol);
    prev = [a, fa];
    a = b;
    fa = fb;
  }
  return null;
}
