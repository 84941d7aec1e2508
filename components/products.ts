/**
 * The products a tank can hold, as the app offers them: every fluid the core lists, grouped
 * the way the trade thinks of them, plus the LP-gas blend presets of the check engine and the
 * refrigerant blends by id (R-410A …, with their nominal composition). The
 * stored tank keeps only `productId`; `productFor` turns it into the core's `Product`.
 *
 * It reads the core's data tables directly (names, triple points, preset compositions) rather
 * than through thermo/index.ts, so the tank register and the tank form load without the
 * solvers: the engine arrives with the check screen, in its own chunk (first-load budget).
 */
import { REFRIGERANT_BLENDS } from '../thermo/data/blends.js';
import { FLUIDS } from '../thermo/data/fluids.js';
import { LPG_PRESETS } from '../thermo/rules/presets.js';
import { LPG_IDS } from '../thermo/rules/gases.js';
import type { Product } from '../thermo/index.js';

export type ProductGroup = 'LP-gas' | 'Ammonia' | 'Refrigerant' | 'Carbon dioxide' | 'Other';

export interface ProductChoice {
  id: string;
  label: string;
  group: ProductGroup;
  product: Product;
  /** Where a blend preset's composition comes from. */
  source?: string;
  /** A refrigerant blend's nominal composition in words, e.g. `R-32/R-125 50/50 % by mass`. */
  composition?: string;
}

const LP_GAS = new Set(LPG_IDS);

function groupOf(id: string): ProductGroup {
  if (LP_GAS.has(id)) return 'LP-gas';
  if (id === 'ammonia') return 'Ammonia';
  if (id === 'carbon-dioxide') return 'Carbon dioxide';
  if (/^r\d/.test(id)) return 'Refrigerant';
  return 'Other';
}

function presets(): ProductChoice[] {
  return LPG_PRESETS.map((p) => ({
    id: `preset:${p.id}`,
    label: p.name,
    group: 'LP-gas' as const,
    product: p.product,
    source: p.source,
  }));
}

const fluidName = (id: string) => FLUIDS.find((f) => f.id === id)?.name ?? id;

/** The refrigerant blends by id (thermo/data/blends.ts), with their nominal composition. */
function refrigerantBlends(): ProductChoice[] {
  return REFRIGERANT_BLENDS.map((b) => {
    const composition = `${b.massFractions.map((c) => fluidName(c.id)).join('/')} ${b.massFractions
      .map((c) => String(Math.round(c.w * 1000) / 10))
      .join('/')} % by mass`;
    return {
      id: b.id,
      label: `${b.name} (${composition})`,
      group: 'Refrigerant' as const,
      product: b.id,
      source: b.source,
      composition,
    };
  });
}

let cached: ProductChoice[] | null = null;

/** Every product choice, LP-gas first. */
export function productChoices(): ProductChoice[] {
  if (cached) return cached;
  const order: ProductGroup[] = ['LP-gas', 'Ammonia', 'Refrigerant', 'Carbon dioxide', 'Other'];
  const fluids: ProductChoice[] = FLUIDS.map((f) => ({
    id: f.id,
    label: f.name,
    group: groupOf(f.id),
    product: f.id,
  }));
  cached = [...presets(), ...refrigerantBlends(), ...fluids].sort(
    (a, b) => order.indexOf(a.group) - order.indexOf(b.group),
  );
  return cached;
}

export function productChoice(id: string): ProductChoice | undefined {
  return productChoices().find((p) => p.id === id);
}

/** The core's product for a stored id, or undefined for an unknown id. */
export function productFor(id: string): Product | undefined {
  return productChoice(id)?.product;
}

/** Display label of a stored product id (the id itself when unknown). */
export function productLabel(id: string): string {
  return productChoice(id)?.label ?? id;
}

/** Triple-point temperatures of the product's components, K (the lowest the core accepts). */
export function tripleTemperatures(id: string): number[] {
  const product = productFor(id);
  const blend = REFRIGERANT_BLENDS.find((b) => b.id === product);
  const ids = blend
    ? blend.massFractions.map((c) => c.id)
    : typeof product === 'string'
      ? [product]
      : product && 'components' in product
        ? product.components.map((c) => c.id)
        : [];
  return ids.flatMap((x) => {
    const f = FLUIDS.find((fl) => fl.id === x);
    return f ? [f.Ttriple] : [];
  });
}
