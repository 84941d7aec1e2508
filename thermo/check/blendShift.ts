/**
 * A zeotropic blend (one whose bubble and dew points differ by a glide of a kelvin or more) in
 * a cylinder: what a composition shift does to the pressure reading. A vapour-only withdrawal
 * or a vapour leak takes more of the volatile components than their share and leaves a liquid
 * richer in the heavy ones, whose bubble pressure is lower; vapour recovered from a system, or
 * a cylinder filled from another one's vapour side, is richer in the volatile ones and reads
 * higher. Physics of vapour–liquid equilibrium (the incipient vapour at a bubble point is
 * richer in the volatile components: see the core's `saturation(...).y`).
 */
import { dewPoint, describeProduct, saturation } from '../api.js';
import { fluidById } from '../data/fluids.js';
import type { Product } from '../product.js';

/** Glide at or above which a blend is called zeotropic here, K (near-azeotropes glide < 1 K). */
export const ZEOTROPIC_GLIDE_K = 1;

export interface Glide {
  /** Dew-point temperature minus bubble-point temperature at the bubble pressure of T, K (estimate). */
  kelvin: number;
  /** Names of the volatile components (richer in the vapour) and of the others. */
  light: string[];
  heavy: string[];
}

/**
 * The blend's temperature glide at T, estimated from its bubble and dew pressures at T and the
 * slope of the bubble curve (ln p linear in T over the glide), or null for a pure fluid or a
 * temperature the core refuses.
 */
export function blendGlide(product: Product, T: number): Glide | null {
  // The glide is worded to 0.1 K: one solution per product and 0.1 K step serves a live form.
  const key = `${JSON.stringify(product)}|${T.toFixed(1)}`;
  if (glideCache.has(key)) return glideCache.get(key)!;
  const g = computeGlide(product, Math.round(T * 10) / 10);
  if (glideCache.size >= 64) glideCache.delete(glideCache.keys().next().value!);
  glideCache.set(key, g);
  return g;
}

const glideCache = new Map<string, Glide | null>();

function computeGlide(product: Product, T: number): Glide | null {
  const d = describeProduct(product);
  if (d.components.length < 2) return null;
  try {
    const bubble = saturation(product, T);
    const pb = bubble.pAbs;
    const pd = dewPoint(product, T).pAbs;
    const pb1 = saturation(product, T - 1).pAbs;
    const slope = Math.log(pb / pb1);
    const kelvin = slope > 0 ? Math.log(pb / pd) / slope : 0;
    // Volatile: richer in the incipient vapour than in the liquid (K_i = y_i/x_i > 1).
    const name = (id: string) => fluidById(id)?.name ?? id;
    const light = d.components.filter((c, i) => bubble.y[i]! > c.moleFraction);
    const heavy = d.components.filter((c, i) => bubble.y[i]! <= c.moleFraction);
    return { kelvin, light: light.map((c) => name(c.id)), heavy: heavy.map((c) => name(c.id)) };
  } catch {
    return null;
  }
}

/** Causes to add to a high or low reading for a zeotropic blend (empty otherwise). */
export function compositionShiftCauses(
  product: Product,
  T: number,
  verdict: 'high' | 'low' | 'fits',
): string[] {
  if (verdict === 'fits') return [];
  const g = blendGlide(product, T);
  if (!g || g.kelvin < ZEOTROPIC_GLIDE_K) return [];
  const label = describeProduct(product).label;
  const glide = `${label} is a zeotropic blend (it glides about ${g.kelvin.toFixed(1)} K between bubble and dew point here)`;
  return verdict === 'low'
    ? [
        `${glide}: a vapour-only withdrawal or a vapour leak takes more of ${g.light.join(' and ')} and leaves a liquid richer in ${g.heavy.join(' and ')}, whose pressure is lower than the nominal blend's.`,
      ]
    : [
        `${glide}: contents richer in ${g.light.join(' and ')} than the nominal blend (recovered vapour, or product taken from another cylinder's vapour side) read higher.`,
      ];
}
