/**
 * From the cubic's molar volume to the model's molar volume: a volume translation made
 * temperature dependent, a distance-function term and a vapour-side term,
 *
 *   v = v_cub − c(T) − δ·κ/(κ + d) − v_cub·s(r)·ε(T)
 *
 * - c(T) = c_c + Σ_k d_k·τ^e_k for T < Tc (τ = 1 − T/Tc), c_c above: a Peneloux-type
 *   translation (Peneloux, Rauzy & Fréze 1982, Fluid Phase Equilib. 8, 7–23) made
 *   temperature dependent. The exponent 0.35 lets it follow the non-analytic shape of the
 *   real coexistence curve near Tc (β ≈ 0.33), which a cubic (β = 1/2) cannot.
 * - δ·κ/(κ + d), κ = 0.35, with the dimensionless distance function from the critical point
 *   d = −(v_cub²/(R·T))·(∂p/∂v)_T of the cubic: the correction of Mathias, Naheiri & Oh
 *   (1989, Fluid Phase Equilib. 47, 77–87), as used in the volume-translated PR of Abudour et
 *   al. (2012, Fluid Phase Equilib. 335, 74–87). It is largest at the critical point (d = 0)
 *   and fades in the compressed liquid (d ≫ 1), which fixes the cubic's liquid compressibility.
 * - s(r) = r·(1 − r)² for r = v_c,cub/v_cub < 1, else 0: a vapour-side term that vanishes in
 *   the dilute gas, at the critical point and in all liquid states; ε(T) = e0 + e1·τ + e2·τ².
 *   It corrects the width of the cubic's coexistence curve on the vapour side near Tc.
 *
 * At the critical point v = v_c,cub − c_c − δ; the fit fixes c_c + δ = v_c,cub − M/ρc so the
 * model's critical density is the reference one.
 *
 * Phase equilibrium is computed with the cubic itself. The c(T) part, mixed linearly, shifts
 * every ln φ_i equally in all phases and so leaves equilibrium unchanged; the other two terms
 * are volume corrections applied after equilibrium (a "density correction": volumes are not
 * derivable from the same Helmholtz energy as the fugacities). The model's p–v isotherms
 * stay monotone on each branch (checked in test/thermo/identities.test.ts, "pressure rises
 * with density along an isotherm").
 */

export const SHIFT_EXPONENTS: readonly number[] = [0.35, 0.5, 0.75, 1, 2];
export const DISTANCE_KAPPA = 0.35;

export interface VolumeCorrectionParams {
  /** c at and above the critical point, m³/mol. */
  readonly cc: number;
  /** Coefficients d_k for SHIFT_EXPONENTS, m³/mol. */
  readonly d: readonly number[];
  /** δ of the distance-function term, m³/mol. */
  readonly delta: number;
  /** e0, e1, e2 of ε(T), dimensionless. */
  readonly eps: readonly number[];
}

export const NO_CORRECTION: VolumeCorrectionParams = Object.freeze({
  cc: 0,
  d: [],
  delta: 0,
  eps: [],
});

/** The parameters a phase calculation needs at one temperature (for one component or mixed). */
export interface CorrectionAtT {
  /** c(T), m³/mol */
  c: number;
  /** δ, m³/mol */
  delta: number;
  /** ε(T) */
  eps: number;
  /** Critical volume of the cubic, m³/mol. */
  vcCub: number;
}

export function correctionAtT(
  params: VolumeCorrectionParams,
  Tc: number,
  vcCub: number,
  T: number,
): CorrectionAtT {
  const { d, eps: e } = params;
  // Empty arrays mean no such term (NO_CORRECTION); any other length is a data error.
  if ((d.length !== 0 && d.length !== SHIFT_EXPONENTS.length) || (e.length !== 0 && e.length !== 3))
    throw new RangeError(
      `volume correction needs ${SHIFT_EXPONENTS.length} shift coefficients and 3 ε coefficients (or none), got ${d.length} and ${e.length}`,
    );
  const tau = T < Tc ? 1 - T / Tc : 0;
  let c = params.cc;
  if (tau > 0) for (let k = 0; k < d.length; k++) c += d[k]! * Math.pow(tau, SHIFT_EXPONENTS[k]!);
  const eps = e.length === 0 ? 0 : e[0]! + tau * (e[1]! + tau * e[2]!);
  return { c, delta: params.delta, eps, vcCub };
}

/** s(r) = r(1 − r)² for r < 1, else 0. */
export function vapourBump(r: number): number {
  return r < 1 ? r * (1 - r) * (1 - r) : 0;
}

/**
 * The model's molar volume from the cubic's molar volume vCub (m³/mol) and the cubic's
 * dimensionless distance function d at that state.
 */
export function correctedVolume(k: CorrectionAtT, vCub: number, d: number): number {
  const g = DISTANCE_KAPPA / (DISTANCE_KAPPA + Math.max(d, 0));
  return vCub - k.c - k.delta * g - vCub * vapourBump(k.vcCub / vCub) * k.eps;
}
