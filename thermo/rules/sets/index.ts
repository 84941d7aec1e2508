/**
 * The registry of rule sets (id → RuleSet). Adding a jurisdiction is adding a folder beside
 * us-federal/, registering it here and passing test/thermo/rules/ruleset-conformance.test.ts
 * (see DEVELOPERS.md, "How to add a rule set").
 */
import type { RuleSet } from '../ruleset.js';
import { US_FEDERAL } from './us-federal/index.js';

/** Every registered rule set, in the order a picker lists them. */
export const RULE_SETS: readonly RuleSet[] = [US_FEDERAL];

/** The set a site or tank without a choice uses. */
export const DEFAULT_RULE_SET: RuleSet = US_FEDERAL;
export { DEFAULT_RULE_SET_ID, RULE_SET_IDS } from './ids.js';

const BY_ID = new Map(RULE_SETS.map((s) => [s.id, s]));

/** The rule set with this id, or undefined (never an Object built-in: a Map, not a plain {}). */
export function ruleSetById(id: string): RuleSet | undefined {
  return BY_ID.get(id);
}
