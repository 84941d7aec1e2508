/**
 * The site's own stricter rule as limits beside the rule set's (kind `site`). The fill limit
 * takes the lowest of all, so a site rule can lower the limit and never raise it; a looser
 * figure is listed and does not bind.
 *
 * - maximum fill percent: liquid in at most that share of the container at the present liquid
 *   temperature (what the float gauge reads), as a mass percent × V × ρL(T) + the vapour in the
 *   rest, rounded down, like a rule's printed volume limit; not applied above the critical
 *   temperature (no liquid level to read);
 * - maximum filling density: that fraction of the water weight capacity at 60 °F, rounded down.
 */
import { floorTo, percentForMass, type FillLimitContext } from './fillLimit.js';
import type { LimitEntry } from './types.js';

export const SITE_PERCENT_ID = 'site-max-fill-percent';
export const SITE_DENSITY_ID = 'site-max-filling-density';
const CITATION = 'this site’s own rule (entered for the site; stricter than the rule set)';

const words = (x: number) => `${+x.toFixed(2)} %`;

export function siteLimits(k: FillLimitContext): LimitEntry[] {
  const r = k.siteRule;
  if (!r) return [];
  const out: LimitEntry[] = [];
  const s = k.satNow;
  if (r.maxFillPercent !== undefined && s) {
    const f = r.maxFillPercent / 100;
    const maxMass = floorTo(k.c.V * (f * s.rhoL + (1 - f) * s.rhoV), 0.01);
    out.push({
      id: SITE_PERCENT_ID,
      kind: 'site',
      description: `This site’s own rule: liquid in at most ${words(r.maxFillPercent)} of the container by volume at the present liquid temperature`,
      citation: CITATION,
      maxMass,
      fillingDensity: maxMass / k.waterWeight,
      referenceTemperature: null,
      modelAllowance: 0,
      gaugePercent: r.maxFillPercent,
    });
  }
  if (r.maxFillingDensity !== undefined) {
    const maxMass = floorTo(r.maxFillingDensity * k.waterWeight, 0.01);
    out.push({
      id: SITE_DENSITY_ID,
      kind: 'site',
      description: `This site’s own rule: at most ${words(r.maxFillingDensity * 100)} of the water weight capacity`,
      citation: CITATION,
      maxMass,
      fillingDensity: r.maxFillingDensity,
      referenceTemperature: null,
      modelAllowance: 0,
      gaugePercent: percentForMass(k, maxMass),
    });
  }
  return out;
}
