/**
 * A site's own stricter rule: a company's maximum fill percent by volume and/or maximum filling
 * density, entered for a site. It is added to the rule set's limits, so the lowest still binds:
 * it can lower the limit, never raise it (a looser figure simply does not bind).
 */
import { InputError } from '../errors.js';

export interface SiteRule {
  /** Most liquid by volume at the present liquid temperature, percent of the container, 1…100. */
  maxFillPercent?: number;
  /** Most product by weight, fraction of the water weight capacity at 60 °F, 0.01…1.25. */
  maxFillingDensity?: number;
}

/** Valid ranges: a percent of the container; a filling density up to the highest any rule prints (chlorine, 125 %). */
export const SITE_RULE_RANGES = {
  maxFillPercent: { min: 1, max: 100 },
  maxFillingDensity: { min: 0.01, max: 1.25 },
} as const;

function field(r: Record<string, unknown>, name: keyof SiteRule, at: string): number | undefined {
  const x = r[name];
  if (x === undefined) return undefined;
  const { min, max } = SITE_RULE_RANGES[name];
  const percent = name === 'maxFillPercent';
  if (typeof x !== 'number' || !Number.isFinite(x) || x < min || x > max)
    throw new InputError(
      `${at}.${name}`,
      percent
        ? `a percent from ${min} to ${max}`
        : `a fraction of the water weight from ${min} to ${max}`,
      x,
      percent ? { min, max } : { min, max, quantity: 'fraction' },
    );
  return x;
}

/** Checks a site rule; throws `InputError` naming `siteRule.…` and its range. Null when absent or empty. */
export function validateSiteRule(rule: unknown, at = 'siteRule'): SiteRule | null {
  if (rule === undefined || rule === null) return null;
  if (typeof rule !== 'object' || Array.isArray(rule))
    throw new InputError(at, 'an object { maxFillPercent?, maxFillingDensity? } or absent', rule);
  const r = rule as Record<string, unknown>;
  const maxFillPercent = field(r, 'maxFillPercent', at);
  const maxFillingDensity = field(r, 'maxFillingDensity', at);
  if (maxFillPercent === undefined && maxFillingDensity === undefined) return null;
  return {
    ...(maxFillPercent !== undefined ? { maxFillPercent } : {}),
    ...(maxFillingDensity !== undefined ? { maxFillingDensity } : {}),
  };
}
