/**
 * A site's rules as the app keeps them with the site record (`SiteForecast.ruleSet`,
 * `SiteForecast.siteRule`, both optional): which rule set applies and the site's own stricter
 * rule. Pure and light (no rule data: the app shell and the backup use it); the check takes them
 * through `runCheck(…, rules)`.
 */
import { DEFAULT_RULE_SET_ID, RULE_SET_IDS } from '../thermo/rules/sets/ids.js';
import { SITE_RULE_RANGES, type SiteRule } from '../thermo/rules/siteRule.js';

export type { SiteRule };
export { SITE_RULE_RANGES };

/** What a check at a site takes from the site record. */
export interface SiteRules {
  /** Rule set id (absent: the default, US federal). */
  ruleSet?: string;
  /** The site's own stricter rule (absent: none). */
  siteRule?: SiteRule;
}

/** The rules stored with a site record (absent fields stay absent). */
export function siteRulesOf(site: SiteRules | null | undefined): SiteRules {
  if (!site) return {};
  return {
    ...(site.ruleSet !== undefined && site.ruleSet !== DEFAULT_RULE_SET_ID
      ? { ruleSet: site.ruleSet }
      : {}),
    ...(site.siteRule && Object.keys(site.siteRule).length ? { siteRule: site.siteRule } : {}),
  };
}

/**
 * Checks the rules of a site record read back from a backup. Returns why it is refused, or
 * null when it is fine (absent fields are fine: older backups have none).
 */
export function siteRulesProblem(o: Record<string, unknown>): string | null {
  const id = o['ruleSet'];
  if (id !== undefined && (typeof id !== 'string' || !RULE_SET_IDS.includes(id)))
    return `its rule set must be one of ${RULE_SET_IDS.join(', ')}`;
  const r = o['siteRule'];
  if (r === undefined) return null;
  if (!r || typeof r !== 'object' || Array.isArray(r)) return 'its own rule is not an object';
  const rule = r as Record<string, unknown>;
  for (const key of Object.keys(rule))
    if (key !== 'maxFillPercent' && key !== 'maxFillingDensity')
      return `its own rule has an unknown field ${key.slice(0, 40)}`;
  for (const key of ['maxFillPercent', 'maxFillingDensity'] as const) {
    const x = rule[key];
    const { min, max } = SITE_RULE_RANGES[key];
    if (x !== undefined && (typeof x !== 'number' || !(x >= min && x <= max)))
      return `its own rule's ${key} must be a number from ${min} to ${max}`;
  }
  return null;
}
