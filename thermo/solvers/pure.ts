/**
 * Pure-fluid states from one component model: the cubic's roots at (T, p), the saturation
 * pressure by equal fugacity, and pressure from (T, v).
 */
import { R_J_molK } from '../constants.js';
import { ConvergenceError } from '../errors.js';
import { compressibilityRoots, dPdv, lnPhiPure, logTerm } from '../eos/cubic.js';
import { correctedVolume, correctionAtT, type CorrectionAtT } from '../eos/volumeCorrection.js';
import type { ComponentModel } from '../eos/model.js';
import type { SolverReport } from './result.js';
import { wilsonKOf } from './wilson.js';

const R = R_J_molK;

export interface PureCoefficients {
  /** a(T), Pa·m⁶/mol² */
  a: number;
  /** da/dT, Pa·m⁶/(mol²·K) */
  da_dT: number;
  b: number;
  /** Volume-correction parameters at T. */
  corr: CorrectionAtT;
}

export function pureCoefficients(m: ComponentModel, T: number): PureCoefficients {
  const { alpha, dAlpha_dT } = m.alpha(T);
  return {
    a: m.ac * alpha,
    da_dT: m.ac * dAlpha_dT,
    b: m.b,
    corr: correctionAtT(m.correction, m.Tc, m.vcCub, T),
  };
}

/** The model's molar volume (m³/mol) from the cubic's molar volume vCub at T. */
function modelVolume(m: ComponentModel, k: PureCoefficients, T: number, vCub: number): number {
  const d = -((vCub * vCub) / (R * T)) * dPdv(m.family, R, T, vCub, k.a, k.b);
  return correctedVolume(k.corr, vCub, d);
}

export type RootChoice = 'liquid' | 'vapour' | 'stable';

/**
 * Compressibility at (T, p) on the requested branch. `stable` picks the root of lowest Gibbs
 * energy (lowest ln φ) where three exist. Where only one root exists it is returned whatever
 * branch was asked (the caller checks `roots` if that matters).
 */
export function pureZ(
  m: ComponentModel,
  k: PureCoefficients,
  T: number,
  p: number,
  choice: RootChoice,
) {
  const A = (k.a * p) / (R * R * T * T);
  const B = (k.b * p) / (R * T);
  const roots = compressibilityRoots(m.family, A, B);
  let Z: number;
  if (roots.length === 0) {
    throw new ConvergenceError('cubic roots', 'no root above the co-volume', 0, NaN);
  }
  const zL = roots[0]!;
  const zV = roots[roots.length - 1]!;
  if (roots.length === 1 || choice === 'liquid') Z = zL;
  else if (choice === 'vapour') Z = zV;
  else Z = lnPhiPure(m.family, zL, A, B) <= lnPhiPure(m.family, zV, A, B) ? zL : zV;
  return { Z, A, B, nRoots: roots.length, zL, zV };
}

export interface PureSaturation extends SolverReport {
  /** Saturation pressure, Pa. */
  p: number;
  /** The model's molar volumes, m³/mol. */
  vL: number;
  vV: number;
  /** The cubic's own molar volumes, m³/mol (before the volume correction). */
  vLCub: number;
  vVCub: number;
  ZL: number;
  ZV: number;
  /** Molar enthalpy of vaporization, J/mol (from the residual enthalpies of both phases). */
  dHvap: number;
}

/**
 * Saturation pressure at T by equal fugacity, Newton in ln p:
 *   g(ln p) = ln φ_L − ln φ_V,  dg/d ln p = Z_L − Z_V,
 * kept inside a bracket that is tightened whenever the cubic has only one root (above the
 * vapour spinodal only the liquid root is left, below the liquid spinodal only the vapour root).
 * Residual: |g|. Valid for Ttriple ≤ T < Tc; converges to within about 0.01 K of Tc.
 */
export function pureSaturation(m: ComponentModel, T: number, pGuess?: number): PureSaturation {
  const k = pureCoefficients(m, T);
  let lnP = Math.log(pGuess ?? wilsonKOf(m, T, 1)); // Wilson's estimate of p_sat, Pa
  let lo = -Infinity;
  let hi = Math.log(m.pc * 1.5);
  if (lnP >= hi) lnP = Math.log(m.pc * 0.99);
  const vcCubic = (m.family.Zc * R * m.Tc) / m.pc;
  let g = NaN;
  for (let it = 1; it <= 200; it++) {
    const p = Math.exp(lnP);
    const A = (k.a * p) / (R * R * T * T);
    const B = (k.b * p) / (R * T);
    const roots = compressibilityRoots(m.family, A, B);
    let next: number;
    if (roots.length >= 2 && roots[roots.length - 1]! - roots[0]! > 1e-12) {
      const ZL = roots[0]!;
      const ZV = roots[roots.length - 1]!;
      const lnPhiL = lnPhiPure(m.family, ZL, A, B);
      const lnPhiV = lnPhiPure(m.family, ZV, A, B);
      g = lnPhiL - lnPhiV;
      if (Math.abs(g) < 1e-12) {
        const vL = (ZL * R * T) / p;
        const vV = (ZV * R * T) / p;
        const dHvap = residualEnthalpy(m, k, T, ZV, B) - residualEnthalpy(m, k, T, ZL, B);
        return {
          p,
          vL: modelVolume(m, k, T, vL),
          vV: modelVolume(m, k, T, vV),
          vLCub: vL,
          vVCub: vV,
          ZL,
          ZV,
          dHvap,
          converged: true,
          iterations: it,
          residual: Math.abs(g),
          reason: 'converged',
        };
      }
      if (g > 0) lo = Math.max(lo, lnP);
      else hi = Math.min(hi, lnP);
      next = lnP - g / (ZL - ZV);
    } else {
      // One root only: decide which side of the loop we are on from the root's volume.
      const v = ((roots[0] ?? 1) * R * T) / p;
      if (v < vcCubic) hi = Math.min(hi, lnP);
      else lo = Math.max(lo, lnP);
      next = Number.isFinite(lo) ? 0.5 * (lo + hi) : hi - 1;
    }
    if (!(next > lo && next < hi) || !Number.isFinite(next)) {
      next = Number.isFinite(lo) ? 0.5 * (lo + hi) : hi - 1;
    }
    if (Number.isFinite(lo) && hi - lo < 1e-14) break;
    lnP = next;
  }
  throw new ConvergenceError(
    'pure saturation',
    `no equal-fugacity pressure found at T = ${T} K`,
    200,
    Math.abs(g),
  );
}

/**
 * Residual molar enthalpy h − h_ig = R·T·(Z − 1) + (T·da/dT − a)/b · L, J/mol,
 * with L = ln((Z + δ1·B)/(Z + δ2·B))/(δ1 − δ2).
 */
function residualEnthalpy(
  m: ComponentModel,
  k: PureCoefficients,
  T: number,
  Z: number,
  B: number,
): number {
  return R * T * (Z - 1) + ((T * k.da_dT - k.a) / k.b) * logTerm(m.family, Z, B);
}

/** The model's molar volume at (T, p) on the chosen branch, m³/mol. */
export function pureVolume(m: ComponentModel, T: number, p: number, choice: RootChoice): number {
  return volumeAlong(m, T, choice)(p);
}

/** p ↦ the model's molar volume (m³/mol) along one branch of the isotherm T. */
export function volumeAlong(
  m: ComponentModel,
  T: number,
  choice: RootChoice,
): (p: number) => number {
  const k = pureCoefficients(m, T);
  return (p) => {
    const z = pureZ(m, k, T, p, choice);
    return modelVolume(m, k, T, (z.Z * R * T) / p);
  };
}
