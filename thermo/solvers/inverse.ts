/**
 * Pressure from volume for the corrected model: the model's volume is a function of the
 * cubic's root at (T, p), so p(T, v) is found by root-finding along one branch.
 */
import { ConvergenceError } from '../errors.js';
import { bracketedRoot } from './root.js';

/**
 * Finds p with vOf(p) = vTarget, where vOf falls monotonically with p along one branch.
 * `pLo`/`pHi` are optional known bounds (vOf(pLo) ≥ vTarget ≥ vOf(pHi)); missing ones are found
 * by expanding geometrically from `pGuess`. Root in ln p by `bracketedRoot`; residual
 * |ln(vOf(p)/vTarget)| ≤ 1e-12.
 */
export function pressureForVolume(
  vOf: (p: number) => number,
  vTarget: number,
  pGuess: number,
  pLo?: number,
  pHi?: number,
): { p: number; iterations: number } {
  const f = (lnP: number) => Math.log(vOf(Math.exp(lnP)) / vTarget);
  let lo: number;
  let fLo: number;
  let hi: number;
  let fHi: number;
  let evals = 0;
  if (pLo !== undefined) {
    lo = Math.log(pLo);
    fLo = f(lo);
  } else {
    lo = Math.log(Math.min(pGuess, pHi ?? pGuess)) - 0.5;
    fLo = f(lo);
    while (fLo < 0 && evals++ < 80) {
      lo -= 1.5;
      fLo = f(lo);
    }
  }
  if (pHi !== undefined) {
    hi = Math.log(pHi);
    fHi = f(hi);
  } else {
    hi = Math.max(lo + 0.05, Math.log(pGuess) + 0.5);
    fHi = f(hi);
    while (fHi > 0 && evals++ < 80) {
      hi += 1;
      fHi = f(hi);
    }
  }
  if (!(fLo >= -1e-12 && fHi <= 1e-12)) {
    throw new ConvergenceError(
      'pressure from volume',
      'could not bracket the pressure',
      evals,
      Math.min(Math.abs(fLo), Math.abs(fHi)),
    );
  }
  const root = bracketedRoot(f, lo, hi, {
    name: 'pressure from volume',
    fa: fLo,
    fb: fHi,
    fTol: 1e-12,
    xTol: 1e-14,
  });
  return { p: Math.exp(root.x), iterations: evals + root.iterations };
}
