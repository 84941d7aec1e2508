/**
 * Refrigerated liquid carbon dioxide and nitrous oxide in DOT-4L (insulated) cylinders:
 * 49 CFR 173.304a(e)(2) (CFR 2015 ed.) gives the maximum filling density, percent of the water
 * weight, by the pressure-relief setting (maximum start-to-discharge, psig). The check reads an
 * insulated DOT cylinder with a relief setting of 625 psig or less as a DOT-4L cylinder.
 */
import type { Product } from '../product.js';
import { productIds, type RuleChoice } from './gases.js';

/** Relief settings of the table's columns, psig. */
export const DOT_4L_RELIEF_PSIG = [105, 170, 230, 295, 360, 450, 540, 625] as const;
/** Filling density by column, percent. The 83 at 450 psig for N2O is as printed (non-monotonic). */
export const DOT_4L_PERCENT: Record<'carbon-dioxide' | 'nitrous-oxide', readonly number[]> = {
  'carbon-dioxide': [108, 105, 104, 102, 100, 98, 92, 86],
  'nitrous-oxide': [104, 101, 99, 97, 95, 83, 87, 80],
};

const PSI_PA = 6894.757293168;

/**
 * The DOT-4L rule for `product` with a relief set at `reliefSetPressureGauge` (Pa gauge), or null when
 * the product or setting is outside the table. A setting between two columns takes the column of
 * the next higher setting: a higher setting lets the liquid warm and swell further before the
 * valve opens, so that column is the cautious one. Figures as printed.
 */
export function dot4lRule(product: Product, reliefSetPressureGauge: number): RuleChoice | null {
  const ids = productIds(product);
  const id = ids && ids.length === 1 ? ids[0]!.id : null;
  if (id !== 'carbon-dioxide' && id !== 'nitrous-oxide') return null;
  const psig = reliefSetPressureGauge / PSI_PA;
  const col = DOT_4L_RELIEF_PSIG.findIndex((s) => psig <= s + 1e-6);
  if (col < 0) return null;
  const pct = DOT_4L_PERCENT[id][col]!;
  const name = id === 'carbon-dioxide' ? 'Carbon dioxide' : 'Nitrous oxide';
  return {
    id: 'dot-4l',
    description: `${name}, refrigerated liquid, in a DOT-4L cylinder with its relief set at ${Math.ceil(psig)} psig (column ${DOT_4L_RELIEF_PSIG[col]} psig): ${pct} % of water weight; offered at ${id === 'carbon-dioxide' ? '0 °F' : '+4 °F'} or colder and 290 psig or less`,
    citation: '49 CFR 173.304a(e)(2) (CFR 2015 ed.)',
    fillingDensity: pct / 100,
  };
}
