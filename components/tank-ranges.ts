/** Ranges the form accepts, SI. They match what the check engine accepts (thermo/check/validate.ts). */
export const TANK_RANGES = {
  waterCapacity: { min: 1e-4, max: 1e5 },
  pressure: { min: 1e4, max: 1e8 },
  mdmt: { min: 73.15, max: 373.15 },
  sphereDiameter: { min: 0.05, max: 50 },
  diameter: { min: 0.05, max: 20 },
  shellLength: { min: 0, max: 200 },
  /** Recovery-cylinder liquid-volume limit, fraction (thermo/rules/recovery.ts). */
  recoveryFraction: { min: 0.5, max: 0.95 },
} as const;
