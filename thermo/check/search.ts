/**
 * Temperatures the check solves for, each by a bracketed secant in a variable in which the
 * function is nearly straight, so a handful of core evaluations suffice:
 *
 * - saturation temperature for a pressure: ln p against 1/T (Clausius–Clapeyron);
 * - liquid-full temperature: the saturated liquid density falls to the overall density ρ.
 *   Near the critical point ρL − ρc ∝ (Tc − T)^β with β ≈ 1/3, so y = (ρL − ρc)³ is nearly
 *   straight in T; beyond the last saturation state y = 0 (ρL has met ρc). With ρ ≤ ρc the
 *   liquid never fills the tank (it boils away instead): null.
 * - relief temperature: on the saturation curve while the tank is two-phase, else the
 *   closed-tank pressure (liquid-full or supercritical branch).
 * All stop at 0.005 K or better, far inside the ±1 °F the results are shown to.
 */
import { MODEL_ALLOWANCE } from '../rules/allowance.js';
import { bracketedRoot } from '../solvers/root.js';
import { T_CHECK_MAX_K, checkMinTemperature } from '../limits.js';
import type { ProductModel, State } from './model.js';

/** Highest temperature searched, K. */
const T_SEARCH_MAX = T_CHECK_MAX_K;

/** Upper end of the saturation curve searched, K (see ProductModel.satTop). */
export function satTop(model: ProductModel): number {
  return Math.min(T_SEARCH_MAX, model.satTop());
}

/**
 * Secant search on an increasing function f(x) from known points, with bracketing; f returns
 * null where it is undefined (treated as "above the root" — used beyond the saturation curve).
 */
function solveIncreasing(
  f: (x: number) => number | null,
  hints: readonly (readonly [number, number])[],
  lo: number,
  hi: number,
  tol: number,
): number | null {
  const pts = hints
    .filter(([x, v]) => x >= lo && x <= hi && Number.isFinite(v))
    .slice()
    .sort((a, b) => a[0] - b[0]);
  let below: [number, number] | null = null; // f < 0
  let above: [number, number] | null = null; // f > 0 (or undefined: value +Infinity)
  for (const [x, v] of pts) {
    if (v === 0) return x;
    if (v < 0) below = !below || x > below[0] ? [x, v] : below;
    else if (!above || x < above[0]) above = [x, v];
  }
  let last: [number, number] | null =
    pts.length >= 2 ? [pts[pts.length - 2]![0], pts[pts.length - 2]![1]] : null;
  for (let i = 0; i < 60; i++) {
    if (below && above && Number.isFinite(above[1])) {
      const fx = (x: number) => {
        const v = f(x);
        return v === null ? Math.abs(above![1]) : v;
      };
      return bracketedRoot(fx, below[0], above[0], {
        name: 'check temperature search',
        fa: below[1],
        fb: above[1],
        xTol: tol,
      }).x;
    }
    if (below && above && above[0] - below[0] < tol) return below[0];
    let x: number;
    if (below && above)
      x = 0.5 * (below[0] + above[0]); // upper end undefined: bisect until a value is found
    else {
      const ref = below ?? above!;
      let step = below ? 10 : -10;
      if (last && last[0] !== ref[0]) {
        const slope = (ref[1] - last[1]) / (ref[0] - last[0]);
        if (slope > 0) step = (-ref[1] / slope) * 1.1;
      }
      step = Math.sign(step) * Math.min(60, Math.max(0.2, Math.abs(step)));
      x = Math.min(hi, Math.max(lo, ref[0] + step));
      if (x === ref[0]) return null;
      last = [ref[0], ref[1]];
    }
    const v = f(x);
    if (v === null) above = !above || x < above[0] ? [x, Infinity] : above;
    else if (v === 0) return x;
    else if (v < 0) below = [x, v];
    else above = [x, v];
  }
  return null;
}

/** Temperature at which the saturation (bubble) pressure equals pAbs, K, or null outside the curve. */
export function saturationTemperature(
  model: ProductModel,
  pAbs: number,
  hintsT: readonly number[],
  Tlo: number,
): number | null {
  // Searched once per pressure from the product's own floor, then taken only if at or above Tlo
  // (the function is increasing: its one root is the answer for any Tlo below it).
  if (satTop(model) <= Tlo) return null; // nothing to search
  const floor = checkMinTemperature(model.basics.Tmin);
  const T = model.satTemperature(pAbs, () =>
    searchSaturationTemperature(model, pAbs, hintsT, Math.min(floor, Tlo)),
  );
  return T !== null && T >= Tlo ? T : null;
}

/** The search behind `saturationTemperature` (not remembered). */
function searchSaturationTemperature(
  model: ProductModel,
  pAbs: number,
  hintsT: readonly number[],
  Tlo: number,
): number | null {
  const Thi = satTop(model); // above Tlo: saturationTemperature has checked
  // Increasing in −1/T: x = −1/T, y = ln(p/pAbs).
  const f = (x: number) => {
    const s = model.sat(-1 / x);
    return s ? Math.log(s.pAbs / pAbs) : null;
  };
  const hints: [number, number][] = [];
  for (const T of hintsT) {
    if (T < Tlo || T > Thi) continue;
    const s = model.sat(T);
    if (s) hints.push([-1 / T, Math.log(s.pAbs / pAbs)]);
  }
  if (hints.length === 0) {
    const s = model.sat(Tlo);
    if (!s) return null;
    hints.push([-1 / Tlo, Math.log(s.pAbs / pAbs)]);
  }
  const x = solveIncreasing(f, hints, -1 / Tlo, -1 / Thi, 1e-8);
  if (x === null) return null;
  const T = -1 / x;
  return model.sat(T) ? T : null;
}

/** Temperature at which a closed tank of overall density rho becomes liquid-full, K, or null. */
export function liquidFullTemperature(
  model: ProductModel,
  rho: number,
  hintsT: readonly number[],
  Tlo: number,
): number | null {
  const rhoc = model.basics.rhoc;
  if (!(rho > rhoc)) return null;
  const Thi = satTop(model);
  if (Thi <= Tlo) return null;
  const target = (rho - rhoc) ** 3;
  // Increasing in T: target − (ρL − ρc)³; beyond the curve ρL = ρc.
  const y = (T: number) => {
    const s = model.sat(T);
    const d = s ? Math.max(0, s.rhoL - rhoc) : 0;
    return target - d ** 3;
  };
  // Still short of liquid-full where the saturation curve ends: it never fills (the liquid
  // meets the vapour at the critical point instead).
  const yTop = y(Thi);
  // Denser than the critical density but still short of liquid-full where the curve ends: it
  // is full of dense fluid by the critical point; say so from the end of the curve (earlier,
  // the cautious side).
  // (A curve that runs on past the highest temperature searched has not ended: not full there.)
  const ended = Thi < T_SEARCH_MAX;
  if (yTop < 0) return ended ? Thi : null;
  const hints: [number, number][] = [[Thi, yTop]];
  for (const T of hintsT) if (T >= Tlo && T < Thi) hints.push([T, y(T)]);
  // Already denser than the liquid at the lowest temperature searched: full from there on.
  // (y rises with T, so a hint below zero says y(Tlo) is too, without another saturation state.)
  if (!hints.some(([, v]) => v < 0) && y(Tlo) >= 0) return Tlo;
  const T = solveIncreasing(y, hints, Tlo, Thi, 0.002);
  if (T === null) return ended ? Thi : null;
  const s = model.sat(T);
  // A crossing on the saturation curve is a liquid-full state; otherwise the contents (denser
  // than critical) are full of dense fluid from the end of the curve.
  return s && Math.abs(s.rhoL - rho) <= 0.01 * rho ? T : ended ? Thi : null;
}

/**
 * Temperature at which the closed-tank pressure, raised by its model allowance (`allowance`,
 * the same one the headroom takes), reaches pReliefAbs, K; `Tnow` itself when it is reached
 * already at the present liquid temperature; null when not below T_SEARCH_MAX. A closed tank's
 * pressure never falls as it warms, so the first crossing is the only one: two-phase part on
 * the saturation curve, then the single-phase branch.
 */
export function reliefTemperature(
  model: ProductModel,
  rho: number,
  pReliefAbs: number,
  allowance: (s: State) => number,
  Tnow: number,
  Tfull: number | null,
  hintsT: readonly number[] = [Tnow],
): number | null {
  // ln of raised pressure over relief; where the model cannot hold the fill: "above".
  const h = (T: number) => {
    const st = model.stateOrNull(T, rho);
    return st ? Math.log((st.pAbs * (1 + allowance(st))) / pReliefAbs) : null;
  };
  const h0 = h(Tnow);
  if (h0 === null || h0 >= 0) return Tnow;
  const pSat = pReliefAbs / (1 + MODEL_ALLOWANCE.vapourPressure);
  const Ts = saturationTemperature(model, pSat, hintsT, Tnow);
  // Reached while still two-phase: the saturation answer stands.
  if (Ts !== null && Ts > Tnow && (Tfull === null || Ts <= Tfull)) {
    // Only where the tank's pressure there is that saturation pressure (not a blend's flash
    // held at a floor below it, nor vapour only).
    const st = model.stateOrNull(Ts, rho);
    if (st && st.phase === 'two-phase' && Math.abs(st.pAbs / pSat - 1) < 1e-4) return Ts;
  }
  const hints: [number, number][] = [[Tnow, h0]];
  for (const T of [Tfull, Ts]) {
    if (T === null || !(T > Tnow) || T > T_SEARCH_MAX) continue;
    const v = h(T);
    hints.push([T, v === null ? Infinity : v]);
  }
  return solveIncreasing(h, hints, Tnow, T_SEARCH_MAX, 0.002);
}
