/**
 * The cautions about the readings and the nameplate, their ranking and the standing caution
 * (thermo/check/cautions.ts): each trigger just inside and just outside its threshold, each
 * parameter by name against a value from outside the check. Sources: FACTS.md =
 * test/reference/trade/FACTS.md (case 7; section c: propane SG 0.5072, ASTM D2598 Table 1);
 * saturation_properties.csv beside it; test/reference/blends/r410a.csv (R-410A bubble pressure,
 * Lemmon & Jacobsen 2004); the volume of a sphere, πd³/6; Raoult's law for the propane/n-butane
 * split; the signal-word order of ANSI Z535 (danger, warning, caution, notice).
 * Results are computed inside each test.
 */
import { describe, expect, it } from 'vitest';
import { checkTank, STANDING_CAUTION, type TankCheckResult } from '../../thermo/index.js';
import { expectRel, expectWithin } from './check-helpers.js';
import {
  F,
  PERMISSION,
  V1000,
  WATER_WEIGHT_KG_M3,
  caution,
  co2,
  codes,
  expectHeadline,
  expectKeys,
  param,
  propane,
  psi,
  psig,
} from './cautions-helpers.js';

const SAT = 'saturation_properties.csv (test/reference/trade)';
const psia = (x: number) => psig(x - 14.696) + 101_325;
const warm = (over: Parameters<typeof propane>[0] = {}) =>
  propane({ liquidTemperature: F(80), peakTemperature: F(80), ...over });

describe('the contents readings at the ends of their scales', () => {
  it('a float gauge at 0 % or 100 %: a caution with the reading; 0.5 % and 99.5 %: none', () => {
    const lo = caution(propane({ contents: { gaugePercent: 0 } }), 'gauge-at-end');
    expect(lo.level).toBe('caution');
    expectKeys(lo, ['reading']);
    expectHeadline(lo, 'reading');
    expect(param(lo, 'reading', 'fraction', 'nearest')).toBe(0);
    const hi = caution(propane({ contents: { gaugePercent: 100 } }), 'gauge-at-end');
    expect(param(hi, 'reading', 'fraction', 'nearest')).toBe(1);
    expect(codes(propane({ contents: { gaugePercent: 0.5 } }))).not.toContain('gauge-at-end');
    expect(codes(propane({ contents: { gaugePercent: 99.5 } }))).not.toContain('gauge-at-end');
  });
  it('a scale reading of zero: empty (notice); 0.01 kg: not; a gauge at 0 % is not a scale', () => {
    const c = caution(propane({ contents: { netMass: 0 } }), 'empty');
    expect(c.level).toBe('notice');
    expectKeys(c, ['contents']);
    expect(param(c, 'contents', 'mass', 'nearest')).toBe(0);
    expect(codes(propane({ contents: { netMass: 0.01 } }))).not.toContain('empty');
    expect(codes(propane({ contents: { gaugePercent: 0 } }))).not.toContain('empty');
  });
});

describe('a pressure reading outside the band (propane at 80 °F: 129.3 psig, FACTS.md case 7)', () => {
  it('160 psig read: higher than expected, with the reading, the figure and the band', () => {
    const r = warm({ pressureReadingGauge: psig(160) });
    const c = caution(r, 'pressure-high');
    expect(c.level).toBe('caution');
    expectKeys(c, ['difference', 'reading', 'expected', 'temperature', 'tolerance', 'cause']);
    expectHeadline(c, 'difference');
    const reading = param(c, 'reading', 'gaugePressure', 'nearest');
    expect(reading).toBeCloseTo(psig(160), 6);
    const expected = param(c, 'expected', 'gaugePressure', 'nearest');
    expectWithin(expected, psig(129.3), psi(1), {
      input: 'propane, 80 °F',
      source: `FACTS.md case 7; ${SAT}`,
      kind: 'published',
    });
    expect(param(c, 'difference', 'pressureDifference', 'nearest')).toBeCloseTo(
      reading - expected,
      6,
    );
    expect(param(c, 'temperature', 'temperature', 'nearest')).toBe(F(80));
    // ±2 % of a 250 psig full scale (the gauge) plus 0.5 % of 144.0 psia (the model)
    expectRel(
      param(c, 'tolerance', 'pressureDifference', 'nearest'),
      0.02 * psig(250) + 0.005 * psia(144),
      0.01,
      {
        input: 'default gauge',
        source: `${SAT}; gauge accuracy ±2 % of full scale`,
        kind: 'published',
      },
    );
    expect(c.params['cause']).toBe(r.diagnosis!.causeCodes[0]);
    expect(codes(r)).not.toContain('pressure-low');
  });
  it('100 psig read: lower, fitting about 73 % propane in n-butane (Raoult’s law)', () => {
    const r = warm({ pressureReadingGauge: psig(100) });
    const c = caution(r, 'pressure-low');
    expectKeys(c, [
      'difference',
      'reading',
      'expected',
      'temperature',
      'tolerance',
      'cause',
      'propaneFraction',
    ]);
    expect(param(c, 'difference', 'pressureDifference', 'nearest')).toBeLessThan(0);
    // (114.7 − 37.15) / (144.0 − 37.15) psia at 80 °F = 0.726
    expectWithin(
      param(c, 'propaneFraction', 'fraction', 'nearest'),
      (114.696 - 37.15) / (144 - 37.15),
      0.02,
      {
        input: '100 psig, 80 °F',
        source: `${SAT}; Raoult's law`,
        kind: 'published',
        why: 'propane and n-butane mix nearly ideally',
      },
    );
    expect(codes(r)).not.toContain('pressure-high');
  });
  it('a reading at the expected figure: no pressure caution; no reading: none either', () => {
    const first = warm({ pressureReadingGauge: psig(130) });
    const at = warm({ pressureReadingGauge: first.diagnosis!.expectedGauge });
    expect(at.diagnosis!.verdict).toBe('fits');
    expect(codes(at)).not.toContain('pressure-high');
    expect(codes(at)).not.toContain('pressure-low');
    expect(codes(warm())).not.toContain('pressure-low');
  });
});

describe('the shape against the water capacity: a sphere of 1 m holds π/6 m³', () => {
  const sphere = (V: number) =>
    checkTank({
      tank: {
        waterCapacity: V,
        designPressureGauge: psig(250),
        shape: { kind: 'sphere', diameter: 1 },
      },
      product: 'propane',
      liquidTemperature: F(60),
      contents: { gaugePercent: 50 },
      peakTemperature: F(60),
    });
  it('3.01 % more than entered: a caution with both volumes and the excess', () => {
    const V = Math.PI / 6 / 1.0301;
    const c = caution(sphere(V), 'shape-capacity-mismatch');
    expect(c.level).toBe('caution');
    expectKeys(c, ['shapeVolume', 'waterCapacity', 'excess']);
    expectHeadline(c, 'shapeVolume');
    expectRel(param(c, 'shapeVolume', 'volume', 'nearest'), Math.PI / 6, 1e-9, {
      input: 'sphere, d = 1 m',
      source: 'volume of a sphere πd³/6',
      kind: 'published',
    });
    expect(param(c, 'waterCapacity', 'volume', 'nearest')).toBe(V);
    expect(param(c, 'excess', 'fraction', 'nearest')).toBeCloseTo(0.0301, 9);
  });
  it('3.01 % less: a caution too (negative excess); 2.99 % either way: none', () => {
    const c = caution(sphere(Math.PI / 6 / 0.9699), 'shape-capacity-mismatch');
    expect(param(c, 'excess', 'fraction', 'nearest')).toBeCloseTo(-0.0301, 9);
    expect(codes(sphere(Math.PI / 6 / 1.0299))).not.toContain('shape-capacity-mismatch');
    expect(codes(sphere(Math.PI / 6 / 0.9701))).not.toContain('shape-capacity-mismatch');
    expect(codes(propane())).not.toContain('shape-capacity-mismatch');
  });
});

describe('notices on the nameplate', () => {
  it('no relief setting: taken as the design pressure (said); a setting given: not said', () => {
    const r = checkTank({
      tank: { waterCapacity: V1000, designPressureGauge: psig(250) },
      product: 'propane',
      liquidTemperature: F(60),
      contents: { gaugePercent: 50 },
      peakTemperature: F(60),
    });
    const c = caution(r, 'relief-assumed');
    expect(c.level).toBe('notice');
    expectKeys(c, ['design']);
    expect(param(c, 'design', 'gaugePressure', 'nearest')).toBe(psig(250));
    expect(codes(propane())).not.toContain('relief-assumed');
  });
  it('relief 100 Pa above the design pressure: pointed out with both; equal or below: not', () => {
    const c = caution(
      propane({}, { reliefSetPressureGauge: psig(250) + 100 }),
      'relief-above-design',
    );
    expect(c.level).toBe('notice');
    expectKeys(c, ['relief', 'design']);
    expectHeadline(c, 'relief');
    expect(param(c, 'relief', 'gaugePressure', 'nearest')).toBe(psig(250) + 100);
    expect(param(c, 'design', 'gaugePressure', 'nearest')).toBe(psig(250));
    expect(codes(propane())).not.toContain('relief-above-design');
    expect(codes(propane({}, { reliefSetPressureGauge: psig(220) }))).not.toContain(
      'relief-above-design',
    );
  });
  it('an SG 2.01 % off propane’s 0.5072 either way is pointed out; 1.99 % is not', () => {
    const m = propane().product.specificGravity;
    expectWithin(m, 0.5072, 0.001, {
      input: 'propane',
      source: 'ASTM D2598 Table 1 (FACTS.md section c)',
      kind: 'published',
    });
    const c = caution(propane({ specificGravity: m * 1.0201 }), 'sg-differs');
    expect(c.level).toBe('notice');
    expectKeys(c, ['entered', 'model']);
    expectHeadline(c, 'entered');
    expect(param(c, 'entered', null, 'nearest')).toBe(m * 1.0201);
    expectWithin(param(c, 'model', null, 'nearest'), 0.5072, 0.001, {
      input: 'propane',
      source: 'ASTM D2598 Table 1',
      kind: 'published',
    });
    expect(codes(propane({ specificGravity: m * 0.9799 }))).toContain('sg-differs');
    expect(codes(propane({ specificGravity: m * 1.0199 }))).not.toContain('sg-differs');
    expect(codes(propane({ specificGravity: m * 0.9801 }))).not.toContain('sg-differs');
  });
  it('a peak 0.01 K colder than now: a notice; a peak equal to now: none', () => {
    const c = caution(propane({ peakTemperature: F(60) - 0.01 }), 'peak-below-now');
    expect(c.level).toBe('notice');
    expectKeys(c, ['peak', 'temperature']);
    expectHeadline(c, 'peak');
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(F(60) - 0.01);
    expect(param(c, 'temperature', 'temperature', 'nearest')).toBe(F(60));
    expect(codes(propane())).not.toContain('peak-below-now');
  });
  it('R-410A at 25 °C: its bubble pressure, 1,657 kPa abs (Lemmon & Jacobsen 2004); not propane', () => {
    const r = checkTank({
      tank: { waterCapacity: 0.0227, designPressureGauge: psig(400), containerClass: 'cylinder' },
      product: 'r410a',
      liquidTemperature: 298.15,
      contents: { gaugePercent: 50 },
      peakTemperature: 298.15,
    });
    const c = caution(r, 'blend-bubble-point');
    expect(c.level).toBe('notice');
    expectKeys(c, ['pressure']);
    const p = param(c, 'pressure', 'gaugePressure', 'up');
    expectRel(p + 101_325, 1_657_438.917, 0.02, {
      input: 'R-410A, 298.15 K',
      source: 'test/reference/blends/r410a.csv',
      kind: 'published',
      why: 'the README bubble-pressure target, 2 %',
    });
    expect(codes(propane())).not.toContain('blend-bubble-point');
    // it has a liquid-full temperature (343 K), so nothing is said about one beyond the model
    expect(r.liquidFullTemperature).not.toBeNull();
    expect(codes(r)).not.toContain('liquid-full-beyond-model');
  });
});

describe('the site’s own rule binds', () => {
  it('40 % of the water weight: the figure, the 40 % mass and the gauge stop (lever rule)', () => {
    const r = propane({ siteRule: { maxFillingDensity: 0.4 } });
    const c = caution(r, 'site-rule-binds');
    expect(c.level).toBe('notice');
    expectKeys(c, ['form', 'figure', 'stop', 'limit']);
    // the first parameter is a word: the headline number is the figure
    expectHeadline(c, 'figure');
    expect(c.params['form']).toBe('filling-density');
    expect(param(c, 'figure', 'fraction', 'down')).toBe(0.4);
    const W = V1000 * WATER_WEIGHT_KG_M3;
    const lim = param(c, 'limit', 'mass', 'down');
    expectWithin(lim, 0.4 * W, 0.01, { input: '40 %', source: 'definition', kind: 'published' });
    expect(lim).toBeLessThanOrEqual(0.4 * W);
    // at 60 °F: (0.4 × 997.95 − 16.05) / (506.7 − 16.05) = 78.1 % of the volume
    expectWithin(
      param(c, 'stop', 'fraction', 'down'),
      (0.4 * 997.95 - 16.05) / (506.7 - 16.05),
      0.008,
      {
        input: '40 %, 60 °F',
        source: `${SAT}; lever rule`,
        kind: 'published',
        why: 'densities within 0.5 %, stop rounded down to 0.1 %',
      },
    );
  });
  it('80 % by volume: the figure and the stop are both 80 %', () => {
    const c = caution(propane({ siteRule: { maxFillPercent: 80 } }), 'site-rule-binds');
    expect(c.params['form']).toBe('percent');
    expect(param(c, 'figure', 'fraction', 'down')).toBeCloseTo(0.8, 12);
    expect(param(c, 'stop', 'fraction', 'down')).toBeCloseTo(0.8, 12);
    expect(codes(propane({ siteRule: { maxFillPercent: 95 } }))).not.toContain('site-rule-binds');
  });
});

describe('ranking and the standing caution', () => {
  const everything = (): TankCheckResult[] => [
    co2(0.6, { liquidTemperature: 310, peakTemperature: 310 }),
    propane(
      { liquidTemperature: F(120), peakTemperature: F(130) },
      { reliefSetPressureGauge: psig(220) },
    ),
    propane({ contents: { netMass: 0 }, pressureReadingGauge: -1, specificGravity: 0.52 }),
    warm({ pressureReadingGauge: psig(100), peakTemperature: F(70) }),
  ];
  it('CO2 full of dense fluid: most severe first, a later danger moved above earlier warnings', () => {
    const r = co2(0.6, { liquidTemperature: 310, peakTemperature: 310 });
    expect(codes(r)).toEqual([
      'dense-fluid-now',
      'dense-fluid-at-peak',
      'supercritical-now',
      'over-fill-limit',
      'reference-above-critical',
      'standing',
    ]);
    expect(r.cautions.map((c) => c.level)).toEqual([
      'danger',
      'danger',
      'warning',
      'warning',
      'notice',
      'notice',
    ]);
  });
  it('the standing caution comes last, with no figure, deferring to procedures and the code', () => {
    for (const r of everything()) {
      const s = r.cautions.at(-1)!;
      expect([s.code, s.level, s.value, s.quantity]).toEqual(['standing', 'notice', null, null]);
      expect(s.params).toEqual({});
      expect(s.message).toBe(STANDING_CAUTION);
      expect(s.message).toMatch(/never replace, the site procedures, the applicable code/);
      expect(codes(r).filter((x) => x === 'standing')).toHaveLength(1);
    }
  });
  it('no caution reads as leave to fill', () => {
    for (const r of everything())
      for (const c of r.cautions) expect(c.message, c.code).not.toMatch(PERMISSION);
  });
});
