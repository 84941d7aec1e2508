/**
 * The pressure-reading diagnosis (thermo/check/diagnosis.ts) at its edges: the band's ends, the
 * causes named for each verdict and state, the propane/n-butane split's ends, and readings at
 * or below a full vacuum. Expected pressures come from the core's `saturation()` (an independent
 * function) and from the reference table test/reference/sat/propane.csv; the band is the one the
 * check documents (gauge accuracy × full scale + the model's 0.5 % on the vapour pressure,
 * TankCheckInput.pressureGauge and rules/allowance.ts); the causes are trade knowledge (common
 * practice), checked for their order: a high reading names air (non-condensable gas) first.
 */
import { describe, expect, it } from 'vitest';
import { propaneSplit } from '../../thermo/check/diagnosis.js';
import { checkTank, saturation, type TankCheckInput } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { expectRel, expectWithin } from './check-helpers.js';

const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const gal = (x: number) => toSI('volume', x, 'usgal');
const T = 288.15;
const BARO = 101_325;

function input(reading: number, over: Partial<TankCheckInput> = {}): TankCheckInput {
  return {
    tank: { waterCapacity: gal(500), designPressureGauge: psig(250) },
    product: 'propane',
    liquidTemperature: T,
    contents: { gaugePercent: 50 },
    pressureReadingGauge: reading,
    peakTemperature: 300,
    ...over,
  };
}
const diag = (reading: number, over: Partial<TankCheckInput> = {}) =>
  checkTank(input(reading, over)).diagnosis!;

const HIGH = [
  'non-condensable',
  'lighter-components',
  'different-product',
  'liquid-warmer',
  'gauge-error-high',
];
const LOW = [
  'liquid-colder',
  'heavier-components',
  'different-product',
  'vapour-draw',
  'gauge-error-low',
];

describe('the expected pressure and the band', () => {
  const p = saturation('propane', T).pAbs;
  const tol = 0.02 * psig(250) + 0.005 * p;

  it('expected = the vapour pressure at the liquid temperature less the barometric pressure', () => {
    const d = diag(p - BARO);
    expectWithin(d.expectedGauge, p - BARO, 1e-6, {
      input: T,
      source: 'core saturation() at the same temperature',
      kind: 'identity',
    });
    expectRel(d.expectedGauge + BARO, 731512.1218, 0.005, {
      input: T,
      source: 'test/reference/sat/propane.csv at 288.15 K (Lemmon et al. 2009)',
      kind: 'published',
      why: 'model vapour pressure within 0.5 % (README accuracy table)',
    });
    expectWithin(d.tolerance, tol, 1e-6, {
      input: 'defaults: ±2 % of a 250 psig full scale',
      source: 'TankCheckInput.pressureGauge doc; rules/allowance.ts (0.5 %)',
      kind: 'identity',
    });
    expect(d.readingGauge).toBe(p - BARO);
    expectWithin(d.difference, 0, 1e-6, { input: T, source: 'definition', kind: 'identity' });
  });

  it('a reading at either end of the band fits; just past it, high or low', () => {
    const e = p - BARO;
    expect(diag(e + tol * 0.999).verdict).toBe('fits');
    expect(diag(e - tol * 0.999).verdict).toBe('fits');
    expect(diag(e + tol * 1.001).verdict).toBe('high');
    expect(diag(e - tol * 1.001).verdict).toBe('low');
    const hi = diag(e + tol * 1.001);
    expectWithin(hi.difference, tol * 1.001, 1e-6, {
      input: 'reading above the band',
      source: 'definition: reading − expected',
      kind: 'identity',
    });
    expect(diag(e).causeCodes).toEqual([]);
    expect(diag(e).causes).toEqual([]);
  });

  it('the band widens with the gauge’s accuracy and full scale', () => {
    const d = diag(p - BARO, { pressureGauge: { fullScaleGauge: psig(600), accuracy: 0.01 } });
    expectWithin(d.tolerance, 0.01 * psig(600) + 0.005 * p, 1e-6, {
      input: '600 psig gauge, ±1 %',
      source: 'TankCheckInput.pressureGauge doc',
      kind: 'identity',
    });
  });
});

describe('the causes named, in order (common practice)', () => {
  const e = saturation('propane', T).pAbs - BARO;

  it('high, two-phase: air first, then lighter components, another product, warmer liquid, the gauge', () => {
    const d = diag(e + psig(30) - psig(0));
    expect(d.verdict).toBe('high');
    expect(d.causeCodes).toEqual(HIGH);
    expect(d.causes).toHaveLength(HIGH.length);
    expect(d.causes[0]).toMatch(/^Air or another non-condensable gas/);
    expect(d.causes[3]).toMatch(/warmer than the thermometer/);
  });

  it('low, two-phase with liquid: colder liquid first, then heavier components …', () => {
    const d = diag(e - psig(30) + psig(0));
    expect(d.verdict).toBe('low');
    expect(d.causeCodes).toEqual(LOW);
    expect(d.causes[0]).toMatch(/colder than the thermometer/);
    expect(d.causes[1]).toMatch(/Heavier components/);
  });

  it('low with under 2 % liquid: "no liquid left" comes first', () => {
    const d = diag(e - psig(30) + psig(0), { contents: { gaugePercent: 1 } });
    expect(d.causeCodes).toEqual(['no-liquid-left', ...LOW]);
    expect(d.causes[0]).toMatch(/no liquid left/);
    // at 5 % there is liquid: the cause is not named
    expect(diag(e - psig(30) + psig(0), { contents: { gaugePercent: 5 } }).causeCodes).toEqual(LOW);
  });

  it('low with vapour only in the tank: "no liquid left" comes first', () => {
    // 1 kg of propane in 500 US gal (1.89 m³) is 0.53 kg/m³, below the saturated vapour
    // density at 288.15 K (15.8 kg/m³, test/reference/sat/propane.csv): vapour only.
    const over = { contents: { netMass: 1 }, pressureGauge: { accuracy: 0 } };
    const r = checkTank(input(0, over));
    expect(r.phase).toBe('vapour-only');
    const d = checkTank(input(r.pGauge - 20_000, over)).diagnosis!;
    expect(d.verdict).toBe('low');
    expect(d.causeCodes).toEqual(['no-liquid-left', ...LOW]);
  });

  it('a liquid-full tank: named first whichever way the reading is off', () => {
    // 0.5 of the water weight at 100 °F is past liquid-full for propane (FACTS.md case 11:
    // 46 % is liquid-full at 111.9 °F, so 50 % is full below it).
    const over = {
      contents: { netMass: 0.5 * gal(500) * 997.95 },
      liquidTemperature: toSI('temperature', 100, 'F'),
      peakTemperature: toSI('temperature', 100, 'F'),
    };
    const r = checkTank(input(0, over));
    expect(r.phase).toBe('liquid-full');
    const hi = checkTank(input(r.pGauge + psig(150), over)).diagnosis!;
    expect(hi.verdict).toBe('high');
    expect(hi.causeCodes).toEqual(['liquid-full-high', ...HIGH]);
    const lo = checkTank(input(r.pGauge - psig(150), over)).diagnosis!;
    expect(lo.verdict).toBe('low');
    expect(lo.causeCodes).toEqual(['liquid-full-uncertain', ...LOW]);
  });
});

describe('readings at or below a full vacuum', () => {
  it('a reading of exactly a full vacuum has no saturation temperature and no split', () => {
    const d = diag(-BARO);
    expect(d.verdict).toBe('low');
    expect(d.temperatureForReading).toBeNull();
    expect(d.propaneFraction).toBeNull();
  });
  it('a product other than LP-gas gives no propane/n-butane split', () => {
    const p = saturation('ammonia', T).pAbs;
    const d = diag(p - BARO, { product: 'ammonia' });
    expect(d.verdict).toBe('fits');
    expect(d.propaneFraction).toBeNull();
    expect(d.temperatureForReading).not.toBeNull();
  });
});

describe('propaneSplit: the ends of the propane/n-butane line (Raoult’s law)', () => {
  const p3 = saturation('propane', T).pAbs;
  const p4 = saturation('n-butane', T).pAbs;
  const at = (x: number) => p4 + x * (p3 - p4);
  const src = 'Raoult’s law over the core’s pure-fluid vapour pressures';
  it('inside: the mole fraction on the line', () => {
    for (const x of [0, 0.25, 0.5, 1])
      expectWithin(propaneSplit(T, at(x))!, x, 1e-9, { input: x, source: src, kind: 'identity' });
  });
  it('within 2 points past an end: that pure end; farther: no split', () => {
    expect(propaneSplit(T, at(1.015))).toBe(1);
    expect(propaneSplit(T, at(1.0199))).toBe(1);
    expect(propaneSplit(T, at(-0.015))).toBe(0);
    expect(propaneSplit(T, at(-0.0199))).toBe(0);
    expect(propaneSplit(T, at(1.021))).toBeNull();
    expect(propaneSplit(T, at(-0.021))).toBeNull();
  });
  it('no split where either pure fluid has no vapour pressure (propane above 369.39 K)', () => {
    // propane Tc = 369.89 K (Lemmon et al. 2009, test/reference/fluids.csv); the core's
    // saturation ends 0.5 K below it.
    expect(propaneSplit(380, 2e6)).toBeNull();
  });
});

describe('a zeotropic blend: a composition shift is named after the first cause', () => {
  // R-407C glides about 5 K at 298.15 K (bubble 1,174 kPa, dew 1,000 kPa absolute in
  // test/reference/blends/r407c.csv, Lemmon & Jacobsen 2004): its composition can shift.
  const run = (reading: number, product = 'r407c') =>
    checkTank({
      tank: { waterCapacity: 0.0227, designPressureGauge: psig(400), containerClass: 'cylinder' },
      product,
      liquidTemperature: 298.15,
      contents: { netMass: 10 },
      pressureReadingGauge: reading,
      pressureGauge: { accuracy: 0.005 },
      peakTemperature: 305,
    }).diagnosis!;
  const pb = () => saturation('r407c', 298.15).pAbs - BARO;
  it('high: air first, then a blend richer in its volatile components', () => {
    const d = run(pb() + psig(40) - psig(0));
    expect(d.verdict).toBe('high');
    expect(d.causeCodes).toEqual(['non-condensable', 'composition-shift-high', ...HIGH.slice(1)]);
    expect(d.causes[1]).toMatch(/zeotropic blend.*richer in R-32 and R-125/);
  });
  it('low: colder liquid first, then a liquid left richer in its heavy component', () => {
    const d = run(pb() - psig(40) + psig(0));
    expect(d.verdict).toBe('low');
    expect(d.causeCodes).toEqual(['liquid-colder', 'composition-shift-low', ...LOW.slice(1)]);
    expect(d.causes[1]).toMatch(/vapour-only withdrawal or a vapour leak.*richer in R-134a/);
  });
  it('a pure fluid (R-134a) has no composition to shift', () => {
    const p = saturation('r134a', 298.15).pAbs - BARO;
    expect(run(p - psig(40), 'r134a').causeCodes).toEqual(LOW);
  });
});
