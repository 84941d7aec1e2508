/**
 * A site's own stricter rule on top of the rule set. Expected limits are worked by hand from
 * outside the code: the filling density × the nameplate water capacity in lb (the definition of
 * a filling density, 49 CFR 173.304a(a)(2) Note 1), or the volume percent × the saturated liquid
 * density (+ vapour in the rest) from the propane reference table test/reference/sat/propane.csv
 * (Lemmon, McLinden & Wagner 2009 equation of state).
 */
import { describe, it, expect } from 'vitest';
import { checkTank, InputError } from '../../../thermo/index.js';
import type { TankCheckInput } from '../../../thermo/check/types.js';
import { fromSI, toSI, LB_KG } from '../../../thermo/units.js';
import { WATER_FD_KG_M3 } from '../../../thermo/rules/water.js';
import { validateSiteRule } from '../../../thermo/rules/siteRule.js';
import { expectRel, expectWithin } from '../check-helpers.js';

const F = (x: number) => toSI('temperature', x, 'F');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const lb = (kg: number) => fromSI('mass', kg, 'lb');
/** A nameplate water capacity in lb of water (at 60 °F, in air) as the check takes it, m³. */
const wcLb = (x: number) => (x * LB_KG) / WATER_FD_KG_M3;

// A 4,200 lb water capacity propane storage tank (about 504 US gal: 1,200 US gal or less) filled
// by weight: only the weight column applies, Table H-27 aboveground small, SG 0.504–0.510: 42 %.
function byWeight(over: Partial<TankCheckInput> = {}): TankCheckInput {
  return {
    tank: { waterCapacity: wcLb(4200), designPressureGauge: psig(250), fillMethod: 'weight' },
    product: 'propane',
    liquidTemperature: 288.15,
    contents: { gaugePercent: 30 },
    peakTemperature: F(80),
    ...over,
  };
}
const H27 = '29 CFR 1910.110(b)(12)(i) Table H-27 (test/reference/trade/filling_density_lpg.csv)';
const HAND = 'by hand: filling density × water capacity in lb';

describe('site rule: a maximum filling density', () => {
  it('without a site rule the rule set binds: 42 % × 4,200 lb = 1,764 lb', () => {
    const fl = checkTank(byWeight()).fillLimit;
    expectWithin(lb(fl.maxMass), 0.42 * 4200, lb(0.01), {
      input: '4,200 lb, by weight',
      source: `${H27}; ${HAND}`,
      kind: 'published',
      why: 'rounded down to 0.01 kg',
    });
    expect(fl.boundBy).toBe('rule-set');
    expect(fl.ruleSet).toBe('us-federal');
  });
  it('a stricter 40 % binds: 0.40 × 4,200 lb = 1,680 lb, named as the site’s rule', () => {
    const r = checkTank(byWeight({ siteRule: { maxFillingDensity: 0.4 } }));
    const fl = r.fillLimit;
    expectWithin(lb(fl.maxMass), 0.4 * 4200, lb(0.01), {
      input: 'site 40 %',
      source: HAND,
      kind: 'published',
      why: 'rounded down to 0.01 kg',
    });
    expectWithin(fl.maxFillingDensity, 0.4, 1e-5, {
      input: 'site 40 %',
      source: HAND,
      kind: 'published',
      why: 'never above the mass rounded down to 0.01 kg (0.01 kg of 1,905 kg of water)',
    });
    expect(fl.maxMass).toBeLessThanOrEqual(0.4 * 4200 * LB_KG);
    expect(fl.boundBy).toBe('site-rule');
    expect(fl.binding).toBe('site-max-filling-density');
    const notice = r.cautions.find((c) => c.code === 'site-rule-binds');
    expect(notice?.level).toBe('notice');
    expect(notice?.params?.['form']).toBe('filling-density');
    expect(notice?.message).toMatch(/site's own rule: 40(\.0)? %/);
    expect(r.cautions.at(-1)?.code).toBe('standing');
  });
  it('a looser 60 % changes nothing: the rule set’s 42 % still binds', () => {
    const fl = checkTank(byWeight({ siteRule: { maxFillingDensity: 0.6 } })).fillLimit;
    expectWithin(lb(fl.maxMass), 0.42 * 4200, lb(0.01), {
      input: 'site 60 %',
      source: `${H27}; ${HAND}`,
      kind: 'published',
      why: 'rounded down to 0.01 kg',
    });
    expect(fl.boundBy).toBe('rule-set');
    expect(fl.limits.some((l) => l.id === 'site-max-filling-density')).toBe(true);
  });
});

describe('site rule: a maximum fill percent by volume', () => {
  // propane.csv at 288.15 K: ρL = 507.503273, ρV = 15.81286096 kg/m³.
  const rhoL = 507.503273;
  const rhoV = 15.81286096;
  const SAT = 'test/reference/sat/propane.csv, 288.15 K (Lemmon et al. 2009)';
  const why =
    'the model’s saturated liquid density is within 0.5 % of the reference (README accuracy table)';
  it('80 % on a 1,000 US gal tank filled by gauge: V × (0.8 ρL + 0.2 ρV), stop at 80.0', () => {
    const V = toSI('volume', 1000, 'usgal');
    const r = checkTank({
      tank: { waterCapacity: V, designPressureGauge: psig(250) },
      product: 'propane',
      liquidTemperature: 288.15,
      contents: { gaugePercent: 40 },
      peakTemperature: F(80),
      siteRule: { maxFillPercent: 80 },
    });
    const fl = r.fillLimit;
    expectRel(fl.maxMass, V * (0.8 * rhoL + 0.2 * rhoV), 0.005, {
      input: '1,000 gal, 80 %',
      source: SAT,
      kind: 'fitted',
      why,
    });
    expectWithin(fl.stopAtGaugePercent, 80, 1e-9, {
      input: '80 %',
      source: 'the site’s own figure',
      kind: 'published',
    });
    expect(fl.boundBy).toBe('site-rule');
    expect(r.cautions.find((c) => c.code === 'site-rule-binds')?.params?.['form']).toBe('percent');
  });
  it('80 % filled by weight on the 4,200 lb tank: V × (0.8 ρL + 0.2 ρV) ≈ 1,722 lb, below the 1,764 lb of the rule', () => {
    const V = wcLb(4200);
    const fl = checkTank(
      byWeight({ siteRule: { maxFillPercent: 80, maxFillingDensity: 0.6 } }),
    ).fillLimit;
    expectRel(fl.maxMass, V * (0.8 * rhoL + 0.2 * rhoV), 0.005, {
      input: '4,200 lb, 80 %',
      source: SAT,
      kind: 'fitted',
      why,
    });
    expect(fl.binding).toBe('site-max-fill-percent');
  });
  it('a looser 95 % does not bind (the LP-gas volume limit at 15 °C is about 83 %)', () => {
    const fl = checkTank({
      tank: { waterCapacity: toSI('volume', 1000, 'usgal'), designPressureGauge: psig(250) },
      product: 'propane',
      liquidTemperature: 288.15,
      contents: { gaugePercent: 40 },
      peakTemperature: F(80),
      siteRule: { maxFillPercent: 95 },
    }).fillLimit;
    expect(fl.boundBy).toBe('rule-set');
    expect(fl.stopAtGaugePercent).toBeLessThan(95);
  });
});

describe('site rule and rule set: bad input names the field and its range', () => {
  const refused = (over: Partial<TankCheckInput>): InputError => {
    try {
      checkTank(byWeight(over));
    } catch (e) {
      if (e instanceof InputError) return e;
      throw e;
    }
    throw new Error('not refused');
  };
  it.each([0, 0.5, 100.5, Number.NaN, Infinity])('maxFillPercent %s', (x) => {
    const e = refused({ siteRule: { maxFillPercent: x } });
    expect(e.field).toBe('siteRule.maxFillPercent');
    expect(e.limits).toMatchObject({ min: 1, max: 100 });
    expect(e.validRange).toMatch(/1 to 100/);
  });
  it.each([0, 1.3, -0.4])('maxFillingDensity %s', (x) => {
    const e = refused({ siteRule: { maxFillingDensity: x } });
    expect(e.field).toBe('siteRule.maxFillingDensity');
    expect(e.limits).toMatchObject({ min: 0.01, max: 1.25, quantity: 'fraction' });
  });
  it('a site rule that is not an object, and text for a number', () => {
    expect(refused({ siteRule: 80 as never }).field).toBe('siteRule');
    expect(refused({ siteRule: { maxFillPercent: '80' as never } }).field).toBe(
      'siteRule.maxFillPercent',
    );
  });
  it('an unknown rule set, for the site or the tank', () => {
    expect(refused({ ruleSet: 'nowhere' }).field).toBe('ruleSet');
    expect(refused({ ruleSet: 'constructor' }).field).toBe('ruleSet');
    const tank = { ...byWeight().tank, ruleSet: 'nowhere' };
    expect(refused({ tank }).field).toBe('tank.ruleSet');
  });
  it('the tank’s own rule set choice overrides the site’s', () => {
    const tank = { ...byWeight().tank, ruleSet: 'us-federal' };
    expect(checkTank(byWeight({ tank })).fillLimit.ruleSet).toBe('us-federal');
  });
});

describe('validateSiteRule: the ranges as documented (1…100 % by volume; 0.01…1.25 of the water weight, the highest any rule prints being chlorine’s 125 %, 49 CFR 173.314(c))', () => {
  it('accepts each end of each range and keeps only the fields given', () => {
    expect(validateSiteRule({ maxFillPercent: 1 })).toStrictEqual({ maxFillPercent: 1 });
    expect(validateSiteRule({ maxFillPercent: 100 })).toStrictEqual({ maxFillPercent: 100 });
    expect(validateSiteRule({ maxFillingDensity: 0.01 })).toStrictEqual({
      maxFillingDensity: 0.01,
    });
    expect(validateSiteRule({ maxFillingDensity: 1.25 })).toStrictEqual({
      maxFillingDensity: 1.25,
    });
    expect(validateSiteRule({ maxFillPercent: 80, maxFillingDensity: 0.4 })).toStrictEqual({
      maxFillPercent: 80,
      maxFillingDensity: 0.4,
    });
  });

  it('absent or empty is no rule', () => {
    expect(validateSiteRule(undefined)).toBeNull();
    expect(validateSiteRule(null)).toBeNull();
    expect(validateSiteRule({})).toBeNull();
  });

  it('refuses a figure just outside a range, naming the field and the range', () => {
    const cases: [object, string, RegExp][] = [
      [{ maxFillPercent: 0.99 }, 'siteRule.maxFillPercent', /a percent from 1 to 100/],
      [{ maxFillPercent: 100.01 }, 'siteRule.maxFillPercent', /a percent from 1 to 100/],
      [
        { maxFillingDensity: 0.009 },
        'siteRule.maxFillingDensity',
        /a fraction of the water weight from 0.01 to 1.25/,
      ],
      [
        { maxFillingDensity: 1.26 },
        'siteRule.maxFillingDensity',
        /a fraction of the water weight from 0.01 to 1.25/,
      ],
    ];
    for (const [rule, field, range] of cases) {
      try {
        validateSiteRule(rule);
        expect.unreachable(`${JSON.stringify(rule)} accepted`);
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).field).toBe(field);
        expect((e as InputError).message).toMatch(range);
      }
    }
    expect(() => validateSiteRule([40])).toThrow(
      /an object \{ maxFillPercent\?, maxFillingDensity\? \}/,
    );
  });
});
