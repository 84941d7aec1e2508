/**
 * LP-gas by volume (thermo/rules/volumeLimits.ts `lpgVolume`), called directly with Table H-29's
 * volume correction factors, so every percent is worked by hand from the rule's formula
 * FD / (SG · VCF) (29 CFR 1910.110(b)(19)(v), CFR 2015 ed.):
 * - worked example (b)(19)(v)(d): 100 gal, aboveground, SG 0.510, FD 42, VCF 1.031 → 79.8 gal
 *   (unrounded 4200 / 52.581 = 79.88);
 * - the same tank underground (FACTS.md case 2): FD 46 (Table H-27), VCF 1.016 at 50 °F → 88.78;
 * - Table H-29 at SG 0.510: 1.031 at 40 °F (aboveground), 1.016 at 50 °F (underground);
 * - 49 CFR 173.315(b) Note 1 (97 % of the weight value with a fixed gauge: 45 × 0.97 = 43.65)
 *   and 173.315(h)(3) (DOT cargo dip tube at 40 °F, underground or not);
 * - 49 CFR 173.304a(d)(4): cylinders of at least 200 lb water capacity, SG at least 0.504, the tube
 *   where liquid of 0.03051 ft³/lb at 40 °F weighs 42 % of the water capacity:
 *   0.42 × 8.32828 lb/gal ÷ 4.3815 lb/gal = 79.83 % (FACTS.md case 3), and 200 lb of water is
 *   200 / 8.32828 = 24.0146 US gal (173.315(a) Note 1).
 */
import { describe, it, expect } from 'vitest';
import {
  CYLINDER_DIP_TUBE_MIN_M3,
  T_40F_K,
  T_50F_K,
  volumeRules,
  type VolumeRuleChoice,
  type VolumeRuleContext,
} from '../../../thermo/rules/volumeLimits.js';
import type { RuleChoice } from '../../../thermo/rules/gases.js';
import { toSI } from '../../../thermo/units.js';
import { expectWithin } from '../check-helpers.js';

const F = (x: number) => toSI('temperature', x, 'F');
const gal = (x: number) => toSI('volume', x, 'usgal');
const weight = (pct: number): RuleChoice => ({
  id: 'w',
  description: 'weight rule',
  citation: 'c',
  fillingDensity: pct / 100,
});

/** Table H-29 at SG 0.510, and the temperatures asked for. */
function h29(asked: number[] = []) {
  return (T: number): number | null => {
    asked.push(T);
    if (Math.abs(T - F(40)) < 1e-9) return 1.031;
    if (Math.abs(T - F(50)) < 1e-9) return 1.016;
    return null;
  };
}

function ctx(over: Partial<VolumeRuleContext>): VolumeRuleContext {
  return {
    product: 'propane',
    containerClass: 'storage',
    placement: 'aboveground',
    insulated: false,
    fillMethod: 'gauge',
    liquidTemperature: F(40),
    weightRule: weight(42),
    specificGravity: 0.51,
    waterCapacity: gal(100),
    vcf: h29(),
    ...over,
  };
}
const rules = (o: Partial<VolumeRuleContext>) => volumeRules(ctx(o));
const only = (o: Partial<VolumeRuleContext>): VolumeRuleChoice => {
  const r = rules(o);
  expect(r.length, JSON.stringify(o)).toBe(1);
  return r[0]!;
};
const pub = (actual: number, expected: number, atol: number, source: string, input: unknown) =>
  expectWithin(actual, expected, atol, { input, source, kind: 'published' });
const EX = '29 CFR 1910.110(b)(19)(v)(d) worked example';

describe('LP-gas filled by a float or slip-tube gauge: the weight limit as a volume now', () => {
  it('at 40 °F, SG 0.510, 42 %: 79.88 % (the regulation’s example, printed 79.8 gal in 100 gal)', () => {
    const r = only({});
    expect(r.id).toBe('lpg-volume-now');
    expect(r.kind).toBe('volume');
    pub(r.percent, 4200 / 52.581, 1e-3, EX, 'SG 0.510 FD 42 VCF 1.031');
    expect(r.citation).toBe(
      '29 CFR 1910.110(b)(19)(v) formula at the liquid temperature (CFR 2015 ed.)',
    );
    expect(r.description).toBe(
      'LP-gas by volume: the 42 % weight limit as a liquid volume at today’s temperature, 42 / (SG 0.510 × VCF 1.0310)',
    );
  });
  it('at 50 °F with the underground 46 %: 88.78 % (FACTS.md case 2)', () => {
    const r = only({ liquidTemperature: F(50), placement: 'underground', weightRule: weight(46) });
    pub(
      r.percent,
      4600 / (0.51 * 1.016 * 100),
      1e-3,
      'FACTS.md case 2 (H-27, H-29)',
      'underground',
    );
  });
  it('a DOT cargo tank names 173.315(b) Note 1 too, and a fractional weight figure shows two decimals', () => {
    const r = only({ containerClass: 'cargo', weightRule: weight(43.65) });
    pub(r.percent, 4365 / 52.581, 1e-3, '173.315(b) Note 1: 45 × 0.97 = 43.65', 'cargo');
    expect(r.citation).toBe(
      '29 CFR 1910.110(b)(19)(v) formula at the liquid temperature; 49 CFR 173.315(b) Note 1 (CFR 2015 ed.)',
    );
    expect(r.description).toContain('the 43.65 % weight limit');
    expect(r.description).toContain('43.65 / (SG 0.510 × VCF 1.0310)');
  });
  it('the liquid can never fill more than the whole container: capped at 100 %', () => {
    // 57 % (173.315(b), 0.627 and over) at SG 0.504 and VCF 1.031: 57 / 0.5196 = 109.7 → 100
    pub(
      only({ weightRule: weight(57), specificGravity: 0.504 }).percent,
      100,
      0,
      'whole container',
      57,
    );
  });
  it('no liquid at the temperature (VCF unknown), a cylinder or no weight rule: no volume figure', () => {
    expect(rules({ liquidTemperature: F(70) })).toEqual([]);
    expect(rules({ containerClass: 'cylinder' })).toEqual([]); // cylinders: by weight, 173.304a(c)
    expect(rules({ weightRule: null })).toEqual([]);
    expect(rules({ fillMethod: 'weight' })).toEqual([]);
  });
  it('a product that is not LP-gas takes none of this', () => {
    expect(rules({ product: 'r134a' })).toEqual([]);
    expect(rules({ product: 'dimethyl-ether', containerClass: 'cargo' })).toEqual([]);
  });
});

describe('LP-gas with a fixed maximum-level gauge: set at 40 °F, or 50 °F underground', () => {
  it('aboveground storage: the gauge for 42 % at 40 °F is 79.88 % whatever today’s temperature', () => {
    const asked: number[] = [];
    const r = only({ fillMethod: 'fixed-gauge', liquidTemperature: F(90), vcf: h29(asked) });
    expect(asked).toEqual([T_40F_K]);
    pub(T_40F_K, F(40), 1e-9, '40 °F', 40);
    expect(r.id).toBe('lpg-fixed-gauge');
    expect(r.kind).toBe('gauge-setting');
    pub(r.percent, 4200 / 52.581, 1e-3, EX, 'fixed gauge');
    expect(r.citation).toBe('29 CFR 1910.110(b)(19)(v) (CFR 2015 ed.)');
    expect(r.description).toBe(
      'Fixed maximum-level gauge set for the 42 % weight limit at 40 °F: 42 / (SG 0.510 × VCF 1.0310); the fill stops when liquid first appears at the gauge',
    );
  });
  it('underground storage: set for 46 % at 50 °F, 88.78 % (FACTS.md case 2)', () => {
    const asked: number[] = [];
    const r = only({
      fillMethod: 'fixed-gauge',
      placement: 'underground',
      weightRule: weight(46),
      vcf: h29(asked),
    });
    expect(asked).toEqual([T_50F_K]);
    pub(T_50F_K, F(50), 1e-9, '50 °F', 50);
    pub(r.percent, 4600 / (0.51 * 1.016 * 100), 1e-3, 'FACTS.md case 2', 'underground');
    expect(r.description).toContain('at 50 °F (underground): 46 / (SG 0.510 × VCF 1.0160)');
  });
  it('DOT cargo and portable tanks: at 40 °F even when placed underground (173.315(h)(3))', () => {
    for (const containerClass of ['cargo', 'portable'] as const) {
      const asked: number[] = [];
      const r = only({
        fillMethod: 'fixed-gauge',
        containerClass,
        placement: 'underground',
        weightRule: weight(43.65),
        vcf: h29(asked),
      });
      expect(asked).toEqual([T_40F_K]);
      pub(r.percent, 4365 / 52.581, 1e-3, '173.315(b) Note 1, (h)(3)', containerClass);
      expect(r.citation).toBe('49 CFR 173.315(b) Note 1, 173.315(h)(3) (CFR 2015 ed.)');
      expect(r.description).toContain('at 40 °F: 43.65 / (SG 0.510');
    }
  });
  it('capped at 100 %, and nothing when the model has no liquid at the gauge temperature', () => {
    pub(
      only({ fillMethod: 'fixed-gauge', weightRule: weight(57), specificGravity: 0.504 }).percent,
      100,
      0,
      'whole container',
      57,
    );
    expect(rules({ fillMethod: 'fixed-gauge', vcf: () => null })).toEqual([]);
  });
});

describe('DOT cylinders with a fixed dip tube: 49 CFR 173.304a(d)(4)', () => {
  const cyl = (o: Partial<VolumeRuleContext>) =>
    rules({ containerClass: 'cylinder', fillMethod: 'fixed-gauge', ...o });
  it('a 100 gal cylinder of SG 0.510: the tube at 79.83 % of the volume', () => {
    const r = cyl({});
    expect(r.length).toBe(1);
    expect(r[0]!.id).toBe('lpg-cylinder-dip-tube');
    expect(r[0]!.kind).toBe('gauge-setting');
    pub(r[0]!.percent, ((0.42 * 8.32828) / 4.3815) * 100, 0.02, 'FACTS.md case 3', '100 gal');
    expect(r[0]!.citation).toBe('49 CFR 173.304a(d)(4) (CFR 2015 ed.)');
    expect(r[0]!.description).toContain('weighs 42 % of the water capacity (79.8 % of the volume)');
  });
  it('SG 0.504 exactly qualifies; 0.503 does not', () => {
    expect(cyl({ specificGravity: 0.504 }).length).toBe(1);
    expect(cyl({ specificGravity: 0.503 })).toEqual([]);
  });
  it('200 lb of water capacity (24.0146 US gal) exactly qualifies; 0.1 % less does not', () => {
    const v200 = gal(200 / 8.32828);
    pub(CYLINDER_DIP_TUBE_MIN_M3, v200, 1e-9, '200 lb / 8.32828 lb per gal', 200);
    expect(cyl({ waterCapacity: v200 }).length).toBe(1);
    expect(cyl({ waterCapacity: v200 * 0.999 })).toEqual([]);
  });
});
