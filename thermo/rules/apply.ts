/**
 * Reading a rule set (ruleset.ts): which weight rule and which not-liquid-full temperatures apply
 * to a product in a container. The set defaults to the US federal one.
 */
import type { Product } from '../product.js';
import type { ContainerClass } from '../types.js';
import {
  isLpGas,
  isRefrigerantNos,
  productIds,
  type PhysicalRuleChoice,
  type RuleChoice,
  type RuleContext,
} from './gases.js';
import { sgBandPercent } from './lpgas.js';
import type { FillingDensityEntry, ProductGroup, RuleSet } from './ruleset.js';
import { DEFAULT_RULE_SET } from './sets/index.js';

/** True when `product` belongs to `group`. */
export function inGroup(product: Product, group: ProductGroup): boolean {
  if (group === 'lp-gas') return isLpGas(product);
  if (group === 'refrigerant-nos') return isRefrigerantNos(product);
  const ids = productIds(product);
  return !!ids && ids.length === 1 && ids[0]!.id === group.fluid;
}

function matches(e: FillingDensityEntry, ctx: RuleContext, set: RuleSet): boolean {
  if (!e.classes.includes(ctx.containerClass)) return false;
  if (e.placement !== undefined && e.placement !== ctx.placement) return false;
  if (e.insulated !== undefined && e.insulated !== ctx.insulated) return false;
  if (e.size !== undefined) {
    const small = ctx.waterCapacity <= set.sizeSplitM3 * (1 + 1e-12);
    if ((e.size === 'small') !== small) return false;
  }
  return inGroup(ctx.product, e.product);
}

/**
 * The weight rule of `set` for a product in a container: the first entry that matches, or null
 * when none does or when its specific-gravity table has no band for this liquid.
 */
export function fillingRule(ctx: RuleContext, set: RuleSet = DEFAULT_RULE_SET): RuleChoice | null {
  const e = set.fillingDensities.find((x) => matches(x, ctx, set));
  if (!e) return null;
  const dip = ctx.fixedDipTube && e.fixedGauge ? e.fixedGauge : null;
  if (typeof e.percent === 'number') {
    const pct = dip ? e.percent * dip.factor : e.percent;
    return {
      id: e.id,
      description: e.description,
      citation: e.citation,
      fillingDensity: pct / 100,
    };
  }
  const table = set.sgTables[e.percent.table];
  const fd = table ? sgBandPercent(table, e.percent.column, ctx.specificGravity) : null;
  if (!fd) return null;
  const pct = dip ? fd.percent * dip.factor : fd.percent;
  const [lo, hi] = fd.band;
  const band = `SG ${lo.toFixed(3)}${hi === null ? ' and over' : `–${hi.toFixed(3)}`}`;
  return {
    id: e.id,
    description: `${e.description} filling density ${fd.percent} % of water weight (${band})${dip ? ` × ${dip.factor} for a fixed dip tube = ${pct.toFixed(2)} %` : ''}`,
    citation: e.citation + (dip ? `; ${dip.citation}` : ''),
    fillingDensity: pct / 100,
  };
}

/** The not-liquid-full temperatures of `set` for a product in a container class, in the set's order. */
export function referenceRules(
  product: Product,
  containerClass: ContainerClass,
  set: RuleSet = DEFAULT_RULE_SET,
): PhysicalRuleChoice[] {
  const ids = productIds(product);
  const single = ids && ids.length === 1 ? ids[0]!.id : null;
  return set.referenceTemperatures
    .filter(
      (r) =>
        r.classes.includes(containerClass) &&
        (r.product === undefined || inGroup(product, r.product)) &&
        !(single !== null && r.except?.includes(single)),
    )
    .map((r) => ({
      id: r.id,
      kind: r.kind,
      description: r.description,
      citation: r.citation,
      referenceTemperature: r.temperature,
    }));
}
