/**
 * checkTank's searched temperatures, its full states and the readings it refuses
 * (thermo/check/checkTank.ts), against the closed-tank table computed from the reference
 * equations of state (test/reference/liquid-full.csv), the saturation tables
 * (test/reference/sat), the fluids' triple and critical points (test/reference/fluids.csv), and
 * the core's own saturation, liquidDensity and maxDensity at the state found (a liquid-full
 * temperature is checked by recomputing the liquid volume there).
 *
 * Every result is computed inside its own test (mutation testing ties each assertion to it).
 */
import { describe, expect, it } from 'vitest';
import {
  checkTank,
  InputError,
  maxDensity,
  saturation,
  type TankCheckInput,
} from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { readTable } from '../reference/measure.js';
import { expectRel, expectWithin } from './check-helpers.js';

const gal = (x: number) => toSI('volume', x, 'usgal');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const V = gal(1000);
const P_STD = 101_325;
const FULL_ALLOWANCE = 0.1; // README "Limits of validity": a liquid-full pressure raised by 10 %
const VAPOUR_ALLOWANCE = 0.005; // same: a vapour pressure raised by 0.5 %
const LF_SRC = 'test/reference/liquid-full.csv (reference EOS; see test/reference/README.md)';

function liquidFullRow(fluid: string, rho: string) {
  const r = readTable('liquid-full.csv').find(
    (x) => x.fluid === fluid && x.rho_overall_kg_m3 === rho,
  )!;
  return {
    rho: Number(r.rho_overall_kg_m3),
    T: Number(r.T_transition_K),
    pPlus2: Number(r.p_T_plus_2K_Pa),
  };
}

function satRow(fluid: string, T: number) {
  const row = readTable(`sat/${fluid}.csv`).find((r) => Math.abs(Number(r.T_K) - T) < 1e-6)!;
  return { p: Number(row.p_Pa), rhoL: Number(row.rhoL_kg_m3), rhoV: Number(row.rhoV_kg_m3) };
}

function fluidRow(fluid: string) {
  const r = readTable('fluids.csv').find((x) => x.fluid === fluid)!;
  return { Ttriple: Number(r.T_triple_K), Tc: Number(r.Tc_eos_K), rhoc: Number(r.rhoc_eos_kg_m3) };
}

function byMass(product: string, rho: number, T: number, Tpeak = T): TankCheckInput {
  return {
    tank: { waterCapacity: V, designPressureGauge: psig(250) },
    product,
    liquidTemperature: T,
    contents: { netMass: rho * V },
    peakTemperature: Tpeak,
  };
}

/** The InputError thrown by f (fails the test when none is thrown). */
function refusal(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

describe('checkTank: liquid-full temperature', () => {
  for (const [fluid, rho] of [
    ['propane', '419.58'],
    ['n-butane', '559.44'],
  ] as const) {
    it(`${fluid} at ${rho} kg/m³ fills with liquid where the reference says, and the liquid fills the tank there`, () => {
      const ref = liquidFullRow(fluid, rho);
      const r = checkTank(byMass(fluid, ref.rho, 283.15));
      const T = r.liquidFullTemperature!;
      expectWithin(T, ref.T, 1, {
        input: { fluid, rho },
        source: LF_SRC,
        kind: 'published',
        why: '±1 K, the core’s stated liquid-full target (test/reference/measure.ts)',
      });
      // Recompute the liquid volume there: the whole mass as saturated liquid fills V.
      const liquidVolume = (ref.rho * V) / saturation(fluid, T).rhoL;
      expectRel(liquidVolume, V, 1e-3, {
        input: { fluid, rho, T },
        source: 'mass ÷ saturated liquid density (core saturation at the temperature found)',
        kind: 'identity',
        why: 'the search stops within 0.005 K',
      });
    });
  }

  it('contents lighter than the critical density never fill with liquid', () => {
    // propane: critical density 220.5 kg/m³ (fluids.csv); 150 kg/m³ boils away instead
    const r = checkTank(byMass('propane', 150, 293.15));
    expect(fluidRow('propane').rhoc).toBeGreaterThan(150);
    expect(r.liquidFullTemperature).toBeNull();
  });
});

describe('checkTank: relief temperature', () => {
  it('is where the vapour pressure raised by 0.5 % reaches the relief setting', () => {
    const r = checkTank(byMass('propane', 300, 293.15));
    const T = r.reliefTemperature!;
    const pRelief = psig(250) + P_STD;
    expectRel(saturation('propane', T).pAbs * (1 + VAPOUR_ALLOWANCE), pRelief, 3e-4, {
      input: 'propane 300 kg/m³, relief = design 250 psig',
      source: 'core saturation at the temperature found; README 0.5 % allowance',
      kind: 'identity',
      why: 'the search stops within 0.005 K (about 0.02 % in pressure)',
    });
    // Between the reference rows 323.15 K (1.713 MPa) and 328.15 K (1.907 MPa): 1.823 MPa lies there.
    const lo = satRow('propane', 323.15).p;
    const hi = satRow('propane', 328.15).p;
    expect(pRelief / (1 + VAPOUR_ALLOWANCE)).toBeGreaterThan(lo);
    expect(pRelief / (1 + VAPOUR_ALLOWANCE)).toBeLessThan(hi);
    expect(T).toBeGreaterThan(323.15 - 0.5);
    expect(T).toBeLessThan(328.15 + 0.5);
  });

  it('is the temperature now when the relief setting is already reached', () => {
    // propane at 293.15 K: 836 kPa abs (sat/propane.csv) is above a 50 psig relief setting
    expect(satRow('propane', 293.15).p).toBeGreaterThan(psig(50) + P_STD);
    const r = checkTank({
      ...byMass('propane', 300, 293.15),
      tank: { waterCapacity: V, designPressureGauge: psig(50) },
    });
    expect(r.reliefTemperature).toBe(293.15);
  });
});

describe('checkTank: full states', () => {
  it('a liquid-full tank now: all liquid, its pressure raised by 10 %', () => {
    const ref = satRow('propane', 293.15);
    const r = checkTank(byMass('propane', 1.02 * ref.rhoL, 293.15));
    expect(r.phase).toBe('liquid-full');
    expect(r.full).toBe('liquid');
    expect(r.contents.vapourMass).toBe(0);
    expectRel(r.contents.liquidMass, r.contents.totalMass, 1e-9, {
      input: '102 % of the saturated liquid density',
      source: 'mass balance (no vapour space)',
      kind: 'identity',
    });
    expect(r.pAbs).toBeGreaterThan(ref.p); // compressed liquid: above the vapour pressure
    expect(r.pGaugeUpper).toBe(
      Math.ceil((r.pAbs * (1 + FULL_ALLOWANCE) - P_STD) / 100 - 1e-9) * 100,
    );
  });

  it('a peak past liquid-full: liquid-full there, pressure near the reference 2 K past it', () => {
    const ref = liquidFullRow('propane', '419.58');
    const r = checkTank(byMass('propane', ref.rho, 293.15, ref.T + 2));
    expect(r.peak.phase).toBe('liquid-full');
    expect(r.peak.full).toBe('liquid');
    expect(r.peak.allowance).toBe(FULL_ALLOWANCE);
    expectRel(r.peak.pAbs, ref.pPlus2, 0.1, {
      input: 'propane 419.58 kg/m³, 2 K past liquid-full',
      source: LF_SRC,
      kind: 'published',
      why: 'README: liquid-full pressures within about 8 % of the reference; 10 % allowance',
    });
    expect(r.peak.liquidFraction).toBe(1);
  });

  it('CO2 above its critical temperature, denser than critical: full of dense fluid, no level', () => {
    const f = fluidRow('carbon-dioxide');
    const T = 310; // above Tc = 304.13 K
    expect(T).toBeGreaterThan(f.Tc);
    const shape = { kind: 'sphere' as const, diameter: Math.cbrt((6 * 0.05) / Math.PI) };
    const r = checkTank({
      tank: { waterCapacity: 0.05, designPressureGauge: psig(3000), shape },
      product: 'carbon-dioxide',
      liquidTemperature: T,
      contents: { netMass: 1.3 * f.rhoc * 0.05 },
      peakTemperature: T,
    });
    expect(r.phase).toBe('supercritical');
    expect(r.full).toBe('dense-fluid');
    expect(r.contents.levelHeight).toBeNull();
    // The core counts a fluid denser than critical as the liquid side (closedTank.ts): the
    // mass balance still holds and the 'liquid' fills the tank.
    expectRel(r.contents.liquidMass + r.contents.vapourMass, r.contents.totalMass, 1e-12, {
      input: 'CO2 310 K',
      source: 'mass balance',
      kind: 'identity',
    });
    expect(r.contents.liquidPercent).toBe(100);
    expect(r.pGaugeUpper).toBe(
      Math.ceil((r.pAbs * (1 + FULL_ALLOWANCE) - P_STD) / 100 - 1e-9) * 100,
    );
  });
});

describe('checkTank: readings it refuses', () => {
  it('a net mass above 110 % of a liquid-full tank at the entered temperature', () => {
    const ref = satRow('propane', 293.15);
    const e = refusal(() => checkTank(byMass('propane', 1.15 * ref.rhoL, 293.15)));
    expect(e.field).toBe('contents.netMass');
    expect(e.limits!.min).toBe(0);
    expect(e.limits!.quantity).toBe('mass');
    expect(e.validRange).toMatch(/110 % of a liquid-full tank/);
    expect(e.limits!.note).toMatch(/110 % of a liquid-full tank/);
    const max = e.limits!.max!;
    expectRel(max, 1.1 * ref.rhoL * V, 0.005, {
      input: 'propane 293.15 K',
      source: 'test/reference/sat/propane.csv (110 % of the saturated liquid)',
      kind: 'published',
    });
    expect(max).toBeLessThanOrEqual(maxDensity('propane', 293.15) * V);
    // Exactly the cap is taken (the range is inclusive), and so is just under it.
    expect(checkTank(byMass('propane', max / V, 293.15)).phase).toBe('liquid-full');
    const ok = checkTank(byMass('propane', (0.999 * max) / V, 293.15));
    expectRel(ok.contents.totalMass, 0.999 * max, 1e-12, {
      input: 'net mass just under the cap',
      source: 'the scale reading entered',
      kind: 'identity',
    });
  });

  it('above the critical temperature the cap is 110 % of the liquid at 60 °F', () => {
    // CO2, 60 °F: 816.4 kg/m³ (trade/saturation_properties.csv)
    const e = refusal(() =>
      checkTank({
        ...byMass('carbon-dioxide', 1000, 310),
        tank: { waterCapacity: V, designPressureGauge: psig(3000) },
      }),
    );
    expect(e.field).toBe('contents.netMass');
    expectRel(e.limits!.max!, Math.min(1.1 * 816.4, maxDensity('carbon-dioxide', 310)) * V, 0.005, {
      input: 'CO2 310 K',
      source: 'test/reference/trade/saturation_properties.csv (CO2, 60 °F row)',
      kind: 'published',
    });
  });

  it('an empty tank holds no more than a trace', () => {
    const r = checkTank(byMass('propane', 0, 293.15));
    expect(r.contents.totalMass).toBeLessThan(1e-3);
    expect(r.phase).toBe('vapour-only');
  });

  it('a level reading above the inside height, and a level turned into a volume', () => {
    // Vertical cylinder with flat heads: liquid fraction = level ÷ height.
    const shape = {
      kind: 'vertical-cylinder' as const,
      heads: 'flat' as const,
      diameter: 1.5,
      shellLength: 2.5,
    };
    const Vt = (Math.PI / 4) * 1.5 ** 2 * 2.5;
    const base = {
      tank: { waterCapacity: Vt, designPressureGauge: psig(250), shape },
      product: 'propane',
      liquidTemperature: 293.15,
      peakTemperature: 293.15,
    };
    const e = refusal(() => checkTank({ ...base, contents: { levelHeight: 2.6 } }));
    expect(e.field).toBe('contents.levelHeight');
    expect(e.limits!.quantity).toBe('length');
    expect(e.limits!.min).toBe(0);
    expect(e.validRange).toMatch(/inside height/);
    expect(e.limits!.note).toMatch(/inside height/);
    expectWithin(e.limits!.max!, 2.5, 1e-9, {
      input: 'H 2.5 m',
      source: 'the shape entered',
      kind: 'identity',
    });
    // Exactly the inside height is taken: a tank full of liquid.
    expect(
      checkTank({ ...base, contents: { levelHeight: 2.5 } }).contents.liquidPercent,
    ).toBeCloseTo(100, 6);
    const r = checkTank({ ...base, contents: { levelHeight: 1.0 } });
    const ref = satRow('propane', 293.15);
    expectRel(r.contents.totalMass, Vt * (0.4 * ref.rhoL + 0.6 * ref.rhoV), 0.005, {
      input: 'level 1.0 m of 2.5 m',
      source: 'test/reference/sat/propane.csv; cylinder volume π/4·D²·h',
      kind: 'published',
    });
    expectWithin(r.contents.levelHeight!, 1.0, 1e-6, {
      input: 'level 1.0 m',
      source: 'the level entered',
      kind: 'identity',
    });
  });

  it('a float-gauge reading above the end of the saturation curve names the temperature', () => {
    const f = fluidRow('propane');
    const e = refusal(() =>
      checkTank({ ...byMass('propane', 300, 369.6), contents: { gaugePercent: 50 } }),
    );
    expect(e.field).toBe('liquidTemperature');
    // The core's saturation stops 0.5 K below the critical temperature (thermo/api.ts).
    expectWithin(e.limits!.max!, f.Tc - 0.5, 0.01, {
      input: 'propane 369.6 K',
      source: 'test/reference/fluids.csv Tc_eos − 0.5 K',
      kind: 'published',
    });
    expect(e.limits!.min!).toBe(150);
    expect(e.limits!.quantity).toBe('temperature');
    expect(e.limits!.note).toMatch(/weigh the tank/);
    expect(e.validRange).toMatch(/weigh the tank/);
  });

  it('a liquid or peak temperature below the triple point', () => {
    const t = fluidRow('carbon-dioxide').Ttriple; // 216.592 K
    const e = refusal(() => checkTank(byMass('carbon-dioxide', 500, t - 0.5, 250)));
    expect(e.field).toBe('liquidTemperature');
    expectWithin(e.limits!.min!, t, 0.02, {
      input: 'CO2',
      source: 'test/reference/fluids.csv T_triple',
      kind: 'published',
    });
    expect(e.validRange).toMatch(/this product's lower limit/);
    // The check takes temperatures up to 400 K (thermo/limits.ts).
    expect(e.limits!.max).toBe(400);
    expect(e.limits!.quantity).toBe('temperature');
    expect(e.limits!.note).toBe('for this product');
    const p = refusal(() => checkTank(byMass('carbon-dioxide', 500, 250, t - 0.5)));
    expect(p.field).toBe('peakTemperature');
    expect(p.validRange).toMatch(/this product's lower limit/);
    expect(p.limits!.max).toBe(400);
    expectWithin(p.limits!.min!, t, 0.02, {
      input: 'CO2',
      source: 'test/reference/fluids.csv T_triple',
      kind: 'published',
    });
    // The floor itself is taken: propane's is 150 K, the check's lowest (thermo/limits.ts).
    const at150 = checkTank(byMass('propane', 300, 150, 150));
    expect(at150.phase).toBe('two-phase');
    expect(at150.peak.temperature).toBe(150);
    // Just above the floor is taken.
    expect(checkTank(byMass('carbon-dioxide', 500, t + 0.05, t + 0.05)).phase).toBe('two-phase');
  });

  it('a peak past where the model can hold the fill names the highest peak it can', () => {
    const ref = satRow('propane', 253.15);
    const rho = 1.05 * ref.rhoL;
    const e = refusal(() => checkTank(byMass('propane', rho, 253.15, 360)));
    expect(e.field).toBe('peakTemperature');
    expect(e.limits!.quantity).toBe('temperature');
    expect(e.validRange).toMatch(/^at most \d+\.\d K for this fill: .*cannot hold/);
    expect(e.limits!.note).toMatch(/cannot hold this much product/);
    const Tmax = e.limits!.max!;
    expect(Tmax).toBeGreaterThan(253.15);
    expect(Tmax).toBeLessThan(360);
    // There the most the model can hold (liquid at 100 MPa) is this fill.
    expectRel(maxDensity('propane', Tmax), rho, 1e-4, {
      input: 'propane 105 % of the 253.15 K liquid',
      source: 'core maxDensity at the temperature named',
      kind: 'identity',
      why: 'bisection to 0.001 K',
    });
  });
});
