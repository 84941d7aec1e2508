/**
 * Which rules a check applies: the rule set of the tank, else of the site, else the default
 * (US federal), and the site's own stricter rule. Throws `InputError` naming the field.
 */
import { InputError } from '../errors.js';
import type { RuleSet } from '../rules/ruleset.js';
import { DEFAULT_RULE_SET, RULE_SETS, ruleSetById } from '../rules/sets/index.js';
import { validateSiteRule, type SiteRule } from '../rules/siteRule.js';
import type { TankCheckInput } from './types.js';

function pick(id: unknown, field: string): RuleSet | null {
  if (id === undefined) return null;
  const set = typeof id === 'string' ? ruleSetById(id) : undefined;
  if (!set)
    throw new InputError(
      field,
      `one of the rule sets: ${RULE_SETS.map((s) => s.id).join(', ')}`,
      id,
    );
  return set;
}

export function resolveRules(input: TankCheckInput): {
  ruleSet: RuleSet;
  siteRule: SiteRule | null;
} {
  const site = pick(input.ruleSet, 'ruleSet');
  const tank = pick(input.tank.ruleSet, 'tank.ruleSet');
  return {
    ruleSet: tank ?? site ?? DEFAULT_RULE_SET,
    siteRule: validateSiteRule(input.siteRule, 'siteRule'),
  };
}
