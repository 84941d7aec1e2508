/**
 * The public API of the core. SI units everywhere: K, Pa (absolute), kg, m³, mol.
 * Every function validates its input and throws `InputError` naming the argument and its
 * valid range; solvers that cannot converge throw `ConvergenceError`, never a silent value.
 */
import { FLUIDS } from './data/fluids.js';
import { ConvergenceError, InputError, type InputLimits } from './errors.js';
import type { ModelId } from './eos/model.js';
import {
  resolveProduct,
  T_MAX_K,
  type ModelOptions,
  type Product,
  type ResolvedProduct,
} from './product.js';
import { closedTankState, type ClosedTankState } from './solvers/closedTank.js';
import {
  flashPT,
  mixtureAtT,
  phaseAt,
  saturationPointAt,
  stabilityTest,
} from './solvers/mixture.js';
import { pureSaturation, pureVolume } from './solvers/pure.js';

export interface FluidSummary {
  id: string;
  name: string;
  formula: string;
  /** kg/mol */
  molarMass: number;
  /** K */
  Tc: number;
  /** Pa */
  Pc: number;
  omega: number;
  /** Triple-point temperature, K. */
  Ttriple: number;
  /** Critical density, kg/m³. */
  rhoc: number;
}

/** The listed fluids with their main constants. */
export function listFluids(): FluidSummary[] {
  return FLUIDS.map((f) => ({
    id: f.id,
    name: f.name,
    formula: f.formula,
    molarMass: f.molarMass,
    Tc: f.Tc,
    Pc: f.pc,
    omega: f.omega,
    Ttriple: f.Ttriple,
    rhoc: f.rhoc,
  }));
}

function checkTemperature(r: ResolvedProduct, T: unknown, field = 'T'): asserts T is number {
  const range = `from ${fmt(r.Tmin)} K (the triple point) to ${T_MAX_K} K`;
  if (typeof T !== 'number' || !Number.isFinite(T) || T <= 0 || T < r.Tmin || T > T_MAX_K)
    throw new InputError(field, range, T, {
      min: r.Tmin,
      max: T_MAX_K,
      quantity: 'temperature',
      note: '(from the triple point)',
    });
}

/** Pressures the API takes, Pa absolute: above 0 and at most 1 GPa. */
const P_LIMITS: InputLimits = { min: 0, minExclusive: true, max: 1e9, quantity: 'pressure' };

function fmt(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** Saturation state. For a blend: bubble point of that liquid. */
export interface SaturationState {
  /** Vapour (pure) or bubble-point (blend) pressure, Pa absolute. */
  pAbs: number;
  /** Saturated (bubble) liquid density, kg/m³. */
  rhoL: number;
  /** Saturated (incipient) vapour density, kg/m³. */
  rhoV: number;
  /** Mole fractions of the incipient vapour (equal to the liquid for a pure fluid). */
  y: number[];
  /** The model actually used. */
  model: ModelId;
}

/** Critical temperature of a pure product, K (for a blend: Kay's-rule pseudo-critical). */
export function criticalTemperature(product: Product, options?: ModelOptions): number {
  const r = resolveProduct(product, options);
  return r.components.reduce((s, m, i) => s + r.z[i]! * m.Tc, 0);
}

/**
 * Saturation at T: vapour pressure with saturated liquid and vapour densities; for a blend,
 * the bubble-point pressure of that liquid, its density and the incipient vapour's density.
 * Valid from the triple point to 0.5 K below the critical temperature (pure fluids), or up to
 * the blend's critical region (an `InputError` names T when the blend has no bubble point).
 */
export function saturation(product: Product, T: number, options?: ModelOptions): SaturationState {
  const r = resolveProduct(product, options);
  checkTemperature(r, T);
  if (r.components.length === 1) {
    const m = r.components[0]!;
    if (T > m.Tc - 0.5 + 1e-9)
      throw new InputError(
        'T',
        `from ${fmt(r.Tmin)} K to ${fmt(m.Tc - 0.5)} K (0.5 K below the critical temperature)`,
        T,
        {
          min: r.Tmin,
          max: m.Tc - 0.5,
          quantity: 'temperature',
          note: '(up to just below the critical temperature)',
        },
      );
    const s = pureSaturation(m, T);
    return {
      pAbs: s.p,
      rhoL: m.molarMass / s.vL,
      rhoV: m.molarMass / s.vV,
      y: [1],
      model: r.model,
    };
  }
  const b = blendPoint(r, T, 'bubble');
  return { pAbs: b.p, rhoL: b.rhoBulk, rhoV: b.rhoIncipient, y: b.incipient, model: r.model };
}

/**
 * A blend's bubble or dew point at T with the densities of both phases; an InputError on T
 * when T lies beyond the end of that curve (the blend's critical region).
 */
function blendPoint(r: ResolvedProduct, T: number, kind: 'bubble' | 'dew') {
  if (r.Tmax !== undefined && T > r.Tmax + 1e-9)
    throw new InputError(
      'T',
      `from ${fmt(r.Tmin)} K to ${fmt(r.Tmax)} K (${r.label} is offered up to 1 K or more below the end of its dew curve)`,
      T,
      {
        min: r.Tmin,
        max: r.Tmax,
        quantity: 'temperature',
        note: `(${r.label}: below the end of its dew curve)`,
      },
    );
  let point;
  try {
    point = saturationPointAt(r, T, kind);
  } catch (e) {
    if (!(e instanceof ConvergenceError)) throw e;
    throw new InputError(
      'T',
      `below the blend's critical region (no ${kind} point at ${fmt(T)} K)`,
      T,
    );
  }
  const M = r.components.map((m) => m.molarMass);
  const Minc = point.incipient.reduce((s, w, i) => s + w * M[i]!, 0);
  return {
    p: point.p,
    rhoBulk: r.molarMass / point.vBulk,
    rhoIncipient: Minc / point.vIncipient,
    incipient: Array.from(point.incipient),
  };
}

/**
 * Density of the liquid at T and absolute pressure pAbs, kg/m³. pAbs must be at or above the saturation (bubble)
 * pressure at T, and T below the critical temperature (pure) or the blend's critical region.
 */
export function liquidDensity(
  product: Product,
  T: number,
  pAbs: number,
  options?: ModelOptions,
): number {
  const r = resolveProduct(product, options);
  checkTemperature(r, T);
  if (typeof pAbs !== 'number' || !Number.isFinite(pAbs) || pAbs <= 0 || pAbs > 1e9)
    throw new InputError('pAbs', 'a pressure above 0 and at most 1e9 Pa absolute', pAbs, P_LIMITS);
  const sat = saturation(product, T, options);
  if (pAbs < sat.pAbs * (1 - 1e-9)) {
    throw new InputError(
      'pAbs',
      `at or above the ${r.components.length > 1 ? 'bubble' : 'saturation'} pressure at this T (${fmt(sat.pAbs)} Pa) for a liquid`,
      pAbs,
      {
        min: sat.pAbs,
        max: P_LIMITS.max,
        quantity: 'pressure',
        note: `(the ${r.components.length > 1 ? 'bubble' : 'saturation'} pressure at this temperature) for a liquid`,
      },
    );
  }
  if (r.components.length === 1) {
    const m = r.components[0]!;
    return m.molarMass / pureVolume(m, T, pAbs, 'liquid');
  }
  const mx = mixtureAtT(r, T);
  return r.molarMass / phaseAt(mx, pAbs, r.z, 'liquid').v;
}

/** The closed-tank state as the API returns it (see solvers/closedTank.ts for each field). */
export interface ClosedTankResult extends Omit<ClosedTankState, 'iterations'> {
  model: ModelId;
}

/**
 * Highest overall density accepted, kg/m³: the model's liquid density at T and 100 MPa
 * (far beyond any tank's strength; the closed-tank pressure there is 100 MPa).
 */
export function maxDensity(product: Product, T: number, options?: ModelOptions): number {
  const r = resolveProduct(product, options);
  checkTemperature(r, T);
  if (r.components.length === 1)
    return r.molarMass / pureVolume(r.components[0]!, T, 1e8, 'liquid');
  return r.molarMass / phaseAt(mixtureAtT(r, T), 1e8, r.z, 'liquid').v;
}

/**
 * The state of contents of overall density `density` (kg/m³ = mass ÷ tank volume) at T.
 */
export function closedTank(
  product: Product,
  T: number,
  density: number,
  options?: ModelOptions,
): ClosedTankResult {
  const r = resolveProduct(product, options);
  checkTemperature(r, T);
  const dmax = maxDensity(product, T, options);
  if (typeof density !== 'number' || !Number.isFinite(density) || density <= 0 || density > dmax) {
    throw new InputError(
      'density',
      `above 0 and at most ${fmt(dmax)} kg/m³ for this product at this temperature`,
      density,
      {
        min: 0,
        minExclusive: true,
        max: dmax,
        quantity: 'density',
        note: 'for this product at this temperature',
      },
    );
  }
  const { iterations, ...state } = closedTankState(r, T, density);
  return { ...state, model: r.model };
}

/** Dew point of a vapour of the product's composition at T. */
export interface DewState {
  /** Dew-point pressure, Pa absolute. */
  pAbs: number;
  /** Density of the vapour at its dew point, kg/m³. */
  rhoV: number;
  /** Density of the incipient liquid, kg/m³. */
  rhoL: number;
  /** Mole fractions of the incipient liquid. */
  x: number[];
  model: ModelId;
}

/**
 * Dew point at T: the pressure at which a vapour of the product's composition first
 * condenses. For a pure fluid it equals the vapour pressure.
 */
export function dewPoint(product: Product, T: number, options?: ModelOptions): DewState {
  const r = resolveProduct(product, options);
  checkTemperature(r, T);
  if (r.components.length === 1) {
    const s = saturation(product, T, options);
    return { pAbs: s.pAbs, rhoV: s.rhoV, rhoL: s.rhoL, x: [1], model: r.model };
  }
  const d = blendPoint(r, T, 'dew');
  return { pAbs: d.p, rhoV: d.rhoBulk, rhoL: d.rhoIncipient, x: d.incipient, model: r.model };
}

export interface FlashState {
  /** 'two-phase', or the single phase found stable. */
  phase: 'two-phase' | 'liquid' | 'vapour';
  /** Vapour mole fraction, 0…1. */
  beta: number;
  x: number[];
  y: number[];
  /** Phase densities, kg/m³ (null where the phase is absent). */
  rhoL: number | null;
  rhoV: number | null;
  model: ModelId;
}

/**
 * Isothermal flash at (T, pAbs), pAbs absolute: Michelsen's stability test, then successive substitution with
 * Rachford–Rice when the feed splits. A pure fluid is liquid above its vapour pressure and
 * vapour below it.
 */
export function flash(
  product: Product,
  T: number,
  pAbs: number,
  options?: ModelOptions,
): FlashState {
  const r = resolveProduct(product, options);
  checkTemperature(r, T);
  if (typeof pAbs !== 'number' || !Number.isFinite(pAbs) || pAbs <= 0 || pAbs > 1e9)
    throw new InputError('pAbs', 'a pressure above 0 and at most 1e9 Pa absolute', pAbs, P_LIMITS);
  const mx = mixtureAtT(r, T);
  const z = r.z;
  const single = (): FlashState => {
    const ph = phaseAt(mx, pAbs, z, 'stable');
    const M = r.molarMass;
    const liquidLike =
      ph.nRoots > 1
        ? ph.Z < 0.3
        : ph.v <
          z.reduce((s, zi, i) => s + zi * (r.components[i]!.molarMass / r.components[i]!.rhoc), 0);
    return {
      phase: liquidLike ? 'liquid' : 'vapour',
      beta: liquidLike ? 0 : 1,
      x: [...z],
      y: [...z],
      rhoL: liquidLike ? M / ph.v : null,
      rhoV: liquidLike ? null : M / ph.v,
      model: r.model,
    };
  };
  if (r.components.length === 1) return single();
  const st = stabilityTest(mx, z, pAbs);
  if (st.stable) return single();
  const f = flashPT(mx, z, pAbs, st.K);
  if (f.beta <= 0 || f.beta >= 1) return single();
  const Mx = f.x.reduce((s, x, i) => s + x * mx.M[i]!, 0);
  const My = f.y.reduce((s, y, i) => s + y * mx.M[i]!, 0);
  return {
    phase: 'two-phase',
    beta: f.beta,
    x: Array.from(f.x),
    y: Array.from(f.y),
    rhoL: Mx / f.vL,
    rhoV: My / f.vV,
    model: r.model,
  };
}

export interface ProductDescription {
  /** Display label, e.g. `Propane` or `Propane 90.0 % + n-butane 10.0 %`. */
  label: string;
  /** Mole fractions by fluid id (a custom fluid appears as `custom:<name>`). */
  components: { id: string; moleFraction: number }[];
  /** Molar mass, kg/mol. */
  molarMass: number;
  /** Lowest temperature the API accepts, K (the highest triple point of the components). */
  Tmin: number;
  /** Critical temperature (pure) or Kay's-rule pseudo-critical temperature (blend), K. */
  Tc: number;
  /** Critical density of the model (pure), or Kay's rule on the components' critical molar volumes (blend), kg/m³. */
  rhoc: number;
  /** The model applied. */
  model: ModelId;
}

/** What the core makes of a product: label, composition and the constants callers need. */
export function describeProduct(product: Product, options?: ModelOptions): ProductDescription {
  const r = resolveProduct(product, options);
  const vc = r.components.reduce((s, m, i) => s + r.z[i]! * (m.molarMass / m.rhoc), 0);
  return {
    label: r.label,
    components: r.components.map((m, i) => ({ id: m.id, moleFraction: r.z[i]! })),
    molarMass: r.molarMass,
    Tmin: r.Tmin,
    Tc: r.components.reduce((s, m, i) => s + r.z[i]! * m.Tc, 0),
    rhoc: r.molarMass / vc,
    model: r.model,
  };
}
