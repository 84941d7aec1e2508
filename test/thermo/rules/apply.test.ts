/**
 * Reading a rule set (thermo/rules/apply.ts): which weight rule and which not-liquid-full
 * temperatures apply, at the boundaries the rule texts draw (CFR 2015 annual edition text, copied
 * in test/reference/trade/filling_density_lpg.csv, filling_density_other.csv and FACTS.md):
 * - 29 CFR 1910.110(b)(12)(i) Table H-27: aboveground "0–1,200 US gal" and "over 1,200 US gal",
 *   underground "all capacities" (SG 0.504–0.510: 42 / 45 / 46 %);
 * - 49 CFR 173.315(b): cargo and portable tanks "1,200 US gal or less" / "over 1,200 US gal"
 *   (SG 0.504–0.510: 42 / 45 %; "0.627 and over": 57 / 60 %), Note 1: 97 % of the weight figure
 *   with a fixed maximum-level indicator (45 × 0.97 = 43.65 %, FACTS.md case 5);
 * - 29 CFR 1910.111(b)(11)(i): ammonia 56 / 57 / 58 %; 49 CFR 173.304a(a)(2): ammonia cylinders
 *   54 %; 173.315(a): ammonia cargo 56 %;
 * - 49 CFR 173.304(b): DOT cylinders not liquid full up to 131 °F except CO2 and N2O;
 *   173.304a(a)(2): refrigerant gas n.o.s. not liquid full at 130 °F.
 */
import { describe, it, expect } from 'vitest';
import { fillingRule, inGroup, referenceRules } from '../../../thermo/rules/apply.js';
import type { RuleContext } from '../../../thermo/rules/gases.js';
import type { RuleSet } from '../../../thermo/rules/ruleset.js';
import { US_FEDERAL } from '../../../thermo/rules/sets/us-federal/index.js';
import { toSI } from '../../../thermo/units.js';
import { expectWithin } from '../check-helpers.js';

const gal = (x: number) => toSI('volume', x, 'usgal');
function ctx(over: Partial<RuleContext>): RuleContext {
  return {
    product: 'propane',
    containerClass: 'storage',
    placement: 'aboveground',
    insulated: false,
    fixedDipTube: false,
    waterCapacity: gal(1000),
    specificGravity: 0.508,
    ...over,
  };
}
/** Filling density in percent, or null. */
const fd = (o: Partial<RuleContext>, set: RuleSet = US_FEDERAL) => {
  const r = fillingRule(ctx(o), set);
  return r ? r.fillingDensity * 100 : null;
};
const pub = (actual: number | null, expected: number, source: string, input: unknown) => {
  expect(actual, `${source} ${JSON.stringify(input)}`).not.toBeNull();
  expectWithin(actual!, expected, 1e-9, { input, source, kind: 'published' });
};
const blend = (...c: [string, number][]) => ({
  components: c.map(([id, moleFraction]) => ({ id, moleFraction })),
});

describe('the 1,200 US gal split (Table H-27; 49 CFR 173.315(b))', () => {
  it('exactly 1,200 US gal is the small column; 1,200.01 US gal the large one', () => {
    for (const containerClass of ['storage', 'cargo', 'portable'] as const) {
      pub(fd({ containerClass, waterCapacity: gal(1200) }), 42, 'H-27 / 173.315(b) ≤ 1,200 gal', [
        containerClass,
        1200,
      ]);
      pub(
        fd({ containerClass, waterCapacity: gal(1200.01) }),
        45,
        'H-27 / 173.315(b) > 1,200 gal',
        [containerClass, 1200.01],
      );
      pub(fd({ containerClass, waterCapacity: gal(100) }), 42, 'H-27 / 173.315(b) ≤ 1,200 gal', [
        containerClass,
        100,
      ]);
      pub(fd({ containerClass, waterCapacity: gal(30000) }), 45, 'H-27 / 173.315(b) > 1,200 gal', [
        containerClass,
        30000,
      ]);
    }
  });
  it('underground storage takes 46 % at every size ("all capacities")', () => {
    for (const g of [100, 1200, 1200.01, 30000])
      pub(fd({ placement: 'underground', waterCapacity: gal(g) }), 46, 'H-27 underground', g);
  });
  it('a DOT cargo tank placed underground still takes the 173.315(b) column', () => {
    pub(
      fd({ containerClass: 'cargo', placement: 'underground', waterCapacity: gal(3000) }),
      45,
      '173.315(b) > 1,200 gal',
      'cargo underground',
    );
  });
});

describe('the weight rule’s words and the fixed dip tube', () => {
  it('a table entry names its band and the container', () => {
    const r = fillingRule(ctx({}))!;
    expect(r.id).toBe('h27-aboveground-small');
    expect(r.description).toContain('filling density 42 % of water weight (SG 0.504–0.510)');
    expect(r.citation).toBe(
      '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, 1,200 US gal or less (CFR 2015 ed.)',
    );
    expect(r.description).toMatch(/ filling density 42 % of water weight \(SG 0\.504–0\.510\)$/);
  });
  it('the open top band reads "and over" (173.315(b): 0.627 and over, 57 / 60 %)', () => {
    const small = fillingRule(ctx({ containerClass: 'cargo', specificGravity: 0.7 }))!;
    pub(small.fillingDensity * 100, 57, '173.315(b) 0.627 and over', 'small');
    expect(small.description).toContain('filling density 57 % of water weight (SG 0.627 and over)');
    pub(
      fd({ containerClass: 'cargo', specificGravity: 0.7, waterCapacity: gal(3000) }),
      60,
      '173.315(b) 0.627 and over',
      'large',
    );
  });
  it('DOT cargo with a fixed dip tube: 97 % of the weight figure, 45 × 0.97 = 43.65 % (Note 1)', () => {
    const r = fillingRule(
      ctx({ containerClass: 'cargo', waterCapacity: gal(3000), fixedDipTube: true }),
    )!;
    pub(r.fillingDensity * 100, 43.65, '173.315(b) Note 1; FACTS.md case 5', 'cargo dip tube');
    expect(r.description).toContain(
      'filling density 45 % of water weight (SG 0.504–0.510) × 0.97 for a fixed dip tube = 43.65 %',
    );
    expect(r.citation).toBe(
      '49 CFR 173.315(b), cargo/portable tanks over 1,200 US gal (CFR 2015 ed.); 49 CFR 173.315(b) Note 1',
    );
  });
  it('storage with a fixed gauge keeps the H-27 weight figure (the gauge is set by volume, 1910.110(b)(19)(v))', () => {
    const r = fillingRule(ctx({ fixedDipTube: true }))!;
    pub(r.fillingDensity * 100, 42, 'H-27', 'storage dip tube');
    expect(r.citation).toBe(
      '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, 1,200 US gal or less (CFR 2015 ed.)',
    );
    expect(r.description).toMatch(/ of water weight \(SG 0\.504–0\.510\)$/);
  });
  it('a printed percent without a dip-tube factor is the same with a fixed gauge (ammonia cargo 56 %, 173.315(a))', () => {
    for (const fixedDipTube of [false, true])
      pub(
        fd({ product: 'ammonia', containerClass: 'cargo', fixedDipTube }),
        56,
        '173.315(a)',
        fixedDipTube,
      );
  });
  it('a printed percent with a dip-tube factor takes it (an edited set: 56 % × 0.97 = 54.32 %)', () => {
    const set: RuleSet = {
      ...US_FEDERAL,
      fillingDensities: US_FEDERAL.fillingDensities.map((e) =>
        e.id === 'nh3-cargo' ? { ...e, fixedGauge: { factor: 0.97, citation: 'Note 1' } } : e,
      ),
    };
    pub(
      fd({ product: 'ammonia', containerClass: 'cargo', fixedDipTube: true }, set),
      54.32,
      '56 × 0.97 by hand',
      'dip',
    );
    pub(
      fd({ product: 'ammonia', containerClass: 'cargo', fixedDipTube: false }, set),
      56,
      '173.315(a)',
      'no dip',
    );
    const r = fillingRule(
      ctx({ product: 'ammonia', containerClass: 'cargo', fixedDipTube: true }),
      set,
    )!;
    expect(r.id).toBe('nh3-cargo');
    expect(r.description).toBe(
      US_FEDERAL.fillingDensities.find((e) => e.id === 'nh3-cargo')!.description,
    );
  });
});

describe('no rule', () => {
  it('outside the table’s range (SG 0.601 in storage, FACTS.md case 6) or with no such table: null', () => {
    expect(fillingRule(ctx({ specificGravity: 0.601 }))).toBeNull();
    const set: RuleSet = { ...US_FEDERAL, sgTables: {} };
    expect(fillingRule(ctx({}), set)).toBeNull();
  });
  it('a product no entry names: null (ethane, a custom fluid)', () => {
    expect(fillingRule(ctx({ product: 'ethane' }))).toBeNull();
    const custom = { custom: { name: 'X', molarMass: 0.05, Tc: 400, Pc: 4e6, omega: 0.2 } };
    expect(fillingRule(ctx({ product: custom }))).toBeNull();
  });
});

describe('ammonia rows by placement and insulation: 29 CFR 1910.111(b)(11)(i); 49 CFR 173.304a(a)(2), 173.315(a)', () => {
  it('56 aboveground, 57 insulated (above or below ground), 58 underground uninsulated; 54 in cylinders, 56 in cargo', () => {
    const S = '1910.111(b)(11)(i)';
    pub(fd({ product: 'ammonia' }), 56, S, 'aboveground');
    pub(fd({ product: 'ammonia', insulated: true }), 57, S, 'insulated');
    pub(
      fd({ product: 'ammonia', insulated: true, placement: 'underground' }),
      57,
      S,
      'insulated underground',
    );
    pub(fd({ product: 'ammonia', placement: 'underground' }), 58, S, 'underground');
    pub(fd({ product: 'ammonia', containerClass: 'cylinder' }), 54, '173.304a(a)(2)', 'cylinder');
    pub(fd({ product: 'ammonia', containerClass: 'portable' }), 56, '173.315(a)', 'portable');
  });
  it('ammonia blended with anything is not the ammonia row', () => {
    expect(fillingRule(ctx({ product: blend(['ammonia', 0.95], ['water', 0.05]) }))).toBeNull();
    expect(inGroup(blend(['ammonia', 0.95], ['water', 0.05]), { fluid: 'ammonia' })).toBe(false);
    expect(inGroup(blend(['ammonia', 1]), { fluid: 'ammonia' })).toBe(true);
    expect(inGroup('ammonia', { fluid: 'ammonia' })).toBe(true);
    expect(inGroup('ammonia', { fluid: 'chlorine' })).toBe(false);
  });
  it('the groups: LP-gas and refrigerant n.o.s.', () => {
    expect(inGroup(blend(['propane', 0.5], ['n-butane', 0.5]), 'lp-gas')).toBe(true);
    expect(inGroup('ammonia', 'lp-gas')).toBe(false);
    expect(inGroup('r410a', 'refrigerant-nos')).toBe(true);
    expect(inGroup('r22', 'refrigerant-nos')).toBe(false);
    expect(inGroup('r134a', 'lp-gas')).toBe(false);
  });
});

describe('not-liquid-full temperatures: 49 CFR 173.304(b), 173.304a(a)(2)', () => {
  const ids = (p: Parameters<typeof referenceRules>[0], c: Parameters<typeof referenceRules>[1]) =>
    referenceRules(p, c, US_FEDERAL).map((r) => r.id);
  it('every liquefied gas in a DOT cylinder: 131 °F; none in storage, cargo or portable tanks', () => {
    for (const p of ['propane', 'ammonia', 'r22', 'chlorine']) {
      expect(ids(p, 'cylinder'), p).toEqual(['dot-131F']);
      for (const c of ['storage', 'cargo', 'portable'] as const) expect(ids(p, c), p).toEqual([]);
    }
  });
  it('CO2 and N2O are exempt from 131 °F; a blend of the two is not a named exemption', () => {
    expect(ids('carbon-dioxide', 'cylinder')).toEqual([]);
    expect(ids('nitrous-oxide', 'cylinder')).toEqual([]);
    expect(ids(blend(['carbon-dioxide', 0.5], ['nitrous-oxide', 0.5]), 'cylinder')).toEqual([
      'dot-131F',
    ]);
    expect(ids(blend(['carbon-dioxide', 1]), 'cylinder')).toEqual([]);
  });
  it('refrigerant gas n.o.s. adds 130 °F, as a printed rule', () => {
    const r = referenceRules('r410a', 'cylinder', US_FEDERAL);
    expect(r.map((x) => x.id)).toEqual(['refrigerant-130F', 'dot-131F']);
    expect(r[0]!.kind).toBe('rule');
    expect(r[1]!.kind).toBe('physical');
    expectWithin(r[0]!.referenceTemperature, toSI('temperature', 130, 'F'), 1e-9, {
      input: 'r410a',
      source: '173.304a(a)(2)',
      kind: 'published',
    });
    expect(r[0]!.citation).toBe('49 CFR 173.304a(a)(2) (CFR 2015 ed.)');
    expect(r[1]!.citation).toBe('49 CFR 173.304(b) (CFR 2015 ed.)');
    expect(r[0]!.description).toContain('not liquid full at 130 °F');
    expect(r[1]!.description).toContain('up to 131 °F (55 °C)');
  });
});
