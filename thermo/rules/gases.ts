/**
 * The product groups the US federal rules name (LP-gas, refrigerant gas n.o.s.), their reference
 * temperatures, and the shapes of a chosen rule. Which rule applies to a product in a container
 * is data: sets/us-federal/ (read by apply.ts). CFR 2015 annual edition text (check the current
 * eCFR before release).
 */
import type { Product } from '../product.js';
import type { ContainerClass, Placement } from '../types.js';

/** Fluid ids that are LP-gas (29 CFR 1910.110(a)(7): propane, propylene, butanes, butylenes). */
export const LPG_IDS: readonly string[] = [
  'propane',
  'propylene',
  'n-butane',
  'isobutane',
  '1-butene',
  'isobutene',
];

/**
 * Refrigerants without a named entry in 49 CFR 173.304a(a)(2): "refrigerant gas n.o.s.", which
 * must not be liquid full at 130 °F. (The flammable ones — R-32, R-143a, R-1234yf — ship as
 * flammable gas n.o.s.; the same 130 °F figure is applied to them here, which the
 * 173.304(b) 131 °F rule for every DOT cylinder nearly duplicates.)
 */
export const REFRIGERANT_NOS_IDS: readonly string[] = [
  'r134a',
  'r32',
  'r125',
  'r143a',
  'r1234yf',
  'r1234ze-e',
  // The refrigerant blends by id (thermo/data/blends.ts): the n.o.s. entry names R-404A, R-407C
  // and R-410A among its examples (test/reference/trade/FACTS.md a3); R-507A and R-454B are not
  // named either and take the same entry.
  'r410a',
  'r404a',
  'r407c',
  'r507a',
  'r454b',
];

/** Products that 49 CFR 173.304(b) lets be liquid full at 131 °F in DOT cylinders. */
export const EXEMPT_FROM_131F: readonly string[] = ['carbon-dioxide', 'nitrous-oxide'];

/** 130 °F in K (refrigerant n.o.s. rule). */
export const T_130F_K = ((130 - 32) * 5) / 9 + 273.15;
/** 131 °F (55 °C) in K, as printed (49 CFR 173.304(b)). */
export const T_131F_K = ((131 - 32) * 5) / 9 + 273.15;

/** Components of a product, as ids with mole fractions (custom fluids return null). */
export function productIds(product: Product): { id: string; x: number }[] | null {
  if (typeof product === 'string') return [{ id: product, x: 1 }];
  if (
    product &&
    typeof product === 'object' &&
    'components' in product &&
    Array.isArray(product.components)
  ) {
    return product.components
      .filter((c) => c.moleFraction > 0)
      .map((c) => ({ id: c.id, x: c.moleFraction }));
  }
  return null;
}

/**
 * LP-gas per 29 CFR 1910.110(a)(7): "composed predominantly of" propane, propylene, butanes and
 * butylenes. We read "predominantly" as at least 90 mol % of those, the rest ethane or n-pentane
 * (our reading, common practice for commercial grades).
 */
export function isLpGas(product: Product): boolean {
  const ids = productIds(product);
  if (!ids) return false;
  let lpg = 0;
  for (const c of ids) {
    if (LPG_IDS.includes(c.id)) lpg += c.x;
    else if (c.id !== 'ethane' && c.id !== 'n-pentane') return false;
  }
  return lpg >= 0.9 - 1e-9;
}

export interface RuleChoice {
  id: string;
  description: string;
  citation: string;
  /** Filling density, fraction of the water weight capacity. */
  fillingDensity: number;
}

export interface PhysicalRuleChoice {
  id: string;
  /** `rule` when the rule prints the figure as a filling rule; `physical` when it states the principle. */
  kind: 'rule' | 'physical';
  description: string;
  citation: string;
  /** Temperature up to which the container must not become liquid-full, K. */
  referenceTemperature: number;
}

export interface RuleContext {
  product: Product;
  containerClass: ContainerClass;
  placement: Placement;
  insulated: boolean;
  fixedDipTube: boolean;
  /** m³ */
  waterCapacity: number;
  /** Specific gravity 60/60 °F used for LP-gas bands. */
  specificGravity: number;
}

/** True when every component is a refrigerant covered by the "refrigerant gas n.o.s." entry. */
export function isRefrigerantNos(product: Product): boolean {
  const ids = productIds(product);
  return !!ids && ids.length > 0 && ids.every((c) => REFRIGERANT_NOS_IDS.includes(c.id));
}
