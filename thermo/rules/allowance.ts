/**
 * How far the core's figures may be off, applied toward safety where a result turns on them.
 * The core states its accuracy against the reference equations of state as ±0.5 % in vapour
 * pressure and ±0.5 % in saturated liquid density (thermo core notes; checked by the core's
 * reference tests).
 *
 * - Pressures at the peak are raised by `VAPOUR_PRESSURE` (relative, on absolute pressure) before
 *   the headroom to design and relief is taken, so model error cannot hide a lack of headroom.
 * - "Not liquid full at T_ref" limits use the liquid density at T_ref lowered by
 *   `LIQUID_DENSITY`, so model error cannot let the tank reach liquid-full below T_ref.
 * - A liquid-full tank's pressure follows the liquid's compressibility, where 0.1 % in density
 *   is several percent in pressure: the core reproduces the reference pressures 2 K and 5 K past
 *   liquid-full within about 8 % (README, limits of validity), so a liquid-full peak is raised by
 *   `liquidFullPressure` instead.
 * Filling-density rules from the tables are applied exactly as printed (no allowance).
 */
export const MODEL_ALLOWANCE = {
  /** Relative uncertainty of vapour (bubble) pressure, fraction. */
  vapourPressure: 0.005,
  /** Relative uncertainty of saturated liquid density, fraction. */
  liquidDensity: 0.005,
  /** Relative uncertainty of the pressure of a liquid-full (hydraulically full) tank, fraction. */
  liquidFullPressure: 0.1,
} as const;
