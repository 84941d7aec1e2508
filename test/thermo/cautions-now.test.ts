/**
 * The cautions about the tank now (thermo/check/cautions.ts): each trigger just inside and just
 * outside its threshold, each parameter by name against a value from outside the check.
 * Sources: FACTS.md = test/reference/trade/FACTS.md (cases 11, 12, 14; section e);
 * saturation_properties.csv beside it (derived from the reference equations of state);
 * test/reference/fluids.csv (critical points); the CO2 triple point 517.96 kPa (Span & Wagner
 * 1996, J. Phys. Chem. Ref. Data 25, 1509); the relief valve starts to discharge at its set
 * pressure (29 CFR 1910.110(b)(10) Table H-26, "start-to-discharge"); the filling density is
 * the contents over the water weight at 8.32828 lb/gal (29 CFR 1910.110(b)(12)(i)).
 * Every result is computed inside its test (Stryker's per-test coverage).
 */
import { describe, expect, it } from 'vitest';
import { checkTank } from '../../thermo/index.js';
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

const FACTS = (s: string) => `FACTS.md ${s} (test/reference/trade/FACTS.md)`;
const SAT = 'saturation_properties.csv (test/reference/trade)';
const FLUIDS = 'test/reference/fluids.csv';
const VP = 'the core’s stated accuracy: vapour pressure within 0.5 % of the reference';

describe('full now: liquid below the critical temperature, dense fluid above it', () => {
  it('propane at 42 % of the water weight is liquid-full at 150 °F (full from 146.6 °F ± 2 °F)', () => {
    const mass = 0.42 * V1000 * WATER_WEIGHT_KG_M3;
    const r = propane(
      { contents: { netMass: mass }, liquidTemperature: F(150), peakTemperature: F(150) },
      { designPressureGauge: psig(400), reliefSetPressureGauge: psig(400) },
    );
    const c = caution(r, 'liquid-full-now');
    expect(c.level).toBe('danger');
    expectKeys(c, ['temperature', 'fillingDensity']);
    expectHeadline(c, 'temperature');
    expect(param(c, 'temperature', 'temperature', 'nearest')).toBe(F(150));
    expectWithin(param(c, 'fillingDensity', 'fraction', 'up'), 0.42, 1e-9, {
      input: '42 % of 1,000 gal × 8.32828 lb/gal',
      source: '29 CFR 1910.110(b)(12)(i): filling density = contents ÷ water weight',
      kind: 'published',
    });
    expect(codes(r)).not.toContain('dense-fluid-now');
  });
  it('the same fill at 140 °F, below 144.6 °F, is not liquid-full now', () => {
    const mass = 0.42 * V1000 * WATER_WEIGHT_KG_M3;
    const r = propane(
      { contents: { netMass: mass }, liquidTemperature: F(140), peakTemperature: F(140) },
      { designPressureGauge: psig(400), reliefSetPressureGauge: psig(400) },
    );
    expect(codes(r)).not.toContain('liquid-full-now');
  });
  it('CO2 at 310 K, 60 % (denser than its critical 467.6 kg/m³): full of dense fluid', () => {
    const r = co2(0.6, { liquidTemperature: 310, peakTemperature: 310 });
    const c = caution(r, 'dense-fluid-now');
    expect(c.level).toBe('danger');
    expectKeys(c, ['temperature', 'criticalTemperature', 'fillingDensity']);
    expectHeadline(c, 'temperature');
    expect(param(c, 'temperature', 'temperature', 'nearest')).toBe(310);
    expectWithin(param(c, 'criticalTemperature', 'temperature', 'nearest'), TC_CO2, 0.01, {
      input: 'CO2',
      source: `${FLUIDS}, Span & Wagner 1996`,
      kind: 'published',
    });
    expectWithin(param(c, 'fillingDensity', 'fraction', 'up'), 0.6, 1e-9, {
      input: '60 % of the water weight',
      source: '29 CFR 1910.110(b)(12)(i)',
      kind: 'published',
    });
    const w = caution(r, 'supercritical-now');
    expect(w.level).toBe('warning');
    expectKeys(w, ['temperature', 'criticalTemperature']);
    expect(param(w, 'temperature', 'temperature', 'nearest')).toBe(310);
    expectWithin(param(w, 'criticalTemperature', 'temperature', 'nearest'), TC_CO2, 0.01, {
      input: 'CO2',
      source: FLUIDS,
      kind: 'published',
    });
    expect(codes(r)).not.toContain('liquid-full-now');
  });
  it('CO2 at 310 K, 40 % (≈ 399 kg/m³, thinner than critical): supercritical, not full', () => {
    const r = co2(0.4, { liquidTemperature: 310, peakTemperature: 310 });
    expect(codes(r)).toContain('supercritical-now');
    expect(codes(r)).not.toContain('dense-fluid-now');
    expect(codes(r)).not.toContain('dense-fluid-at-peak');
  });
  it('CO2 at 303 K, below its critical 304.13 K: no supercritical warning', () => {
    const r = co2(0.3, { liquidTemperature: 303, peakTemperature: 303 });
    expect(codes(r)).not.toContain('supercritical-now');
  });
});

describe('the relief valve now: at or above its set pressure (Table H-26 start-to-discharge)', () => {
  it('propane at 120 °F (227.8 psig) with relief 220 psig: a danger with the three pressures', () => {
    const r = propane(
      { liquidTemperature: F(120), peakTemperature: F(120) },
      { reliefSetPressureGauge: psig(220) },
    );
    const c = caution(r, 'relief-now');
    expect(c.level).toBe('danger');
    expectKeys(c, ['pressure', 'upper', 'relief']);
    expectHeadline(c, 'pressure');
    const p = param(c, 'pressure', 'gaugePressure', 'up');
    expectRel(p + 101_325, psig(227.8) + 101_325, 0.005, {
      input: 'propane, 120 °F',
      source: SAT,
      kind: 'published',
      why: VP,
    });
    const upper = param(c, 'upper', 'gaugePressure', 'up');
    expect(upper).toBeGreaterThanOrEqual(p);
    expectRel(upper + 101_325, psig(227.8) + 101_325, 0.015, {
      input: 'propane, 120 °F, raised by the model allowance',
      source: SAT,
      kind: 'published',
    });
    expect(param(c, 'relief', 'gaugePressure', 'nearest')).toBe(psig(220));
  });
  it('relief exactly at the expected pressure: reached; just above the raised one: not', () => {
    const hot = { liquidTemperature: F(120), peakTemperature: F(120) };
    const first = propane(hot, { reliefSetPressureGauge: psig(400) });
    expect(codes(first)).not.toContain('relief-now');
    const at = propane(hot, { reliefSetPressureGauge: first.pGauge });
    expect(codes(at)).toContain('relief-now');
    const above = propane(hot, { reliefSetPressureGauge: first.pGaugeUpper + 1000 });
    expect(codes(above)).not.toContain('relief-now');
  });
  it('relief between the expected and the raised pressure: reached with the allowance', () => {
    const hot = { liquidTemperature: F(120), peakTemperature: F(120) };
    const first = propane(hot, { reliefSetPressureGauge: psig(400) });
    expect(first.pGaugeUpper).toBeGreaterThan(first.pGauge + 1000);
    const mid = propane(hot, { reliefSetPressureGauge: first.pGauge + 500 });
    expect(mid.pGauge).toBeLessThan(psig(400));
    expect(codes(mid)).toContain('relief-now');
  });
});

describe('CO2 below its triple-point pressure, 517.96 kPa = 60.4 psig (FACTS.md case 12)', () => {
  it('a reading 1 Pa below the threshold: a danger quoting the triple point', () => {
    const r = co2(0.6, { pressureReadingGauge: 517_960 - 101_325 - 1 });
    const c = caution(r, 'co2-below-triple-point');
    expect(c.level).toBe('danger');
    expectKeys(c, ['threshold', 'tripleAbsolute']);
    expectHeadline(c, 'threshold');
    expect(param(c, 'tripleAbsolute', 'pressure', 'nearest')).toBe(517_960);
    expectWithin(param(c, 'threshold', 'gaugePressure', 'nearest'), psig(60.4), psi(0.5), {
      input: 'sea level',
      source: `${FACTS('case 12')}; Span & Wagner 1996`,
      kind: 'published',
    });
    expect(c.message).toContain('75.1 psia');
    expect(c.message).toMatch(/Do not vent/);
  });
  it('a reading exactly at the threshold is not below it', () => {
    expect(codes(co2(0.6, { pressureReadingGauge: 517_960 - 101_325 }))).not.toContain(
      'co2-below-triple-point',
    );
    expect(codes(co2(0.6))).not.toContain('co2-below-triple-point');
  });
  it('at altitude the threshold in gauge terms rises by what the air pressure lost', () => {
    const r = co2(0.6, { barometricPressureAbs: 90_000, pressureReadingGauge: psig(55) });
    const t = param(caution(r, 'co2-below-triple-point'), 'threshold', 'gaugePressure', 'nearest');
    expect(t).toBeCloseTo(517_960 - 90_000, 6);
  });
  it('0.1 kg of CO2 gas in the cylinder at 20 °C (ideal gas: 244 kPa abs): expected below it', () => {
    const r = co2(0, {
      contents: { netMass: 0.1 },
      liquidTemperature: 293.15,
      peakTemperature: 293.15,
    });
    // p = mRT/(MV) = 0.1/0.0440098 × 8.31451 × 293.15 / 0.0227 = 244.0 kPa (Z ≈ 0.99)
    expectRel(r.pAbs, ((0.1 / 0.0440098) * 8.31451 * 293.15) / 0.0227, 0.02, {
      input: '0.1 kg CO2, 20 °C, 22.7 L',
      source: 'ideal-gas law with M and R of test/reference/fluids.csv',
      kind: 'published',
      why: 'compressibility of CO2 near 2.4 bar is within 2 % of 1',
    });
    expect(codes(r)).toContain('co2-below-triple-point');
  });
  it('propane read at 50 psig (446 kPa abs) is not CO2: no triple-point danger', () => {
    const r = propane({ pressureReadingGauge: psig(50) });
    expect(codes(r)).not.toContain('co2-below-triple-point');
    expect(codes(r)).toContain('pressure-low');
  });
});

describe('vacuum: n-butane is at 0 psig at 31.1 °F (FACTS.md section e, case 14)', () => {
  const butane = (tF: number, reading?: number) =>
    checkTank({
      tank: { waterCapacity: V1000, designPressureGauge: psig(250) },
      product: 'n-butane',
      liquidTemperature: F(tF),
      contents: { gaugePercent: 50 },
      peakTemperature: F(tF),
      ...(reading === undefined ? {} : { pressureReadingGauge: reading }),
    });
  it('at 20 °F it is expected at −3.15 psig: a warning from the expected pressure', () => {
    const c = caution(butane(20), 'vacuum');
    expect(c.level).toBe('warning');
    expectKeys(c, ['pressure', 'source', 'temperature']);
    expectHeadline(c, 'pressure');
    expect(c.params['source']).toBe('expected');
    expectWithin(param(c, 'pressure', 'gaugePressure', 'nearest'), psig(-3.15), psi(0.15), {
      input: 'n-butane, 20 °F',
      source: `${FACTS('case 14')}; ${SAT}`,
      kind: 'published',
      why: VP,
    });
    expect(param(c, 'temperature', 'temperature', 'nearest')).toBe(F(20));
  });
  it('at 40 °F it is expected at +2.96 psig: no vacuum', () => {
    expect(codes(butane(40))).not.toContain('vacuum');
  });
  it('expected exactly at the air pressure (0 psig) is not a vacuum; 150 Pa below it is', () => {
    // near 31.1 °F n-butane's vapour pressure is about one atmosphere; a barometer reading equal
    // to it puts the expected pressure at 0 gauge
    const first = butane(31);
    expectWithin(first.pAbs, 101_325, 1000, {
      input: 'n-butane, 31 °F',
      source: FACTS('section e (1 atm at 31.1 °F)'),
      kind: 'published',
    });
    const at = (baro: number) =>
      checkTank({
        tank: { waterCapacity: V1000, designPressureGauge: psig(250) },
        product: 'n-butane',
        liquidTemperature: F(31),
        contents: { gaugePercent: 50 },
        peakTemperature: F(31),
        barometricPressureAbs: baro,
      });
    const zero = at(first.pAbs);
    expect(zero.pGauge === 0).toBe(true); // 0 or −0
    expect(codes(zero)).not.toContain('vacuum');
    expect(codes(at(first.pAbs + 150))).toContain('vacuum');
  });
  it('a reading below zero is what it shows, even where a vacuum is expected', () => {
    const c = caution(butane(20, -500), 'vacuum');
    expect(c.params['source']).toBe('reading');
    expect(param(c, 'pressure', 'gaugePressure', 'nearest')).toBe(-500);
  });
  it('propane at 60 °F (93 psig expected): −1 Pa on the gauge is a vacuum, 0 is not', () => {
    const c = caution(propane({ pressureReadingGauge: -1 }), 'vacuum');
    expect(c.params['source']).toBe('reading');
    expect(param(c, 'pressure', 'gaugePressure', 'nearest')).toBe(-1);
    expect(codes(propane({ pressureReadingGauge: 0 }))).not.toContain('vacuum');
    expect(codes(propane())).not.toContain('vacuum');
  });
});

describe('cold metal: the minimum design metal temperature (FACTS.md section e)', () => {
  const cold = (
    tF: number,
    mdmtF: number | undefined,
    product: 'propane' | 'n-butane' = 'propane',
  ) =>
    checkTank({
      tank: {
        waterCapacity: V1000,
        designPressureGauge: psig(250),
        ...(mdmtF === undefined ? {} : { minDesignMetalTemperature: F(mdmtF) }),
      },
      product,
      liquidTemperature: F(tF),
      contents: { gaugePercent: 50 },
      peakTemperature: F(60),
    });
  it('liquid at −30 °F in a tank stamped −20 °F: a warning, and nothing said of venting', () => {
    const r = cold(-30, -20);
    const c = caution(r, 'below-mdmt');
    expect(c.level).toBe('warning');
    expectKeys(c, ['temperature', 'mdmt']);
    expectHeadline(c, 'temperature');
    expect(param(c, 'temperature', 'temperature', 'nearest')).toBe(F(-30));
    expect(param(c, 'mdmt', 'temperature', 'nearest')).toBe(F(-20));
    expect(codes(r)).not.toContain('autorefrigeration-below-mdmt');
  });
  it('liquid exactly at −20 °F: not below; venting could chill it to −43.8 °F, below the stamp', () => {
    const r = cold(-20, -20);
    expect(codes(r)).not.toContain('below-mdmt');
    const c = caution(r, 'autorefrigeration-below-mdmt');
    expect(c.level).toBe('caution');
    expectKeys(c, ['boiling', 'mdmt']);
    expectHeadline(c, 'boiling');
    expectWithin(param(c, 'boiling', 'temperature', 'nearest'), F(-43.8), 0.3, {
      input: 'propane at 1 atm',
      source: FACTS('section e (boiling point −43.8 °F [EOS])'),
      kind: 'published',
      why: '0.5 % in vapour pressure is about 0.15 K at 1 atm',
    });
    expect(param(c, 'mdmt', 'temperature', 'nearest')).toBe(F(-20));
  });
  it('a stamp of −45 °F is below propane’s −43.8 °F boiling point: no caution; −42.5 °F: one', () => {
    expect(codes(cold(60, -45))).not.toContain('autorefrigeration-below-mdmt');
    expect(codes(cold(60, -42.5))).toContain('autorefrigeration-below-mdmt');
    expect(codes(cold(60, undefined))).not.toContain('autorefrigeration-below-mdmt');
    expect(codes(cold(-30, undefined))).not.toContain('below-mdmt');
  });
  it('n-butane boils at 31.1 °F: a 32 °F stamp is above it, a 30 °F stamp below it', () => {
    const c = caution(cold(40, 32, 'n-butane'), 'autorefrigeration-below-mdmt');
    expectWithin(param(c, 'boiling', 'temperature', 'nearest'), F(31.1), 0.3, {
      input: 'n-butane at 1 atm',
      source: FACTS('section e (n-butane at 1 atm at 31.1 °F [EOS])'),
      kind: 'published',
    });
    expect(codes(cold(40, 30, 'n-butane'))).not.toContain('autorefrigeration-below-mdmt');
  });
});
