/**
 * Volume translation (Peneloux, Rauzy & Fréze 1982, Fluid Phase Equilib. 8, 7–23), made
 * temperature dependent: the translated molar volume is v = v_cubic − c(T).
 *
 * Form used by the tuned model, for T < Tc, with τ = 1 − T/Tc:
 *   c(T) = c_c + Σ_k d_k·τ^e_k,   e = SHIFT_EXPONENTS,
 * and c(T) = c_c at and above Tc. c_c = v_c,cubic − v_c,reference, so the model reproduces
 * the reference critical density exactly; the d_k are fitted to reference saturated-liquid
 * densities (scripts/fit-fluids.ts). The exponent 0.35 lets c follow the non-analytic shape
 * of the real coexistence curve near Tc (β ≈ 0.33) that a cubic (β = 1/2) cannot.
 *
 * A translation that depends on T only (and, in mixtures, mixes linearly in mole fraction)
 * shifts ln φ_i by −c_i·p/(R·T) in every phase alike, so phase equilibrium is unchanged:
 * only volumes move.
 */

export const SHIFT_EXPONENTS: readonly number[] = [0.35, 0.5, 1, 2, 3];

export interface ShiftParams {
  /** c at the critical point, m³/mol. */
  readonly cc: number;
  /** Coefficients d_k for SHIFT_EXPONENTS, m³/mol each. */
  readonly d: readonly number[];
}

/** A volume shift function c(T) in m³/mol. */
export type ShiftFunction = (T_K: number) => number;

export const NO_SHIFT: ShiftFunction = () => 0;

export function temperatureShift(Tc_K: number, params: ShiftParams): ShiftFunction {
  const { cc, d } = params;
  return (T_K) => {
    if (T_K >= Tc_K) return cc;
    const tau = 1 - T_K / Tc_K;
    let c = cc;
    for (let k = 0; k < d.length; k++) c += (d[k] ?? 0) * Math.pow(tau, SHIFT_EXPONENTS[k] ?? 1);
    return c;
  };
}
