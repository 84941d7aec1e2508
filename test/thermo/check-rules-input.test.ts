/**
 * Which rules a check applies (thermo/check/rulesInput.ts), against the input contract written
 * in thermo/check/types.ts (`TankCheckInput.ruleSet`: "the site's rule set; `tank.ruleSet`
 * overrides it; default `us-federal`") and the site rule's own validation
 * (thermo/rules/siteRule.ts). The registry holds one set today; to see that the tank's choice
 * wins over the site's, this file registers a second set (a copy of the federal one under
 * another id) beside it.
 */
import { describe, expect, it, vi } from 'vitest';
import { resolveRules } from '../../thermo/check/rulesInput.js';
import { InputError } from '../../thermo/errors.js';
import type { TankCheckInput } from '../../thermo/check/types.js';
import type { RuleSet } from '../../thermo/rules/ruleset.js';

vi.mock('../../thermo/rules/sets/index.js', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../thermo/rules/sets/index.js')>();
  const other: RuleSet = { ...real.DEFAULT_RULE_SET, id: 'second-set' };
  const sets = [...real.RULE_SETS, other];
  return {
    ...real,
    RULE_SETS: sets,
    ruleSetById: (id: string) => sets.find((s) => s.id === id),
  };
});

const input = (over: Record<string, unknown> = {}, tank: Record<string, unknown> = {}) =>
  ({ tank: { waterCapacity: 1, ...tank }, ...over }) as unknown as TankCheckInput;

function refusal(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('not refused');
}

describe('the rule set a check applies', () => {
  it('is the federal set when neither the site nor the tank names one', () => {
    const r = resolveRules(input());
    expect(r.ruleSet.id).toBe('us-federal');
    expect(r.siteRule).toBeNull();
  });

  it('is the site’s when only the site names one', () => {
    expect(resolveRules(input({ ruleSet: 'second-set' })).ruleSet.id).toBe('second-set');
    expect(resolveRules(input({ ruleSet: 'us-federal' })).ruleSet.id).toBe('us-federal');
  });

  it('is the tank’s when the tank names one, whatever the site says', () => {
    expect(resolveRules(input({}, { ruleSet: 'second-set' })).ruleSet.id).toBe('second-set');
    expect(
      resolveRules(input({ ruleSet: 'us-federal' }, { ruleSet: 'second-set' })).ruleSet.id,
    ).toBe('second-set');
    expect(
      resolveRules(input({ ruleSet: 'second-set' }, { ruleSet: 'us-federal' })).ruleSet.id,
    ).toBe('us-federal');
  });

  it('refuses an unknown or non-text id, naming the field and the sets there are', () => {
    for (const [over, tank, field, got] of [
      [{ ruleSet: 'us-fed' }, {}, 'ruleSet', 'us-fed'],
      [{ ruleSet: 42 }, {}, 'ruleSet', 42],
      [{}, { ruleSet: 'toString' }, 'tank.ruleSet', 'toString'],
      [{ ruleSet: 'us-federal' }, { ruleSet: null }, 'tank.ruleSet', null],
    ] as const) {
      const e = refusal(() => resolveRules(input(over, tank)));
      expect(e.field).toBe(field);
      expect(e.validRange).toBe('one of the rule sets: us-federal, second-set');
      expect(e.message).toContain(`(got ${typeof got === 'string' ? `"${got}"` : String(got)})`);
    }
  });
});

describe('the site’s own rule', () => {
  it('is passed on as entered, and refused under its own field when malformed', () => {
    expect(resolveRules(input({ siteRule: { maxFillPercent: 80 } })).siteRule).toEqual({
      maxFillPercent: 80,
    });
    expect(resolveRules(input({ siteRule: { maxFillingDensity: 0.4 } })).siteRule).toEqual({
      maxFillingDensity: 0.4,
    });
    expect(refusal(() => resolveRules(input({ siteRule: 'eighty' }))).field).toBe('siteRule');
  });
});
