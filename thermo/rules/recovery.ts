/**
 * The technician's usual limit for a refrigerant recovery cylinder: liquid in no more than a
 * fraction of the cylinder's volume (water capacity), 80 % by default — common practice
 * (test/reference/trade/FACTS.md a3: "commonly filled to no more than 80 % of volume"; the
 * industry guideline was not consulted). Settable per tank (`tank.recovery.fillFraction`).
 *
 * As a mass: fraction × water capacity (m³) × the blend's bubble-line liquid density at the
 * reference temperature 77 °F (25 °C) — the temperature of the usual refrigerant tables, our
 * choice, from memory — or at the present liquid temperature when that is warmer.
 * It adds to, and never replaces, the cylinder's regulatory limits (49 CFR 173.304a(a)(2),
 * 173.304(b)).
 */
import { InputError } from '../errors.js';

/** 77 °F in K. */
export const T_77F_K = ((77 - 32) * 5) / 9 + 273.15;
export const RECOVERY_DEFAULT_FRACTION = 0.8;
export const RECOVERY_FRACTION_RANGE: readonly [number, number] = [0.5, 0.95];

export interface RecoveryInput {
  /** Liquid volume limit as a fraction of the water capacity, 0.5…0.95 (default 0.8). */
  fillFraction?: number;
}

export interface RecoveryLimit {
  id: 'recovery-cylinder';
  description: string;
  citation: string;
  fraction: number;
  /** Temperature at which the liquid density is taken, K. */
  referenceTemperature: number;
}

/** Validates `tank.recovery` and returns the limit to apply, or null when not a recovery cylinder. */
export function recoveryLimit(
  recovery: RecoveryInput | undefined,
  liquidTemperature: number,
): RecoveryLimit | null {
  if (recovery === undefined) return null;
  if (recovery === null || typeof recovery !== 'object')
    throw new InputError('tank.recovery', 'an object { fillFraction? } or absent', recovery);
  const f = recovery.fillFraction ?? RECOVERY_DEFAULT_FRACTION;
  const [lo, hi] = RECOVERY_FRACTION_RANGE;
  // Number.isFinite is false for anything that is not a number (no coercion): no typeof needed.
  if (!Number.isFinite(f) || f < lo || f > hi)
    throw new InputError('tank.recovery.fillFraction', `a fraction from ${lo} to ${hi}`, f, {
      min: lo,
      max: hi,
      quantity: 'fraction',
    });
  const pct = Math.round(f * 1000) / 10;
  return {
    id: 'recovery-cylinder',
    description: `Recovery cylinder: liquid in no more than ${pct} % of the cylinder volume at 77 °F (25 °C) or the present liquid temperature if warmer`,
    citation: 'common practice for refrigerant recovery cylinders (settable per tank)',
    fraction: f,
    referenceTemperature: Math.max(T_77F_K, liquidTemperature),
  };
}
