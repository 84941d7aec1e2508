/**
 * The products a tank can hold, as the app offers them: every fluid the core lists, grouped
 * the way the trade thinks of them, plus the LP-gas blend presets of the check engine. The
 * stored tank keeps only `productId`; `productFor` turns it into the core's `Product`.
 *
 * It reads the core's data tables directly (names, triple points, preset compositions) rather
 * than through thermo/index.ts, so the tank register and the tank form load without the
 * solvers: the engine arrives with the check screen, in its own chunk (first-load budget).
 */
import { FLUIDS } from '../thermo/data/fluids.js';
import { LPG_PRESETS } from '../thermo/rules/presets.js';
import type { Product } from '../thermo/index.js';

export type ProductGroup = 'LP-gas' | 'Ammonia' | 'Refrigerant' | 'Carbon dioxide' | 'Other';

export interface ProductChoice {
  id: string;
  label: string;
  group: ProductGroup;
  product: Product;
  /** Where a blend preset's composition comes from. */
  source?: string;
}

const LP_GAS = new Set(['propane', 'n-butane', 'isobutane', 'propylene', '1-butene', 'isobutene']);

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
  cached = [...presets(), ...fluids].sort(
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
  const ids =
    typeof product === 'string'
      ? [product]
      : product && 'components' in product
        ? product.components.map((c) => c.id)
        : [];
  return ids.flatMap((x) => {
    const f = FLUIDS.find((fl) => fl.id === x);
    return f ? [f.Ttriple] : [];
  });
}
