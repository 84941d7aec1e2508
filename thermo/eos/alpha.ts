/**
 * Alpha functions a(T) = a_c·α(Tr). Each returns α and dα/dT (per kelvin) so that the
 * core can form enthalpies (Clausius–Clapeyron checks) without finite differences.
 */

export interface AlphaValue {
  alpha: number;
  /** dα/dT, 1/K. */
  dAlpha_dT: number;
}

export type AlphaFunction = (T_K: number) => AlphaValue;

/**
 * Soave form α = [1 + m·(1 − √Tr)]². Used by the textbook models:
 *  - PR 1976: m = 0.37464 + 1.54226·ω − 0.26992·ω² (Peng & Robinson 1976, eq. 18);
 *  - SRK 1972: m = 0.480 + 1.574·ω − 0.176·ω² (Soave 1972, eq. 16).
 * Valid at any T > 0; above Tc the same expression is used, as both papers do.
 */
export function soaveAlpha(Tc_K: number, m: number): AlphaFunction {
  return (T_K) => {
    const sr = Math.sqrt(T_K / Tc_K);
    const f = 1 + m * (1 - sr);
    return { alpha: f * f, dAlpha_dT: (-f * m * sr) / T_K };
  };
}

export function mPengRobinson1976(omega: number): number {
  return 0.37464 + 1.54226 * omega - 0.26992 * omega * omega;
}

export function mSoave1972(omega: number): number {
  return 0.48 + 1.574 * omega - 0.176 * omega * omega;
}

/**
 * Mathias & Copeman (1983), Fluid Phase Equilib. 13, 91–108:
 *   α = [1 + c1·x + c2·x² + c3·x³]², x = 1 − √Tr, for Tr < 1;
 *   α = [1 + c1·x]² above Tc (the authors' supercritical branch), continuous with slope at Tc.
 */
export function mathiasCopemanAlpha(
  Tc_K: number,
  c1: number,
  c2: number,
  c3: number,
): AlphaFunction {
  return (T_K) => {
    const sr = Math.sqrt(T_K / Tc_K);
    const x = 1 - sr;
    const dx_dT = -sr / (2 * T_K);
    if (T_K < Tc_K) {
      const f = 1 + x * (c1 + x * (c2 + x * c3));
      const df_dx = c1 + x * (2 * c2 + 3 * c3 * x);
      return { alpha: f * f, dAlpha_dT: 2 * f * df_dx * dx_dT };
    }
    const f = 1 + c1 * x;
    return { alpha: f * f, dAlpha_dT: 2 * f * c1 * dx_dT };
  };
}
