/**
 * Plausible ranges of the figures a user types, per quantity and container class. A value
 * outside them is not refused (real tanks are odd sometimes) but asked about before it is
 * taken: "Did you mean …?". The hard limits (what the engine can compute) stay in the forms'
 * RANGES. All values SI. Sources beside each figure; trade figures without a written source are
 * marked "common practice".
 */
import { toSI } from '../thermo/units.js';
import type { ContainerClass } from '../thermo/check/types.js';

export interface Plausible {
  min: number;
  max: number;
  /** Words for the question, e.g. "for a storage tank". */
  what: string;
}

const gal = (x: number) => toSI('volume', x, 'usgal');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const F = (x: number) => toSI('temperature', x, 'F');
/** Water weight of the filling rules: 8.32828 lb per US gal at 60 °F (49 CFR 173.315(a) Note 1). */
const LB_WATER_PER_GAL = 8.32828;

/** Water capacity per container class. */
export const PLAUSIBLE_WATER_CAPACITY: Record<ContainerClass, Plausible> = {
  // Common practice: the smallest stationary ASME LP-gas containers hold about 120 US gal w.c.;
  // pressurised storage spheres reach a few thousand m³ (about 1 000 000 US gal).
  storage: { min: gal(100), max: gal(1_000_000), what: 'for a storage tank' },
  // Common practice: the smallest refillable cylinders (small laboratory cylinders) hold about 0.4 L;
  // DOT-4B/4BA/4BW cylinders are limited to 1 000 lb water capacity (49 CFR 178.50–178.61,
  // from memory): 1 000 lb ÷ 8.32828 lb/US gal = 120 US gal.
  cylinder: {
    min: toSI('volume', 0.25, 'L'),
    max: gal(1000 / LB_WATER_PER_GAL),
    what: 'for a cylinder',
  },
  // Nurse tanks of 49 CFR 173.315(m) hold up to 3 000 US gal; common practice: cargo tanks
  // hold from a few hundred US gal to rail tank cars of about 34 000 US gal.
  cargo: { min: gal(250), max: gal(40_000), what: 'for a cargo tank' },
  // Common practice: portable tanks from small skid tanks to intermodal tanks of about 6 000 US gal.
  portable: { min: gal(10), max: gal(7_000), what: 'for a portable tank' },
};

/** Design pressure (MAWP) and relief set pressure per container class. */
export const PLAUSIBLE_DESIGN_PRESSURE: Record<ContainerClass, Plausible> = {
  // 29 CFR 1910.110(d)(2) Table H-31: the lowest container type is 80 (80 psig design);
  // common practice: pressurised storage above 600 psig is rare.
  storage: { min: psig(80), max: psig(600), what: 'for a storage tank' },
  // 49 CFR 173.304a(a)(2): the lowest service pressure among liquefied-gas cylinders is 150
  // (3A150; R-152a, R-142b); CO2 cylinders are marked up to 2 400 psig (FACTS, 173.304a).
  cylinder: { min: psig(150), max: psig(3000), what: 'for a cylinder' },
  // 49 CFR 178.337-1(b): MC-331 cargo tanks are designed for 100 to 500 psig.
  cargo: { min: psig(100), max: psig(500), what: 'for a cargo tank' },
  // Common practice: portable tanks for liquefied gases are designed like cargo tanks.
  portable: { min: psig(100), max: psig(500), what: 'for a portable tank' },
};

/**
 * Liquid temperature of a tank outdoors. Common practice: −50 °C (−58 °F) covers the coldest
 * inhabited winters and refrigerated storage of propane and ammonia; 49 CFR 173.304b takes
 * 60 °C (140 °F) as the hottest a cylinder of liquefied gas must stand without going liquid full.
 */
export const PLAUSIBLE_LIQUID_TEMPERATURE: Plausible = {
  min: F(-58),
  max: F(140),
  what: 'for a liquid in a tank outdoors',
};

export function plausibleFor(
  table: Record<ContainerClass, Plausible>,
  cls: ContainerClass | undefined,
): Plausible {
  return table[cls === undefined || !Object.hasOwn(table, cls) ? 'storage' : cls];
}
