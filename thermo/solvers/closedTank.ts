/**
 * The closed-tank state: given T and the overall density of the contents (mass ÷ tank
 * volume), the phase state, pressure and liquid volume fraction. This is an isochoric
 * (T, V, n) flash.
 *
 * Pure fluid, T < Tc: with ρ_L and ρ_V the saturated densities,
 *   ρ ≥ ρ_L → liquid-full, p = p(T, v) on the liquid branch;
 *   ρ ≤ ρ_V → vapour only, p = p(T, v);
 *   otherwise two-phase at p_sat, liquid fraction (ρ − ρ_V)/(ρ_L − ρ_V).
 * Blend: the same three cases, bounded by the bubble point (liquid side) and the dew point
 * (vapour side); inside, the pressure is found by bracketed secant in ln p such that the PT
 * flash reproduces the overall molar volume: (1 − β)·v_L + β·v_V = v.
 * Above the critical temperature (pure) or above the blend's critical region: one
 * supercritical phase, p = p(T, v); its "liquid fraction" is 1 at or above the model's
 * critical density (the dense fluid fills the tank) and 0 below.
 */
import { ConvergenceError } from '../errors.js';
import type { ResolvedProduct } from '../product.js';
import { R_J_molK } from '../constants.js';
import { pressureForVolume } from './inverse.js';
import {
  flashPT,
  mixtureAtT,
  phaseAt,
  saturationPointAt,
  type FlashResult,
  type MixtureAtT,
  type SaturationPoint,
} from './mixture.js';
import { pureSaturation, volumeAlong } from './pure.js';
import { bracketedRoot } from './root.js';

export type Phase = 'two-phase' | 'liquid' | 'vapour' | 'supercritical';

export interface ClosedTankState {
  phase: Phase;
  /** Absolute pressure, Pa. */
  pAbs: number;
  /** Liquid volume ÷ tank volume (1 when liquid-full). */
  liquidFraction: number;
  /** Density of the liquid present, kg/m³ (null when there is none). */
  rhoL: number | null;
  /** Density of the vapour present, kg/m³ (null when there is none). */
  rhoV: number | null;
  /** Mass of vapour ÷ total mass. */
  vapourMassFraction: number;
  /** Mole fractions of the liquid and vapour (equal to the feed in one phase). */
  x: number[];
  y: number[];
  /** Outer iterations of the solver (0 for direct evaluations). */
  iterations: number;
}

function molarMassOf(mx: MixtureAtT, x: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < mx.n; i++) s += x[i]! * mx.M[i]!;
  return s;
}

export function closedTankState(product: ResolvedProduct, T: number, rho: number): ClosedTankState {
  if (product.components.length === 1) return closedTankPure(product, T, rho);
  return closedTankBlend(product, T, rho);
}

/**
 * A single-phase pressure found inside the saturation bound, checked against that bound: a miss
 * beyond round-off (1e-9 relative) is reported rather than clamped, a round-off miss is snapped.
 */
function onSide(p: number, pSat: number, side: 'above' | 'below', T: number): number {
  const miss = side === 'above' ? (pSat - p) / pSat : (p - pSat) / pSat;
  if (miss > 1e-9)
    throw new ConvergenceError(
      'closed tank',
      `single-phase pressure ${p} Pa on the wrong side of p_sat = ${pSat} Pa at T = ${T} K`,
      0,
      miss,
    );
  return side === 'above' ? Math.max(p, pSat) : Math.min(p, pSat);
}

function closedTankPure(product: ResolvedProduct, T: number, rho: number): ClosedTankState {
  const m = product.components[0]!;
  const v = m.molarMass / rho;
  const one = [1];
  if (T < m.Tc) {
    let sat;
    try {
      sat = pureSaturation(m, T);
    } catch (e) {
      // Within a few mK of Tc the two roots merge numerically: treat as critical.
      if (!(e instanceof ConvergenceError) || T < m.Tc - 0.05) throw e;
    }
    if (sat) {
      const rhoL = m.molarMass / sat.vL;
      const rhoV = m.molarMass / sat.vV;
      if (rho >= rhoL) {
        const p = pressureForVolume(volumeAlong(m, T, 'liquid'), v, sat.p * 1.05, sat.p).p;
        return {
          phase: 'liquid',
          pAbs: onSide(p, sat.p, 'above', T),
          liquidFraction: 1,
          rhoL: rho,
          rhoV: null,
          vapourMassFraction: 0,
          x: one,
          y: one,
          iterations: 0,
        };
      }
      if (rho <= rhoV) {
        const p = pressureForVolume(
          volumeAlong(m, T, 'vapour'),
          v,
          (R_J_molK * T) / v,
          undefined,
          sat.p,
        ).p;
        return {
          phase: 'vapour',
          pAbs: onSide(p, sat.p, 'below', T),
          liquidFraction: 0,
          rhoL: null,
          rhoV: rho,
          vapourMassFraction: 1,
          x: one,
          y: one,
          iterations: 0,
        };
      }
      const lf = (rho - rhoV) / (rhoL - rhoV);
      return {
        phase: 'two-phase',
        pAbs: sat.p,
        liquidFraction: lf,
        rhoL,
        rhoV,
        vapourMassFraction: ((1 - lf) * rhoV) / rho,
        x: one,
        y: one,
        iterations: sat.iterations,
      };
    }
  }
  const dense = rho >= m.rhoc;
  return {
    phase: 'supercritical',
    pAbs: pressureForVolume(volumeAlong(m, T, 'stable'), v, (R_J_molK * T) / v).p,
    liquidFraction: dense ? 1 : 0,
    rhoL: dense ? rho : null,
    rhoV: dense ? null : rho,
    vapourMassFraction: dense ? 0 : 1,
    x: one,
    y: one,
    iterations: 0,
  };
}

function singlePhase(
  mx: MixtureAtT,
  z: readonly number[],
  rho: number,
  v: number,
  phase: 'liquid' | 'vapour' | 'supercritical',
  dense: boolean,
  bounds: { pLo?: number; pHi?: number } = {},
): ClosedTankState {
  const choice = phase === 'liquid' ? 'liquid' : phase === 'vapour' ? 'vapour' : 'stable';
  const guess = bounds.pLo ? bounds.pLo * 1.05 : (R_J_molK * mx.T) / v;
  const p = pressureForVolume(
    (pp) => phaseAt(mx, pp, z, choice).v,
    v,
    guess,
    bounds.pLo,
    bounds.pHi,
  ).p;
  const liquid = phase === 'liquid' || (phase === 'supercritical' && dense);
  return {
    phase,
    pAbs: p,
    liquidFraction: liquid ? 1 : 0,
    rhoL: liquid ? rho : null,
    rhoV: liquid ? null : rho,
    vapourMassFraction: liquid ? 0 : 1,
    x: [...z],
    y: [...z],
    iterations: 0,
  };
}

function closedTankBlend(product: ResolvedProduct, T: number, rho: number): ClosedTankState {
  const mx = mixtureAtT(product, T);
  const z = product.z;
  const M = molarMassOf(mx, z);
  const v = M / rho;
  let bubble;
  try {
    bubble = saturationPointAt(product, T, 'bubble');
  } catch (e) {
    if (!(e instanceof ConvergenceError)) throw e;
  }
  // Pseudo-critical density by Kay's rule on the models' critical densities.
  const rhoPc = M / product.components.reduce((s, m, i) => s + z[i]! * (m.molarMass / m.rhoc), 0);
  if (!bubble) return singlePhase(mx, z, rho, v, 'supercritical', rho >= rhoPc);
  if (v <= bubble.vBulk) return singlePhase(mx, z, rho, v, 'liquid', true, { pLo: bubble.p });
  let dew;
  try {
    dew = saturationPointAt(product, T, 'dew');
  } catch (e) {
    if (!(e instanceof ConvergenceError)) throw e;
  }
  if (!dew) return singlePhase(mx, z, rho, v, 'supercritical', rho >= rhoPc);
  if (v >= dew.vBulk) return singlePhase(mx, z, rho, v, 'vapour', false, { pHi: dew.p });

  return twoPhaseBlend(mx, z, v, dew, bubble);
}

/**
 * Two-phase blend: ln p in (ln p_dew, ln p_bubble) with v_flash(p) = v (v_flash falls with p),
 * by `bracketedRoot`. K starts from the bubble point (K = y/x there); each flash is warm-started
 * from the last one.
 */
function twoPhaseBlend(
  mx: MixtureAtT,
  z: readonly number[],
  v: number,
  dew: SaturationPoint,
  bubble: SaturationPoint,
): ClosedTankState {
  let K: Float64Array<ArrayBufferLike> = Float64Array.from(bubble.incipient, (yi, i) => yi / z[i]!);
  let last: { lnP: number; fl: FlashResult } | undefined;
  const g = (lnP: number) => {
    const fl = flashPT(mx, z, Math.exp(lnP), K);
    K = fl.K;
    last = { lnP, fl };
    return Math.log(((1 - fl.beta) * fl.vL + fl.beta * fl.vV) / v);
  };
  // 1e-7 in ln v moves p by ~1e-8 relative: far below any figure shown; tighter only chases
  // the warm-started flash's own tolerance.
  const root = bracketedRoot(g, Math.log(dew.p), Math.log(bubble.p), {
    name: 'closed-tank blend',
    fa: Math.log(dew.vBulk / v), // > 0
    fb: Math.log(bubble.vBulk / v), // < 0
    fTol: 1e-7,
    xTol: 1e-12,
    maxIterations: 100,
  });
  const p = Math.exp(root.x);
  const fl = last?.lnP === root.x ? last.fl : flashPT(mx, z, p, K);
  const nL = 1 - fl.beta;
  const massL = nL * molarMassOf(mx, fl.x);
  const massV = fl.beta * molarMassOf(mx, fl.y);
  return {
    phase: 'two-phase',
    pAbs: p,
    liquidFraction: Math.min(1, Math.max(0, (nL * fl.vL) / v)),
    rhoL: molarMassOf(mx, fl.x) / fl.vL,
    rhoV: molarMassOf(mx, fl.y) / fl.vV,
    vapourMassFraction: massV / (massL + massV),
    x: Array.from(fl.x),
    y: Array.from(fl.y),
    iterations: root.iterations,
  };
}
