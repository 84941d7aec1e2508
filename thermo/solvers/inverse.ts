/**
 * Pressure from volume for the corrected model: the model's volume is a function of the
 * cubic's root at (T, p), so p(T, v) is found by root-finding along one branch.
 */
import { ConvergenceError } from '../errors.js';

/**
 * Finds p with vOf(p) = vTarget, where vOf falls monotonically with p along one branch.
 * `pLo`/`pHi` are optional known bounds (vOf(pLo) ≥ vTarget ≥ vOf(pHi)); missing ones are found
 * by expanding geometrically from `pGuess`. Illinois regula falsi in ln p; residual
 * |ln(vOf(p)/vTarget)| < 1e-12.
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
  if (Math.abs(fLo) < 1e-12) return { p: Math.exp(lo), iterations: evals };
  if (Math.abs(fHi) < 1e-12) return { p: Math.exp(hi), iterations: evals };
  if (!(fLo >= 0 && fHi <= 0)) {
    throw new ConvergenceError(
      'pressure from volume',
      'could not bracket the pressure',
      evals,
      Math.min(Math.abs(fLo), Math.abs(fHi)),
    );
  }
  let side = 0;
  for (let it = 1; it <= 200; it++) {
    let x = (lo * fHi - hi * fLo) / (fHi - fLo);
    if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
    const fx = f(x);
    if (Math.abs(fx) < 1e-12 || hi - lo < 1e-14) return { p: Math.exp(x), iterations: it };
    if (fx > 0) {
      lo = x;
      fLo = fx;
      if (side === -1) fHi /= 2;
      side = -1;
    } else {
      hi = x;
      fHi = fx;
      if (side === 1) fLo /= 2;
      side = 1;
    }
  }
  throw new ConvergenceError('pressure from volume', 'regula falsi did not close', 200, NaN);
}
