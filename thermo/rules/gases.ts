/**
 * Filling-density rules for the gases other than LP-gas, and which rule applies to a product in
 * a container. Percent of the weight of water (60 °F) the container holds. CFR 2015 annual
 * edition text (check the current eCFR before release).
 */
import type { Product } from '../product.js';
import type { ContainerClass, Placement } from '../check/types.js';
import { DOT_DIP_TUBE_FACTOR, lpgFillingDensity, type LpgColumn } from './lpgas.js';
import { GAL_1200_M3 } from './water.js';

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

/** The filling-density rule for a product in a container, or null when none of the tables covers it. */
export function fillingRule(ctx: RuleContext): RuleChoice | null {
  const ids = productIds(ctx.product);
  const single = ids && ids.length === 1 ? ids[0]!.id : null;
  const dot = ctx.containerClass === 'cargo' || ctx.containerClass === 'portable';
  const small = ctx.waterCapacity <= GAL_1200_M3 * (1 + 1e-12);

  if (isLpGas(ctx.product)) {
    let column: LpgColumn;
    if (ctx.containerClass === 'cylinder') column = 'dot-cylinder';
    else if (dot) column = small ? 'dot-cargo-small' : 'dot-cargo-large';
    else if (ctx.placement === 'underground') column = 'h27-underground';
    else column = small ? 'h27-aboveground-small' : 'h27-aboveground-large';
    const fd = lpgFillingDensity(ctx.specificGravity, column);
    if (!fd) return null;
    const dip = dot && ctx.fixedDipTube;
    const pct = dip ? fd.percent * DOT_DIP_TUBE_FACTOR : fd.percent;
    const band = `SG ${fd.band[0].toFixed(3)}${fd.band[1] === null ? ' and over' : `–${fd.band[1].toFixed(3)}`}`;
    return {
      id: column,
      description: `LP-gas filling density ${fd.percent} % of water weight (${band})${dip ? ` × 0.97 for a fixed dip tube = ${pct.toFixed(2)} %` : ''}`,
      citation: fd.citation + (dip ? '; 49 CFR 173.315(b) Note 1' : ''),
      fillingDensity: pct / 100,
    };
  }

  switch (single) {
    case 'ammonia': {
      if (ctx.containerClass === 'cylinder')
        return rule(
          'nh3-cylinder',
          'Anhydrous ammonia in DOT cylinders: 54 % of water weight',
          '49 CFR 173.304a(a)(2) (CFR 2015 ed.)',
          54,
        );
      if (dot)
        return rule(
          'nh3-cargo',
          'Anhydrous ammonia in DOT cargo/portable tanks: 56 % of water weight',
          '49 CFR 173.315(a) table (CFR 2015 ed.)',
          56,
        );
      if (ctx.placement === 'underground') {
        // The table lists underground uninsulated (58 %) only; an insulated underground tank takes the lower insulated figure.
        return ctx.insulated
          ? rule(
              'nh3-storage-insulated',
              'Anhydrous ammonia, insulated container: 57 % of water weight',
              '29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)',
              57,
            )
          : rule(
              'nh3-storage-underground',
              'Anhydrous ammonia, underground uninsulated container: 58 % of water weight',
              '29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)',
              58,
            );
      }
      return ctx.insulated
        ? rule(
            'nh3-storage-insulated',
            'Anhydrous ammonia, aboveground insulated container: 57 % of water weight',
            '29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)',
            57,
          )
        : rule(
            'nh3-storage-aboveground',
            'Anhydrous ammonia, aboveground uninsulated container: 56 % of water weight',
            '29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)',
            56,
          );
    }
    case 'carbon-dioxide':
      if (ctx.containerClass === 'cylinder')
        return rule(
          'co2-cylinder',
          'Carbon dioxide in DOT 1800 psig class cylinders: 68 % of water weight',
          '49 CFR 173.304a(a)(2) (CFR 2015 ed.)',
          68,
        );
      return null;
    case 'nitrous-oxide':
      if (ctx.containerClass === 'cylinder')
        return rule(
          'n2o-cylinder',
          'Nitrous oxide in DOT 1800 psig class cylinders: 68 % of water weight',
          '49 CFR 173.304a(a)(2) (CFR 2015 ed.)',
          68,
        );
      return null;
    case 'chlorine':
      if (ctx.containerClass !== 'storage')
        return rule(
          'cl2',
          'Chlorine: 125 % of water weight',
          '49 CFR 173.304a(a)(2); 173.315(a) table (CFR 2015 ed.)',
          125,
        );
      return null;
    case 'sulfur-dioxide':
      if (ctx.containerClass !== 'storage')
        return rule(
          'so2',
          'Sulfur dioxide: 125 % of water weight',
          '49 CFR 173.304a(a)(2); 173.315(a) table (CFR 2015 ed.)',
          125,
        );
      return null;
    case 'r22':
      if (ctx.containerClass !== 'storage')
        return rule(
          'r22',
          'R-22: 105 % of water weight',
          '49 CFR 173.304a(a)(2); 173.315(a) table (CFR 2015 ed.)',
          105,
        );
      return null;
    case 'dimethyl-ether':
      if (dot)
        return rule(
          'dme-cargo',
          'Dimethyl ether in DOT cargo/portable tanks: 59 % of water weight',
          '49 CFR 173.315(a) table (CFR 2015 ed.)',
          59,
        );
      return null;
    default:
      return null;
  }
}

function rule(id: string, description: string, citation: string, pct: number): RuleChoice {
  return { id, description, citation, fillingDensity: pct / 100 };
}

/** True when every component is a refrigerant covered by the "refrigerant gas n.o.s." entry. */
export function isRefrigerantNos(product: Product): boolean {
  const ids = productIds(product);
  return !!ids && ids.length > 0 && ids.every((c) => REFRIGERANT_NOS_IDS.includes(c.id));
}

/**
 * Not-liquid-full rules by container class (the forecast peak is added by the caller):
 * - refrigerant gas n.o.s. in DOT cylinders: not liquid full at 130 °F (49 CFR 173.304a(a)(2));
 * - every liquefied gas in DOT cylinders: not liquid full at any temperature up to 131 °F
 *   (49 CFR 173.304(b)), except CO2 and N2O.
 */
export function referenceRules(
  product: Product,
  containerClass: ContainerClass,
): PhysicalRuleChoice[] {
  const out: PhysicalRuleChoice[] = [];
  if (containerClass !== 'cylinder') return out;
  if (isRefrigerantNos(product)) {
    out.push({
      id: 'refrigerant-130F',
      description: 'Refrigerant gas n.o.s. in DOT cylinders: not liquid full at 130 °F (54.4 °C)',
      citation: '49 CFR 173.304a(a)(2) (CFR 2015 ed.)',
      referenceTemperature: T_130F_K,
    });
  }
  const ids = productIds(product);
  const exempt = !!ids && ids.length === 1 && EXEMPT_FROM_131F.includes(ids[0]!.id);
  if (!exempt) {
    out.push({
      id: 'dot-131F',
      description:
        'Liquefied gas in DOT cylinders: not liquid full at any temperature up to 131 °F (55 °C)',
      citation: '49 CFR 173.304(b) (CFR 2015 ed.)',
      referenceTemperature: T_131F_K,
    });
  }
  return out;
}
