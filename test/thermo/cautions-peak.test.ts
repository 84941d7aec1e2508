/**
 * The cautions about the fill limit and the forecast peak (thermo/check/cautions.ts): each
 * trigger just inside and just outside its threshold, each parameter by name against a value
 * from outside the check. Sources: FACTS.md = test/reference/trade/FACTS.md (cases 4, 8, 11);
 * saturation_properties.csv beside it (derived from the reference equations of state);
 * test/reference/fluids.csv (critical points); 29 CFR 1910.110(b)(12)(i) Table H-27 (42 % for
 * SG 0.504–0.510, aboveground up to 1,200 gal); 29 CFR 1910.110(b)(10) Table H-26 (a relief
 * valve starts to discharge at its set pressure); the lever rule (liquid share of a two-phase
 * tank from the two saturated densities). Results are computed inside each test.
 */
import { describe, expect, it } from 'vitest';
import { checkTank, LPG_PRESETS } from '../../thermo/index.js';
import { expectRel, expectWithin } from './check-helpers.js';
import {
  F,
  TC_CO2,
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

const FACTS = (n: number) => `FACTS.md check case ${n} (test/reference/trade/FACTS.md)`;
const SAT = 'saturation_properties.csv (test/reference/trade)';
const psia = (x: number) => psig(x - 14.696) + 101_325;
const VP = 'vapour pressure within 0.5 % (the core’s stated accuracy) plus the 0.5 % allowance';
/** 42 % of the water weight of 1,000 gal: full at 146.6 °F ± 2 °F (FACTS.md case 11). */
const full42 = (peakK: number, nowK = F(80)) =>
  propane(
    {
      contents: { netMass: 0.42 * V1000 * WATER_WEIGHT_KG_M3 },
      liquidTemperature: nowK,
      peakTemperature: peakK,
    },
    { designPressureGauge: psig(400), reliefSetPressureGauge: psig(400) },
  );

describe('over the fill limit (Table H-27: 42 % of 1,000 gal × 8.32828 lb = 3,497.9 lb)', () => {
  it('0.05 kg over: a warning with the contents, the limit, the excess and the rule', () => {
    const limit = propane().fillLimit.maxMass;
    const mass = limit + 0.05;
    const c = caution(propane({ contents: { netMass: mass } }), 'over-fill-limit');
    expect(c.level).toBe('warning');
    expectKeys(c, ['contents', 'limit', 'over', 'limitId', 'description', 'citation']);
    expectHeadline(c, 'contents');
    expect(param(c, 'contents', 'mass', 'up')).toBeCloseTo(mass, 9);
    const lim = param(c, 'limit', 'mass', 'down');
    expectWithin(lim, 0.42 * V1000 * WATER_WEIGHT_KG_M3, 0.01, {
      input: '1,000 gal, SG 0.5072',
      source: `${FACTS(4)}; 29 CFR 1910.110(b)(12)(i) Table H-27`,
      kind: 'published',
      why: 'rounded down to 0.01 kg',
    });
    expect(lim).toBeLessThanOrEqual(0.42 * V1000 * WATER_WEIGHT_KG_M3);
    const over = param(c, 'over', 'mass', 'up');
    expect(over).toBeGreaterThanOrEqual(mass - lim - 1e-9);
    expect(over).toBeLessThanOrEqual(mass - lim + 0.01);
    expect(c.params['limitId']).toBe('h27-aboveground-small');
    expect(String(c.params['citation'])).toContain('1910.110(b)(12)(i)');
    expect(String(c.params['description']).length).toBeGreaterThan(10);
  });
  it('0.0105 kg over: over; 0.0095 kg over and exactly at the limit: not over', () => {
    const limit = propane().fillLimit.maxMass;
    const at = (m: number) => codes(propane({ contents: { netMass: m } }));
    expect(at(limit + 0.0105)).toContain('over-fill-limit');
    expect(at(limit + 0.0095)).not.toContain('over-fill-limit');
    expect(at(limit)).not.toContain('over-fill-limit');
  });
});

describe('no filling-density rule for the product here', () => {
  it('propane of SG 0.49 is outside Table H-27 (0.496–0.600): only the not-full limit', () => {
    const r = propane({ specificGravity: 0.49 });
    const c = caution(r, 'no-filling-rule');
    expect(c.level).toBe('warning');
    expectKeys(c, ['limit', 'containerClass', 'shown', 'specificGravity']);
    expectHeadline(c, 'limit');
    expect([c.params['containerClass'], c.params['shown']]).toEqual(['storage', 'not-full']);
    expect(param(c, 'specificGravity', null, 'nearest')).toBe(0.49);
    // not liquid-full at the 60 °F peak: at most the saturated liquid, 506.7 kg/m³ × V
    const lim = param(c, 'limit', 'mass', 'down');
    expect(lim).toBeLessThanOrEqual(506.7 * 1.005 * V1000);
    expectRel(lim, 506.7 * V1000, 0.012, {
      input: 'propane, peak 60 °F',
      source: SAT,
      kind: 'published',
      why: 'liquid density within 0.5 %, less the model allowance',
    });
  });
  it('CO2 in an insulated storage tank: no table rule; not an LP-gas, so no SG', () => {
    const r = co2(0.9, {
      tank: {
        waterCapacity: 0.0227,
        designPressureGauge: psig(300),
        reliefSetPressureGauge: psig(300),
        insulated: true,
        containerClass: 'storage',
      },
      liquidTemperature: F(0),
      peakTemperature: F(0),
    });
    const c = caution(r, 'no-filling-rule');
    expectKeys(c, ['limit', 'containerClass', 'shown']);
    expectRel(param(c, 'limit', 'mass', 'down'), 1021.3 * 0.0227, 0.012, {
      input: 'CO2 at 0 °F, 22.7 L',
      source: SAT,
      kind: 'published',
    });
    expect(codes(propane())).not.toContain('no-filling-rule');
  });
});

describe('reference temperature above the critical point: CO2 (critical 87.8 °F, 304.13 K)', () => {
  it('a 310 K peak is above it: a notice naming both temperatures; 303 K is not', () => {
    const c = caution(co2(0.3, { peakTemperature: 310 }), 'reference-above-critical');
    expect(c.level).toBe('notice');
    expectKeys(c, ['reference', 'criticalTemperature']);
    expectHeadline(c, 'reference');
    expect(param(c, 'reference', 'temperature', 'nearest')).toBe(310);
    expectWithin(param(c, 'criticalTemperature', 'temperature', 'nearest'), TC_CO2, 0.01, {
      input: 'CO2',
      source: 'test/reference/fluids.csv, Span & Wagner 1996',
      kind: 'published',
    });
    expect(codes(co2(0.3, { peakTemperature: 303 }))).not.toContain('reference-above-critical');
  });
});

describe('liquid-full at or near the peak (FACTS.md case 11: 42 % propane full at 146.6 °F)', () => {
  it('a 150 °F peak is past it: a danger, from about 146.6 °F (rounded down)', () => {
    const r = full42(F(150));
    const c = caution(r, 'liquid-full-at-peak');
    expect(c.level).toBe('danger');
    expectKeys(c, ['peak', 'from']);
    expectHeadline(c, 'peak');
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(F(150));
    expectWithin(param(c, 'from', 'temperature', 'down'), F(146.6), 2 / 1.8, {
      input: 'propane, 42 %',
      source: FACTS(11),
      kind: 'published',
    });
    expect(codes(r)).not.toContain('liquid-full-near-peak');
    expect(codes(r)).not.toContain('dense-fluid-at-peak');
    // liquid-full is no vapour space at all, said by the danger, not as a small one
    expect(codes(r)).not.toContain('small-vapour-space-at-peak');
  });
  it('a peak 4.9 K below it: a warning with the 5 K margin; 5.1 K below: none', () => {
    const Tf = full42(F(100)).liquidFullTemperature!;
    expectWithin(Tf, F(146.6), 2 / 1.8, { input: '42 %', source: FACTS(11), kind: 'published' });
    const c = caution(full42(Tf - 4.9), 'liquid-full-near-peak');
    expect(c.level).toBe('warning');
    expectKeys(c, ['full', 'peak', 'margin']);
    expectHeadline(c, 'full');
    expect(param(c, 'full', 'temperature', 'down')).toBeCloseTo(Tf, 6);
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(Tf - 4.9);
    expect(param(c, 'margin', 'temperatureDifference', 'nearest')).toBe(5);
    expect(codes(full42(Tf - 5.1))).not.toContain('liquid-full-near-peak');
    expect(codes(full42(Tf - 5.1))).not.toContain('liquid-full-at-peak');
  });
  it('CO2 at 68 % is full at 80.3 °F: past the critical point at a 95 °F peak, dense fluid', () => {
    const r = co2(0.68, { peakTemperature: F(95) });
    const c = caution(r, 'dense-fluid-at-peak');
    expect(c.level).toBe('danger');
    expectKeys(c, ['peak', 'criticalTemperature', 'from']);
    expectHeadline(c, 'peak');
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(F(95));
    expectWithin(param(c, 'criticalTemperature', 'temperature', 'nearest'), TC_CO2, 0.01, {
      input: 'CO2',
      source: 'test/reference/fluids.csv',
      kind: 'published',
    });
    expectWithin(param(c, 'from', 'temperature', 'down'), F(80.3), 2 / 1.8, {
      input: 'CO2, 68 %',
      source: FACTS(11),
      kind: 'published',
    });
    expect(codes(r)).not.toContain('liquid-full-at-peak');
    expect(codes(r)).not.toContain('supercritical-at-peak');
  });
  it('commercial butane half full: no liquid-full temperature up to the 400 K search top', () => {
    const butane = LPG_PRESETS.find((p) => p.id === 'commercial-butane')!.product;
    const at = (g: number) =>
      checkTank({
        tank: { waterCapacity: V1000, designPressureGauge: psig(250) },
        product: butane,
        liquidTemperature: F(70),
        contents: { gaugePercent: g },
        peakTemperature: F(70),
      });
    const r = at(50);
    expect(r.liquidFullTemperature).toBeNull();
    const c = caution(r, 'liquid-full-beyond-model');
    expect(c.level).toBe('notice');
    expectKeys(c, ['top']);
    // the check searches up to 400 K, below n-butane's 425.1 K and isobutane's 407.8 K critical
    // temperatures (test/reference/fluids.csv)
    expect(param(c, 'top', 'temperature', 'down')).toBe(400);
    // and with no liquid-full temperature there is none near the peak either
    expect(codes(r)).not.toContain('liquid-full-near-peak');
    expect(codes(r)).not.toContain('liquid-full-at-peak');
    // a fifth full it is thinner than the critical density: it never fills with liquid
    expect(codes(at(20))).not.toContain('liquid-full-beyond-model');
  });
});

describe('pressure at the peak against the design and relief settings (FACTS.md case 8)', () => {
  const hot = (tank: Parameters<typeof propane>[1], peakF = 130) =>
    propane({ liquidTemperature: F(115), peakTemperature: F(peakF) }, tank);
  it('130 °F (258.7 psig) over a 250 psig design: a danger with the raised pressure and excess', () => {
    const c = caution(hot({}), 'design-at-peak');
    expect(c.level).toBe('danger');
    expectKeys(c, ['peak', 'pressure', 'allowance', 'design', 'over']);
    expectHeadline(c, 'peak');
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(F(130));
    const p = param(c, 'pressure', 'gaugePressure', 'up');
    expectRel(p + 101_325, psia(273.4), 0.011, {
      input: 'propane, 130 °F',
      source: SAT,
      kind: 'published',
      why: VP,
    });
    // the core's stated vapour-pressure accuracy, 0.5 % (README accuracy table)
    expect(param(c, 'allowance', 'fraction', 'nearest')).toBe(0.005);
    expect(param(c, 'design', 'gaugePressure', 'nearest')).toBe(psig(250));
    const over = param(c, 'over', 'pressureDifference', 'up');
    expect(over).toBeGreaterThanOrEqual(p - psig(250) - 1e-6);
    expect(over).toBeLessThan(p - psig(250) + 100);
  });
  it('a design exactly at the raised peak pressure is not exceeded; 100 Pa lower, it is', () => {
    const p = hot({}).peak.pGaugeUpper;
    const at = (d: number) => codes(hot({ designPressureGauge: d, reliefSetPressureGauge: d }));
    expect(at(p)).not.toContain('design-at-peak');
    expect(at(p - 100)).toContain('design-at-peak');
  });
  it('relief 220 psig at 130 °F: the valve may open, from about 117 °F', () => {
    const c = caution(hot({ reliefSetPressureGauge: psig(220) }), 'relief-at-peak');
    expect(c.level).toBe('warning');
    expectKeys(c, ['peak', 'pressure', 'relief', 'from']);
    expectHeadline(c, 'peak');
    expect(param(c, 'relief', 'gaugePressure', 'nearest')).toBe(psig(220));
    expectRel(param(c, 'pressure', 'gaugePressure', 'up') + 101_325, psia(273.4), 0.011, {
      input: 'propane, 130 °F',
      source: SAT,
      kind: 'published',
      why: VP,
    });
    // 220 psig lies between 213.4 (115 °F) and 227.8 psig (120 °F): 117.3 °F by interpolation
    expectWithin(param(c, 'from', 'temperature', 'down'), F(117.3), 1.5 / 1.8, {
      input: 'relief 220 psig',
      source: `${SAT}; ${FACTS(8)}`,
      kind: 'published',
      why: 'linear interpolation, the 0.5 % accuracy and the allowance (about 1 °F)',
    });
  });
  it('relief exactly at the raised peak pressure: reached (a warning), not "little headroom"', () => {
    const p = hot({}, 115).peak.pGaugeUpper;
    const r = hot({ reliefSetPressureGauge: p }, 115);
    expect(codes(r)).toContain('relief-at-peak');
    expect(codes(r)).not.toContain('relief-near-at-peak');
    const up = hot({ reliefSetPressureGauge: p + 100 }, 115);
    expect(codes(up)).not.toContain('relief-at-peak');
    expect(
      param(caution(up, 'relief-near-at-peak'), 'headroom', 'pressureDifference', 'down'),
    ).toBe(100);
  });
  it('relief 220 psig at a 115 °F peak (213.4 psig): little headroom, under 5 %', () => {
    const c = caution(hot({ reliefSetPressureGauge: psig(220) }, 115), 'relief-near-at-peak');
    expect(c.level).toBe('caution');
    expectKeys(c, ['peak', 'headroom', 'relief']);
    expectHeadline(c, 'peak');
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(F(115));
    expect(param(c, 'relief', 'gaugePressure', 'nearest')).toBe(psig(220));
    // 220 − (228.1 psia × 1.005 − 14.696) = 5.5 psi
    expectWithin(
      param(c, 'headroom', 'pressureDifference', 'down'),
      psig(220) + 101_325 - psia(228.1) * 1.005,
      psi(1.2),
      {
        input: 'relief 220 psig, 115 °F',
        source: `${SAT}; ${FACTS(8)}`,
        kind: 'published',
        why: VP,
      },
    );
  });
  it('the 5 % edge: headroom just under 5 % of the setting is little, just over is not', () => {
    const p = hot({}, 115).peak.pGaugeUpper;
    const near = (k: number) => codes(hot({ reliefSetPressureGauge: (p / 0.95) * k }, 115));
    expect(near(1 - 1e-6)).toContain('relief-near-at-peak');
    expect(near(1 + 1e-4)).not.toContain('relief-near-at-peak');
    expect(near(1 + 1e-4)).not.toContain('relief-at-peak');
  });
});

describe('supercritical at the peak, and a small vapour space', () => {
  it('CO2 two-phase at 70 °F, 30 %, to a 95 °F peak: a caution naming the critical point', () => {
    const r = co2(0.3, { peakTemperature: F(95) });
    const c = caution(r, 'supercritical-at-peak');
    expect(c.level).toBe('caution');
    expectKeys(c, ['peak', 'criticalTemperature']);
    expectHeadline(c, 'peak');
    expect(param(c, 'peak', 'temperature', 'nearest')).toBe(F(95));
    expectWithin(param(c, 'criticalTemperature', 'temperature', 'nearest'), TC_CO2, 0.01, {
      input: 'CO2',
      source: 'test/reference/fluids.csv',
      kind: 'published',
    });
    expect(codes(co2(0.3, { peakTemperature: F(85) }))).not.toContain('supercritical-at-peak');
    const both = co2(0.3, { liquidTemperature: 310, peakTemperature: 312 });
    expect(codes(both)).toContain('supercritical-now');
    expect(codes(both)).not.toContain('supercritical-at-peak');
  });
  it('42 % propane at 140 °F: the lever rule gives 97.7 % liquid (> 95 %): a caution', () => {
    const c = caution(full42(F(140)), 'small-vapour-space-at-peak');
    expect(c.level).toBe('caution');
    expectKeys(c, ['liquidFraction']);
    expectHeadline(c, 'liquidFraction');
    const rho = 0.42 * WATER_WEIGHT_KG_M3;
    // saturated liquid 428.0, vapour 49.49 kg/m³ at 140 °F
    expectWithin(
      param(c, 'liquidFraction', 'fraction', 'up'),
      (rho - 49.49) / (428 - 49.49),
      0.01,
      {
        input: '42 %, 140 °F',
        source: `${SAT}; lever rule`,
        kind: 'published',
        why: 'densities within 0.5 %: about 0.6 % in the share',
      },
    );
  });
  it('at 120 °F the lever rule gives 92.3 % (451.0 and 37.59 kg/m³): no caution', () => {
    expect(codes(full42(F(120)))).not.toContain('small-vapour-space-at-peak');
  });
});
