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
import { closedTank, describeProduct, maxDensity, saturation } from '../api.js';
import { ConvergenceError, InputError } from '../errors.js';
import { resolveProduct, type Product } from '../product.js';
import { blendSeed } from '../solvers/blendSeeds.js';
import { T_15C_K, T_60F_K } from '../constants.js';
import { bisectBoundary } from '../solvers/root.js';
import { T_CHECK_MAX_K, checkMinTemperature } from '../limits.js';
import type { TankPhase } from './types.js';

export interface Sat {
  /** Pa absolute */
  pAbs: number;
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
  /** Saturated liquid density at 15 °C (the metric base temperature), kg/m³. */
  rho15: number;
  /** Critical density of the model, kg/m³ (blend: Kay's rule on molar volumes, as the core's closed tank uses). */
  rhoc: number;
}

/**
 * Stores value under key in a memo, first emptying the memo when it holds more than cap entries
 * (a bound on memory: a long session checks many products and temperatures). Returns value.
 */
function remember<K, V>(memo: Map<K, V>, cap: number, key: K, value: V): V {
  if (memo.size > cap) memo.clear();
  memo.set(key, value);
  return value;
}

const basicsCache = new Map<string, ProductBasics>();

/** Product constants that do not depend on the readings (memoised by the product's JSON). */
export function productBasics(product: Product): ProductBasics {
  const key = JSON.stringify(product);
  const hit = basicsCache.get(key);
  if (hit) return hit;
  const r = describeProduct(product);
  const Tc = r.Tc;
  let rho60: number;
  try {
    rho60 = saturation(product, T_60F_K).rhoL;
  } catch (e) {
    if (e instanceof InputError && e.field === 'T') {
      throw new InputError(
        'product',
        'a liquefied gas: liquid under its own vapour pressure at 60 °F (15.6 °C)',
        r.label,
      );
    }
    throw e;
  }
  // 15 °C lies 0.56 K below 60 °F, so a product liquid at 60 °F is liquid there too.
  const rho15 = saturation(product, T_15C_K).rhoL;
  const b: ProductBasics = {
    label: r.label,
    pure: r.components.length === 1,
    Tmin: r.Tmin,
    Tc,
    rho60,
    rho15,
    rhoc: r.rhoc,
  };
  return remember(basicsCache, 200, key, b);
}

/** Top of each product's saturation curve, K (memoised by the product's JSON). */
const topCache = new Map<string, number>();

/** Highest temperature the check looks at, K. */
const T_TOP_K = T_CHECK_MAX_K;

/**
 * Per product (by its JSON): saturation states by temperature and the two-phase ends by
 * density, shared by every check of that product. A live form checks the same product again
 * at each keystroke, and the searches (the two-phase end's bisection over a fixed range above
 * all) ask at the same temperatures each time. Exact values, not interpolations.
 */
interface Shared {
  sats: Map<number, Sat | null>;
  ends: Map<number, { T: number; p: number } | null>;
  /** Saturation temperatures by pressure (`satTemperature`). */
  satTs: Map<number, number | null>;
  /** Top of a blend's bubble curve once found (`satTop`), K. */
  top?: number;
}
const shared = new Map<string, Shared>();
const SHARED_SATS = 4000;

function sharedFor(product: Product): Shared {
  const key = JSON.stringify(product);
  return (
    shared.get(key) ??
    remember(shared, 20, key, { sats: new Map(), ends: new Map(), satTs: new Map() })
  );
}

export class ProductModel {
  readonly basics: ProductBasics;
  private readonly sats: Map<number, Sat | null>;
  private readonly ends: Map<number, { T: number; p: number } | null>;
  private readonly satTs: Map<number, number | null>;
  private readonly shared: Shared;
  /** True while `satTop` is searching (its own saturation states are not cut at the top). */
  private findingTop = false;

  constructor(readonly product: Product) {
    this.basics = productBasics(product);
    const s = sharedFor(product);
    this.shared = s;
    this.sats = s.sats;
    this.ends = s.ends;
    this.satTs = s.satTs;
  }

  /**
   * Highest temperature (to 0.01 K, at most 400 K) with a saturation state: Tc − 0.5 K for a pure
   * fluid; for a blend found once by bisection on where the core's bubble point stops existing
   * (it ends in the blend's critical region), then memoised like the other product constants.
   */
  satTop(): number {
    const b = this.basics;
    if (b.pure) return Math.min(T_TOP_K, b.Tc - 0.5);
    if (this.shared.top !== undefined) return this.shared.top;
    this.findingTop = true;
    try {
      return (this.shared.top = this.findTop());
    } finally {
      this.findingTop = false;
    }
  }

  /** The search behind a blend's `satTop` (memoised by the product's JSON). */
  private findTop(): number {
    const key = JSON.stringify(this.product);
    const hit = topCache.get(key);
    if (hit !== undefined) return hit;
    // A blend the app offers: the top found by this bisection when the seeds were generated,
    // once its bubble point is found again (blendSeeds.ts).
    const seeded = blendSeed(resolveProduct(this.product))?.top;
    if (seeded !== undefined && this.sat(seeded)) {
      return remember(topCache, 200, key, seeded);
    }
    // A liquefied gas has a bubble point at 60 °F (productBasics checked it).
    const lo = this.sat(T_TOP_K)
      ? T_TOP_K
      : bisectBoundary((T) => this.sat(T) !== null, T_60F_K, T_TOP_K, 0.01).x;
    return remember(topCache, 200, key, lo);
  }

  /**
   * The temperature at which the saturation (bubble) pressure is pAbs, as `solve` finds it
   * (searched from the product's floor up); remembered per pressure. Three searches of every
   * check ask for one at a pressure that typing a temperature leaves alone (the site's air
   * pressure for the cold-metal caution, the relief setting, a pressure reading); together they
   * were about a third of a pure fluid's check. The answer is found once to the search's
   * tolerance (1e-8 in −1/T, under 0.001 K) and then reused; a later search from other hints
   * would land within that tolerance of it.
   */
  satTemperature(pAbs: number, solve: () => number | null): number | null {
    const hit = this.satTs.get(pAbs);
    if (hit !== undefined) return hit;
    return remember(this.satTs, 200, pAbs, solve());
  }

  /** Saturation (pure) or bubble point (blend) at T, or null above the critical point / region. */
  sat(T: number): Sat | null {
    const hit = this.sats.get(T);
    if (hit !== undefined) return hit;
    let s: Sat | null = null;
    // A blend has no saturation state above the top of its bubble curve (by that top's
    // definition); asking the core there costs every stage of the solver and a march up the
    // curve before it gives up, and the searches ask there often (the relief search up to
    // 400 K, the two-phase end's bisection).
    const above = !this.basics.pure && !this.findingTop && T > this.satTop();
    if (!above && !(this.basics.pure && T > this.basics.Tc - 0.5)) {
      try {
        const r = saturation(this.product, T);
        s = { pAbs: r.pAbs, rhoL: r.rhoL, rhoV: r.rhoV };
      } catch (e) {
        // No bubble point (the core says which T) or none found near a blend's critical
        // region: no saturation state here, as the core's own closed tank treats it.
        if (!((e instanceof InputError && e.field === 'T') || e instanceof ConvergenceError))
          throw e;
      }
    }
    return remember(this.sats, SHARED_SATS, T, s);
  }

  /**
   * Closed-tank state at T, or null when the model cannot hold that much product in the tank at
   * T (overall density above its close-packed limit — a liquid-full tank heated far past
   * liquid-full).
   */
  stateOrNull(T: number, rho: number): State | null {
    if (rho > maxDensity(this.product, T)) return null;
    return this.state(T, rho);
  }

  /** The most the model can hold per m³ of tank at T, kg/m³ (the core's close-packed limit). */
  maxDensityAt(T: number): number {
    return maxDensity(this.product, T);
  }

  /** Highest temperature in [Tlo, Thi] at which the model can hold overall density rho, K (bisection on the core's limit). */
  maxTemperatureFor(rho: number, Tlo: number, Thi: number): number {
    if (rho <= maxDensity(this.product, Thi)) return Thi;
    return bisectBoundary((T) => rho <= maxDensity(this.product, T), Tlo, Thi, 1e-3).x;
  }

  /** Closed-tank state at T for overall density rho (kg/m³). */
  state(T: number, rho: number): State {
    if (this.basics.pure) return this.closed(T, rho);
    const s = this.sat(T);
    if (s && rho < s.rhoL && rho > s.rhoV) {
      return {
        phase: 'two-phase',
        pAbs: s.pAbs,
        lf: (rho - s.rhoV) / (s.rhoL - s.rhoV),
        rhoL: s.rhoL,
        rhoV: s.rhoV,
        approximate: true,
      };
    }
    const c = this.closed(T, rho);
    if (s && rho >= s.rhoL) {
      // At or above the bubble-point liquid density the blend is liquid-full (all liquid at
      // its bubble point, or compressed), whatever the flash's own rounding says; its
      // pressure is never below the bubble pressure.
      return {
        ...c,
        phase: 'liquid-full',
        pAbs: Math.max(c.pAbs, s.pAbs),
        lf: 1,
        rhoL: rho,
        rhoV: null,
      };
    }
    // Past the end of the bubble-point approximation (the vapour side, or beyond the top of
    // the bubble curve) the flash gives the real pressure, which is below the bubble pressure
    // the approximation took up to there. A closed tank's pressure never falls as it warms,
    // so the bubble pressure where the approximation ended stays a floor (DECISIONS.md).
    const end = this.twoPhaseEnd(rho, T);
    if (end === null) return c;
    return { ...c, pAbs: Math.max(c.pAbs, end.p) };
  }

  private closed(T: number, rho: number): State {
    const c = closedTank(this.product, T, rho);
    return {
      phase: PHASE[c.phase] ?? 'supercritical',
      pAbs: c.pAbs,
      lf: c.liquidFraction,
      rhoL: c.rhoL,
      rhoV: c.rhoV,
      approximate: false,
    };
  }

  /** Blend: two-phase under the bubble-point approximation at T (rhoV < rho < rhoL there). */
  private twoPhaseAt(T: number, rho: number): boolean {
    const s = this.sat(T);
    return s !== null && rho < s.rhoL && rho > s.rhoV;
  }

  /**
   * Blend: the last temperature below T at which the bubble-point approximation held for this
   * overall density, with its bubble pressure; null when it never held below T. The
   * approximation holds on one interval of temperature (ρV rises and ρL falls with T), which
   * starts at the lowest temperature the check takes if anywhere: bisection to 0.001 K.
   */
  private twoPhaseEnd(rho: number, T: number): { T: number; p: number } | null {
    if (this.ends.has(rho)) {
      const hit = this.ends.get(rho)!;
      return hit && hit.T <= T ? hit : null;
    }
    // Bisection over the whole range searched (not up to T), so every call for this density
    // finds the same end and the floor cannot wobble with T.
    const lo = checkMinTemperature(this.basics.Tmin);
    const hi = T_TOP_K;
    if (lo >= T || !this.twoPhaseAt(lo, rho) || this.twoPhaseAt(hi, rho)) return null;
    const Tend = bisectBoundary((T) => this.twoPhaseAt(T, rho), lo, hi, 0.001).x;
    const end = { T: Tend, p: this.sat(Tend)!.pAbs };
    return remember(this.ends, 200, rho, end);
  }
}
