/**
 * Which rows of the refrigerant-blend tables (test/reference/blends/) the binary parameters
 * are fitted to and which are held out, shared by scripts/fit-blends.ts and the tests.
 */

/** The target range of the blends, K (−40 °C … +60 °C). */
export const T_FIT_MIN = 233.15;
export const T_FIT_MAX = 333.15;

/** Every third row from 238.15 K (238.15, 253.15, 268.15 … K) is held out of the fit. */
export function isHeldOut(T: number): boolean {
  return Math.round((T - T_FIT_MIN) / 5) % 3 === 1;
}
