/**
 * The limits a rule prints by volume and the fixed-gauge settings (thermo/rules/volumeLimits.ts),
 * called directly with a hand-made context, so each figure is the printed one and each volume is
 * worked by hand from the rule's formula. Sources (CFR 2015 annual edition text, copied in
 * test/reference/trade/filling_density_other.csv and FACTS.md sections a3 and b):
 * - anhydrous ammonia, 29 CFR 1910.111(b)(11)(i)/(ii) (82 / 83.5 / 85 / 87.5 % by volume, 87.5 %
 *   for liquid charged at 30 °F or warmer), (b)(14)(v) (fixed tube gauge at 85 %);
 *   49 CFR 173.315(a) table (82 %) and Note 5 (87.5 %, unlagged, 30 °F or warmer);
 * - sulfur dioxide, 49 CFR 173.315(a) table: 87.5 % by volume in cargo tanks;
 * - refrigerated CO2 / N2O, 49 CFR 173.315(c)(1): at most 95 % of the volume;
 * - LP-gas, 29 CFR 1910.110(b)(19)(v): FD / (SG · VCF), the gauge set at 40 °F aboveground or
 *   50 °F underground, worked example (d): 100 gal, SG 0.510, 42 %, VCF 1.031 → 79.8 gal;
 *   Table H-29 VCF 1.031 (40 °F) and 1.016 (50 °F) at SG 0.510; 49 CFR 173.315(h)(3) (DOT cargo
 *   dip tube at 40 °F); 173.304a(d)(4) (cylinders of 200 lb water capacity or more, SG 0.504 or
 *   more, liquid of 0.03051 ft³/lb at 40 °F weighing 42 % of the water capacity).
 */
import { describe, it, expect } from 'vitest';
import { fileURLToPath } from 'node:url';
import { readCsv } from '../../../scripts/lib/csv.js';
import {
  FILL_METHODS,
  T_30F_K,
  volumeRules,
  type VolumeRuleChoice,
  type VolumeRuleContext,
} from '../../../thermo/rules/volumeLimits.js';
import { toSI } from '../../../thermo/units.js';
import { expectWithin } from '../check-helpers.js';

const F = (x: number) => toSI('temperature', x, 'F');
const gal = (x: number) => toSI('volume', x, 'usgal');
const OTHER = readCsv(
  fileURLToPath(new URL('../../reference/trade/filling_density_other.csv', import.meta.url)),
);
/** The printed percent by volume of the row for `gas` whose rule and container contain the words given. */
function printed(gas: string, rule: string, container: string): number {
  const row = OTHER.find(
    (r) =>
      r.gas === gas &&
      r.regulation!.includes(rule) &&
      r.container_or_packaging!.includes(container),
  );
  if (!row) throw new Error(`no row ${gas} / ${rule} / ${container}`);
  return Number(row.max_pct_by_volume);
}

/** Table H-29 (29 CFR 1910.110(b)(19)(v)) at SG 0.510: VCF 1.031 at 40 °F, 1.016 at 50 °F; 1 at 60 °F. */
function h29(T: number): number | null {
  if (Math.abs(T - F(40)) < 1e-9) return 1.031;
  if (Math.abs(T - F(50)) < 1e-9) return 1.016;
  if (Math.abs(T - F(60)) < 1e-9) return 1;
  return null;
}

function ctx(over: Partial<VolumeRuleContext>): VolumeRuleContext {
  return {
    product: 'ammonia',
    containerClass: 'storage',
    placement: 'aboveground',
    insulated: false,
    fillMethod: 'gauge',
    liquidTemperature: F(72),
    weightRule: null,
    specificGravity: 0.51,
    waterCapacity: gal(1000),
    vcf: h29,
    ...over,
  };
}
const ids = (o: Partial<VolumeRuleContext>) => volumeRules(ctx(o)).map((r) => r.id);
const only = (o: Partial<VolumeRuleContext>): VolumeRuleChoice => {
  const r = volumeRules(ctx(o));
  expect(r.length, JSON.stringify(o)).toBe(1);
  return r[0]!;
};
const pub = (actual: number, expected: number, atol: number, source: string, input: unknown) =>
  expectWithin(actual, expected, atol, { input, source, kind: 'published' });

describe('anhydrous ammonia in storage containers: 29 CFR 1910.111(b)(11)', () => {
  it('aboveground uninsulated: 87.5 % with the liquid at 30 °F or warmer (ii), 82 % colder (i)', () => {
    const warm = only({ liquidTemperature: F(72) });
    expect(warm.id).toBe('nh3-storage-aboveground-volume');
    expect(warm.kind).toBe('volume');
    pub(
      warm.percent,
      printed('anhydrous ammonia', '(b)(11)(ii)', 'aboveground uninsulated'),
      0,
      '1910.111(b)(11)(ii)',
      72,
    );
    expect(warm.citation).toBe('29 CFR 1910.111(b)(11)(ii) (CFR 2015 ed.)');
    expect(warm.description).toContain('87.5 % by volume');
    expect(warm.description).toContain(
      '30 °F (−1.1 °C) or warmer; 82 % if the liquid charged is colder',
    );
    const cold = only({ liquidTemperature: F(20) });
    pub(
      cold.percent,
      printed('anhydrous ammonia', '(b)(11)(i)', 'aboveground uninsulated'),
      0,
      '1910.111(b)(11)(i)',
      20,
    );
    expect(cold.citation).toBe('29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)');
    expect(cold.description).toContain('82 % by volume');
    expect(cold.description).toContain('the liquid being below 30 °F (−1.1 °C)');
  });
  it('the 30 °F boundary: exactly 30 °F is "30 °F or warmer"; a hundredth of a kelvin below is not', () => {
    pub(T_30F_K, 273.15 - 10 / 9, 1e-9, '30 °F = −1.111 °C', 30);
    expect(only({ liquidTemperature: T_30F_K }).percent).toBe(87.5);
    expect(only({ liquidTemperature: F(30) }).percent).toBe(87.5);
    expect(only({ liquidTemperature: T_30F_K - 0.01 }).percent).toBe(82);
  });
  it('insulated: 83.5 %; underground uninsulated: 85 %, whatever the liquid temperature', () => {
    for (const t of [20, 72]) {
      const ins = only({ insulated: true, liquidTemperature: F(t) });
      expect(ins.id).toBe('nh3-storage-insulated-volume');
      expect(ins.kind).toBe('volume');
      pub(
        ins.percent,
        printed('anhydrous ammonia', '(b)(11)(i)', 'aboveground insulated'),
        0,
        '1910.111(b)(11)(i)',
        t,
      );
      expect(ins.citation).toBe('29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)');
      expect(ins.description).toContain('insulated container: 83.5 % by volume');
      const ug = only({ placement: 'underground', liquidTemperature: F(t) });
      expect(ug.id).toBe('nh3-storage-underground-volume');
      expect(ug.kind).toBe('volume');
      pub(
        ug.percent,
        printed('anhydrous ammonia', '(b)(11)(i)', 'underground uninsulated'),
        0,
        '1910.111(b)(11)(i)',
        t,
      );
      expect(ug.citation).toBe('29 CFR 1910.111(b)(11)(i) (CFR 2015 ed.)');
      expect(ug.description).toContain('underground uninsulated container: 85 % by volume');
    }
    // underground and insulated: the insulated row (the lower figure)
    expect(only({ insulated: true, placement: 'underground' }).percent).toBe(83.5);
  });
  it('the fixed tube gauge is set at 85 % (1910.111(b)(14)(v)), beside the volume limit', () => {
    const r = volumeRules(ctx({ fillMethod: 'fixed-gauge' }));
    expect(r.map((x) => x.id)).toEqual(['nh3-storage-aboveground-volume', 'nh3-fixed-gauge']);
    const g = r[1]!;
    expect(g.kind).toBe('gauge-setting');
    pub(
      g.percent,
      printed('anhydrous ammonia', '(b)(14)(v)', 'fixed tube'),
      0,
      '1910.111(b)(14)(v)',
      'fixed',
    );
    expect(g.citation).toBe('29 CFR 1910.111(b)(14)(v) (CFR 2015 ed.)');
    expect(g.description).toContain('set at 85 % of the water capacity');
    expect(g.description).toContain('the fill stops when liquid first appears at the gauge');
  });
  it('DOT cylinders print no volume figure (173.304a(a)(2)), by any fill method', () => {
    for (const fillMethod of FILL_METHODS)
      expect(ids({ containerClass: 'cylinder', fillMethod })).toEqual([]);
  });
  it('a fill by weight takes no volume figure', () => {
    expect(ids({ fillMethod: 'weight' })).toEqual([]);
    expect(ids({ fillMethod: 'weight', containerClass: 'cargo' })).toEqual([]);
  });
  it('ammonia mixed with anything is not the ammonia row', () => {
    const m = {
      components: [
        { id: 'ammonia', moleFraction: 0.9 },
        { id: 'water', moleFraction: 0.1 },
      ],
    };
    expect(ids({ product: m })).toEqual([]);
    expect(ids({ product: m, containerClass: 'cargo' })).toEqual([]);
  });
});

describe('anhydrous ammonia in DOT cargo and portable tanks: 49 CFR 173.315(a)', () => {
  const table = printed('anhydrous ammonia', '173.315(a)', 'DOT cargo tanks');
  it('uninsulated, liquid at 30 °F or warmer: 87.5 % (Note 5)', () => {
    for (const containerClass of ['cargo', 'portable'] as const) {
      const r = only({ containerClass, liquidTemperature: F(72) });
      expect(r.id).toBe('nh3-cargo-volume');
      expect(r.kind).toBe('volume');
      pub(r.percent, 87.5, 0, '49 CFR 173.315(a) Note 5', containerClass);
      expect(r.citation).toBe('49 CFR 173.315(a) table and Note 5 (CFR 2015 ed.)');
      expect(r.description).toContain(
        'uninsulated DOT cargo/portable tank: 87.5 % by volume, the liquid being at 30 °F',
      );
    }
    expect(only({ containerClass: 'cargo', liquidTemperature: T_30F_K }).percent).toBe(87.5);
  });
  it('uninsulated and colder than 30 °F: the table’s 82 %, saying why', () => {
    const r = only({ containerClass: 'cargo', liquidTemperature: T_30F_K - 0.01 });
    pub(r.percent, table, 0, '49 CFR 173.315(a) table', 'cold');
    expect(r.citation).toBe('49 CFR 173.315(a) table (CFR 2015 ed.)');
    expect(r.description).toBe(
      'Anhydrous ammonia in DOT cargo/portable tanks: 82 % by volume, the liquid being below 30 °F (−1.1 °C)',
    );
  });
  it('insulated: the table’s 82 % at any temperature, with no temperature condition', () => {
    for (const t of [20, 72]) {
      const r = only({ containerClass: 'portable', insulated: true, liquidTemperature: F(t) });
      pub(r.percent, table, 0, '49 CFR 173.315(a) table', t);
      expect(r.citation).toBe('49 CFR 173.315(a) table (CFR 2015 ed.)');
      expect(r.description).toBe('Anhydrous ammonia in DOT cargo/portable tanks: 82 % by volume');
    }
  });
  it('with a fixed gauge the 85 % setting is added', () => {
    expect(ids({ containerClass: 'cargo', fillMethod: 'fixed-gauge' })).toEqual([
      'nh3-cargo-volume',
      'nh3-fixed-gauge',
    ]);
  });
});

describe('sulfur dioxide and refrigerated CO2 / N2O: 49 CFR 173.315(a), (c)(1)', () => {
  it('SO2 in cargo and portable tanks: 87.5 % by volume; storage and cylinders print none', () => {
    const pct = printed('sulfur dioxide', '173.315(a)', '<= 1200');
    for (const containerClass of ['cargo', 'portable'] as const)
      for (const fillMethod of ['gauge', 'fixed-gauge'] as const) {
        const r = only({ product: 'sulfur-dioxide', containerClass, fillMethod });
        expect(r.id).toBe('so2-volume');
        expect(r.kind).toBe('volume');
        pub(r.percent, pct, 0, '49 CFR 173.315(a) table', containerClass);
        expect(r.citation).toBe('49 CFR 173.315(a) table (CFR 2015 ed.)');
        expect(r.description).toBe('Sulfur dioxide in cargo/portable tanks: 87.5 % by volume');
      }
    expect(ids({ product: 'sulfur-dioxide' })).toEqual([]);
    expect(ids({ product: 'sulfur-dioxide', containerClass: 'cylinder' })).toEqual([]);
    expect(
      ids({ product: 'sulfur-dioxide', containerClass: 'cargo', fillMethod: 'weight' }),
    ).toEqual([]);
  });
  it('refrigerated CO2 and N2O in cargo and portable tanks: 95 %, by any fill method', () => {
    const pct = printed(
      'carbon dioxide or nitrous oxide, refrigerated liquid',
      '173.315(c)(1)',
      'cargo',
    );
    for (const [product, name] of [
      ['carbon-dioxide', 'Carbon dioxide'],
      ['nitrous-oxide', 'Nitrous oxide'],
    ] as const)
      for (const containerClass of ['cargo', 'portable'] as const)
        for (const fillMethod of FILL_METHODS) {
          const r = only({ product, containerClass, fillMethod, liquidTemperature: F(0) });
          expect(r.id).toBe('refrigerated-95-volume');
          expect(r.kind).toBe('volume');
          pub(r.percent, pct, 0, '49 CFR 173.315(c)(1)', [product, containerClass, fillMethod]);
          expect(r.citation).toBe('49 CFR 173.315(c)(1) (CFR 2015 ed.)');
          expect(r.description).toBe(
            `${name}, refrigerated liquid, in cargo/portable tanks: at most 95 % of the tank’s volume`,
          );
        }
  });
  it('CO2 in storage or cylinders, and a CO2 blend, take no 95 % figure', () => {
    expect(ids({ product: 'carbon-dioxide' })).toEqual([]);
    expect(ids({ product: 'carbon-dioxide', containerClass: 'cylinder' })).toEqual([]);
    const blend = {
      components: [
        { id: 'carbon-dioxide', moleFraction: 0.5 },
        { id: 'nitrous-oxide', moleFraction: 0.5 },
      ],
    };
    expect(ids({ product: blend, containerClass: 'cargo' })).toEqual([]);
  });
});
