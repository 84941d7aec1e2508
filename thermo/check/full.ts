/**
 * "Full" states of a closed tank: liquid-full (no vapour space) and full of dense fluid (above
 * the critical temperature with the contents denser than the critical density). Past the
 * critical temperature there is no liquid and no vapour, but contents denser than the critical
 * density still fill the tank with a fluid whose pressure climbs with temperature as steeply as
 * a liquid-full tank's; the check treats both alike for limits, cautions and the pressure
 * allowance (see DECISIONS.md, "Full of dense fluid").
 */
import { MODEL_ALLOWANCE } from '../rules/allowance.js';
import type { State } from './model.js';
import type { FullKind } from './types.js';

export type { FullKind };

/** Which way the tank is full in state s at overall density rho, or null when it is not. */
export function fullKind(s: State, rho: number, rhoc: number): FullKind | null {
  if (s.phase === 'liquid-full') return 'liquid';
  if (s.phase === 'supercritical' && rho > rhoc) return 'dense-fluid';
  return null;
}

/** The allowance on a pressure in state s, fraction: a full tank's pressure is the uncertain one. */
export function pressureAllowance(s: State, rho: number, rhoc: number): number {
  return fullKind(s, rho, rhoc) !== null
    ? MODEL_ALLOWANCE.liquidFullPressure
    : MODEL_ALLOWANCE.vapourPressure;
}
