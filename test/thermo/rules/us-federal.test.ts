/**
 * The US federal rule set's own figures against the regulation tables copied in
 * test/reference/trade/ (CFR 2015 annual edition text): the ones this set holds as data beyond
 * the filling densities that test/thermo/rules.test.ts checks through `fillingRule` — the relief
 * ranges (29 CFR 1910.110 Table H-26, 29 CFR 1910.111(b)(9)(ii)) and the not-liquid-full
 * temperatures of DOT cylinders (49 CFR 173.304(b), 173.304a(a)(2)).
 */
import { describe, it, expect } from 'vitest';
import { fileURLToPath } from 'node:url';
import { readCsv } from '../../../scripts/lib/csv.js';
import { US_FEDERAL } from '../../../thermo/rules/sets/us-federal/index.js';
import { fillingRule, referenceRules } from '../../../thermo/rules/apply.js';
import { toSI } from '../../../thermo/units.js';
import { expectWithin } from '../check-helpers.js';

const ref = (f: string) => fileURLToPath(new URL(`../../reference/trade/${f}`, import.meta.url));
const SRC =
  'test/reference/trade/relief_valve_settings.csv (29 CFR 1910.110 Table H-26; 1910.111(b)(9)(ii), CFR 2015 ed.)';

describe('US federal rule set: relief-setting practice', () => {
  const rows = readCsv(ref('relief_valve_settings.csv'));
  const row = (id: string) => rows.find((r) => r['rule_id'] === id)!;
  const range = (service: string, era: string) =>
    US_FEDERAL.relief.ranges.find((r) => r.service === service && r.era === era)!;
  it('LP-gas ranges are Table H-26 rows a (1949 and earlier) and c (1950 and later)', () => {
    for (const [id, era] of [
      ['H26-a', 'asme-1949-and-earlier'],
      ['H26-c', 'asme-1950-and-later'],
    ] as const) {
      const r = range('lp-gas', era);
      const printed = row(id);
      expectWithin(r.min * 100, Number(printed['start_to_discharge_min_pct_of_design']), 1e-9, {
        input: id,
        source: SRC,
        kind: 'published',
      });
      expectWithin(r.max * 100, Number(printed['start_to_discharge_max_pct_of_design']), 1e-9, {
        input: id,
        source: SRC,
        kind: 'published',
      });
    }
  });
  it('takes the design pressure when the nameplate gives no relief setting', () => {
    expect(US_FEDERAL.relief.whenNotGiven).toBe('design-pressure');
  });
});

describe('US federal rule set: not-liquid-full temperatures of DOT cylinders', () => {
  const F = (x: number) => toSI('temperature', x, 'F');
  const src = 'test/reference/trade/reference_temperatures.csv (49 CFR 173.304(b), 173.304a(a)(2))';
  it('refrigerant gas n.o.s.: 130 °F and 131 °F; CO2: neither; storage: none', () => {
    const r134a = referenceRules('r134a', 'cylinder', US_FEDERAL);
    expect(r134a.map((r) => r.id)).toEqual(['refrigerant-130F', 'dot-131F']);
    expectWithin(r134a[0]!.referenceTemperature, F(130), 1e-9, {
      input: 'r134a',
      source: src,
      kind: 'published',
    });
    expectWithin(r134a[1]!.referenceTemperature, F(131), 1e-9, {
      input: 'r134a',
      source: src,
      kind: 'published',
    });
    expect(referenceRules('carbon-dioxide', 'cylinder', US_FEDERAL)).toEqual([]);
    expect(referenceRules('propane', 'cylinder', US_FEDERAL).map((r) => r.id)).toEqual([
      'dot-131F',
    ]);
    expect(referenceRules('r134a', 'storage', US_FEDERAL)).toEqual([]);
  });
});

describe('US federal rule set: the data decides, not code', () => {
  it('an edited copy of the set changes the rule (the table is read, not a switch)', () => {
    const ctx = {
      product: 'ammonia',
      containerClass: 'storage' as const,
      placement: 'aboveground' as const,
      insulated: false,
      fixedDipTube: false,
      waterCapacity: 1,
      specificGravity: 0.6,
    };
    // 29 CFR 1910.111(b)(11)(i): aboveground uninsulated 56 %.
    expectWithin(fillingRule(ctx, US_FEDERAL)!.fillingDensity * 100, 56, 1e-9, {
      input: ctx,
      source: '29 CFR 1910.111(b)(11)(i) (test/reference/trade/filling_density_other.csv)',
      kind: 'published',
    });
    const edited = {
      ...US_FEDERAL,
      fillingDensities: US_FEDERAL.fillingDensities.filter(
        (e) => e.id !== 'nh3-storage-aboveground',
      ),
    };
    expect(fillingRule(ctx, edited)).toBeNull();
  });
});
