/**
 * Design-pressure, relief-valve and product-pressure rules, pressures in psig as the rules print
 * them (convert with units.ts). CFR 2015 annual edition text unless stated; check the current
 * eCFR before release.
 */
import { US_RELIEF_RANGES } from './sets/us-federal/relief.js';

/** Era of the container's construction code, which sets the relief range (Table H-26) and the design pressure for a container type (Table H-31). */
export type CodeEra = 'asme-1949-and-earlier' | 'asme-1950-and-later';

/**
 * Relief-valve start-to-discharge range as fractions of the design pressure (the US federal
 * set's data, sets/us-federal/relief.ts):
 * LP-gas, 29 CFR 1910.110(b)(10)(iv) Table H-26: U-68/U-69 (1949 and earlier) 110–125 %;
 * U-200/U-201, ASME 1950–1968, API-ASME 88–100 %.
 * Ammonia, 29 CFR 1910.111(b)(9)(ii): U-68/U-69 110–125 %; U-200/U-201, ASME 1952–1962,
 * API-ASME, USCG 95–100 %.
 */
export function reliefRange(
  service: 'lp-gas' | 'ammonia',
  era: CodeEra,
): { min: number; max: number; citation: string } {
  const r = US_RELIEF_RANGES.find((x) => x.service === service && x.era === era)!;
  return { min: r.min, max: r.max, citation: r.citation };
}

/**
 * LP-gas container type for a product's vapour pressure at 100 °F (29 CFR 1910.110(d)(2)
 * Table H-31 and its notes): types 80…200 in steps of 25 (type 200 may hold up to 215 psig),
 * then raised in steps of 25. Minimum design pressure = type × 1.00 (ASME 1949 and earlier,
 * U-68/U-69) or × 1.25 (later codes). Type 80 listed for completeness (not authorized new since 1947).
 */
export function containerTypeFor(
  vp100_psig: number,
  era: CodeEra,
): { type: number; minDesignPressure_psig: number } {
  const types = [80, 100, 125, 150, 175, 200];
  const maxVp: Record<number, number> = {
    80: 80,
    100: 100,
    125: 125,
    150: 150,
    175: 175,
    200: 215,
  };
  let type = types.find((t) => vp100_psig <= maxVp[t]!);
  if (type === undefined) type = 200 + 25 * Math.ceil((vp100_psig - 200) / 25);
  return { type, minDesignPressure_psig: type * (era === 'asme-1949-and-earlier' ? 1 : 1.25) };
}

/** DOT cylinders in LP-gas service: marked service pressure ≥ 4/5 of the product's vapour pressure at 130 °F, psig (29 CFR 1910.110(c)(9)). */
export function minCylinderServicePressure(vp130_psig: number): number {
  return 0.8 * vp130_psig;
}

/** ASTM D1835 commercial PB mixtures: vapour pressure at 100 °F ≤ 1167 − 1880·(relative density 60/60 °F) and ≤ 208 psig (ASTM D1835, 1997 edition as incorporated by reference; public excerpt). */
export function d1835PbMaxVapourPressure(relativeDensity: number): number {
  return Math.min(208, 1167 - 1880 * relativeDensity);
}

/** Rows of the relief-flow tables held here (ft² → ft³/min air): 29 CFR 1910.110(b)(10)(ii) and 1910.111 Table H-36 (excerpt). */
const FLOW_ROWS: Record<'lp-gas' | 'ammonia', Record<number, number>> = {
  'lp-gas': { 20: 626, 100: 2340, 500: 8760, 1000: 15470, 2000: 27310 },
  ammonia: { 20: 258, 100: 965, 500: 3620, 1000: 6380, 2500: 13520 },
};

/**
 * Minimum relief-valve flow, ft³/min of air at 60 °F and 14.7 psia, for a container of outside
 * surface area A (ft²). A listed table row is returned as printed; otherwise the formula the
 * regulation prints for areas beyond its table: LP-gas 53.632·A^0.82 (29 CFR 1910.110(b)(10)(ii)),
 * ammonia 22.11·A^0.82 (29 CFR 1910.111 Table H-36). The formula reproduces the table rows held
 * here within 0.2 %; between rows the code's full table governs.
 */
export function reliefFlowAir(area_ft2: number, service: 'lp-gas' | 'ammonia'): number {
  const row = FLOW_ROWS[service][area_ft2];
  return row ?? reliefFlowAirFormula(area_ft2, service);
}

/** The formula alone (for checking it against the table rows). */
export function reliefFlowAirFormula(area_ft2: number, service: 'lp-gas' | 'ammonia'): number {
  return (service === 'lp-gas' ? 53.632 : 22.11) * area_ft2 ** 0.82;
}

/** Outside surface area for the relief flow when not stamped, ft² (29 CFR 1910.110(b)(10)(ii); 1910.111 Table H-36 notes). Lengths in ft, overall length L. */
export function reliefSurfaceArea(
  shape: 'hemispherical-heads' | 'other-heads' | 'sphere',
  L_ft: number,
  D_ft: number,
): number {
  if (shape === 'sphere') return D_ft * D_ft * 3.1416;
  if (shape === 'hemispherical-heads') return L_ft * D_ft * 3.1416;
  return (L_ft + 0.3 * D_ft) * D_ft * 3.1416;
}

/** Hydrostatic relief between shutoff valves on LP-gas liquid piping, psig: ≥ 140 % of the container relief setting (≥ 400 psig for DOT containers) and ≤ 500 psig (29 CFR 1910.110(b)(10)(xii)). */
export function hydrostaticReliefRange(
  containerRelief_psig: number,
  dot: boolean,
): { min: number; max: number } {
  return {
    min: dot ? Math.max(400, 1.4 * containerRelief_psig) : 1.4 * containerRelief_psig,
    max: 500,
  };
}
