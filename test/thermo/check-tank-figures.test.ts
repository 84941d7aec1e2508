/**
 * checkTank's own figures (thermo/check/checkTank.ts) against quantities found outside the
 * check: the saturation tables computed from each fluid's reference equation of state
 * (test/reference/sat, test/reference/liquid-full.csv; sources in test/reference/README.md), the
 * whole-°F trade table (test/reference/trade/saturation_properties.csv, its `# source:` line), the
 * water weight of 49 CFR 173.315(a) Note 1, and independent functions of the core (liquidDensity,
 * saturation, maxDensity at the same state).
 *
 * Every result is computed inside its own test, so mutation testing ties each assertion to the
 * code that made the figure.
 */
import { describe, expect, it } from 'vitest';
import {
  checkTank,
  InputError,
  liquidDensity,
  saturation,
  type TankCheckInput,
} from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { readTable } from '../reference/measure.js';
import { expectRel, expectWithin } from './check-helpers.js';

const gal = (x: number) => toSI('volume', x, 'usgal');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const LB_PER_KG = 1 / 0.45359237; // NIST SP 811 (2008), Appendix B: 1 lb = 0.45359237 kg exactly
const V = gal(1000);
const P_STD = 101_325; // Pa, standard atmosphere (ISO 2533)
const STEP = 100; // Pa, the pressure rounding step stated in thermo/check/types.ts
// The allowance the project README states ("Limits of validity"): a vapour pressure is raised by
// 0.5 %. Written here so a changed one fails.
const VAPOUR_ALLOWANCE = 0.005;

const SAT_SRC = 'test/reference/sat/propane.csv (Lemmon, McLinden, Wagner 2009 reference EOS)';
const TRADE_SRC = 'test/reference/trade/saturation_properties.csv (propane, 60 °F row)';

/** A row of a saturation table at exactly T (the tables run every 5 K). */
function satRow(fluid: string, T: number) {
  const row = readTable(`sat/${fluid}.csv`).find((r) => Math.abs(Number(r.T_K) - T) < 1e-6);
  if (!row) throw new Error(`no ${fluid} row at ${T} K`);
  return { p: Number(row.p_Pa), rhoL: Number(row.rhoL_kg_m3), rhoV: Number(row.rhoV_kg_m3) };
}

/** A whole-°F row of the trade saturation table. */
function tradeRow(fluid: string, F: number) {
  const row = readTable('trade/saturation_properties.csv').find(
    (r) => r.fluid === fluid && Number(r.T_F) === F,
  );
  if (!row) throw new Error(`no ${fluid} row at ${F} °F`);
  return { pAbs: Number(row.p_sat_kPa_abs) * 1000, rhoL: Number(row.rho_liq_kg_m3) };
}

const ceil100 = (x: number) => Math.ceil(x / STEP - 1e-9) * STEP;
const floor100 = (x: number) => Math.floor(x / STEP + 1e-9) * STEP;

function propane60(over: Partial<TankCheckInput> = {}): TankCheckInput {
  return {
    tank: { waterCapacity: V, designPressureGauge: psig(250) },
    product: 'propane',
    liquidTemperature: 293.15,
    contents: { gaugePercent: 60 },
    peakTemperature: 313.15,
    ...over,
  };
}

describe('checkTank: contents from a float gauge (propane, 1,000 US gal, 60 %, 293.15 K)', () => {
  const input = '1000 gal propane, gauge 60 %, 293.15 K';

  it('the mass is the tank volume times 60 % liquid and 40 % vapour at the reference densities', () => {
    const r = checkTank(propane60());
    const ref = satRow('propane', 293.15);
    expectRel(r.contents.totalMass, V * (0.6 * ref.rhoL + 0.4 * ref.rhoV), 0.005, {
      input,
      source: SAT_SRC,
      kind: 'published',
      why: 'the core is stated to ±0.5 % in saturated liquid density',
    });
    expectRel(r.contents.overallDensity, r.contents.totalMass / V, 1e-12, {
      input,
      source: 'definition: overall density = mass ÷ tank volume',
      kind: 'identity',
    });
    expectRel(r.contents.vapourMass, 0.4 * V * ref.rhoV, 0.02, {
      input,
      source: SAT_SRC,
      kind: 'published',
      why: '±2 %, the core’s stated vapour-density target (test/reference/measure.ts)',
    });
  });

  it('the liquid is 60 % of the volume and its mass is that volume times liquidDensity', () => {
    const r = checkTank(propane60());
    const sat = saturation('propane', 293.15);
    expectRel(r.contents.liquidVolume, 0.6 * V, 1e-6, {
      input,
      source: 'a float gauge reads liquid volume ÷ tank volume',
      kind: 'identity',
    });
    expectWithin(r.contents.liquidPercent, 60, 1e-4, {
      input,
      source: 'the gauge reading entered',
      kind: 'identity',
    });
    const rhoL = liquidDensity('propane', 293.15, sat.pAbs);
    expectRel(r.contents.liquidMass, r.contents.liquidVolume * rhoL, 1e-6, {
      input,
      source: 'mass = volume × liquidDensity at the same state (core API)',
      kind: 'identity',
    });
    expectRel(r.contents.liquidMass + r.contents.vapourMass, r.contents.totalMass, 1e-9, {
      input,
      source: 'mass balance',
      kind: 'identity',
    });
    expect(r.contents.levelHeight).toBeNull(); // no shape entered
    expect(r.phase).toBe('two-phase');
    expect(r.full).toBeNull();
  });

  it('the filling density divides by the water weight of 8.32828 lb per US gal', () => {
    const r = checkTank(propane60());
    expectRel(
      r.contents.fillingDensity,
      (r.contents.totalMass * LB_PER_KG) / (1000 * 8.32828),
      1e-9,
      {
        input,
        source: '49 CFR 173.315(a) Note 1 (water 8.32828 lb/US gal at 60 °F)',
        kind: 'published',
      },
    );
  });

  it('the liquid volume at 60 °F uses the liquid density at 60 °F of the trade table', () => {
    const r = checkTank(propane60());
    const rho60 = tradeRow('propane', 60).rhoL;
    expectRel(r.contents.liquidVolumeAt60F, r.contents.liquidMass / rho60, 0.005, {
      input,
      source: TRADE_SRC,
      kind: 'published',
    });
    expectRel(r.product.liquidDensityAt60F, rho60, 0.005, {
      input,
      source: TRADE_SRC,
      kind: 'published',
    });
  });

  it('the product summary: SG 0.5072, critical temperature, LP-gas, where the SG came from', () => {
    const r = checkTank(propane60());
    expectRel(r.product.specificGravity, 0.5072, 0.005, {
      input,
      source: 'ASTM D2598 propane SG 0.5072, as quoted in the trade table’s source line',
      kind: 'published',
    });
    expect(r.product.specificGravitySource).toBe('model');
    expectWithin(r.product.criticalTemperature, 369.89, 0.01, {
      input,
      source: 'test/reference/fluids.csv Tc_eos (Lemmon et al. 2009)',
      kind: 'published',
    });
    expect(r.product.lpGas).toBe(true); // 29 CFR 1910.110(a)(7): propane is LP-gas
    expect(r.product.label).toMatch(/propane/i);
    const entered = checkTank(propane60({ specificGravity: 0.51 }));
    expect(entered.product.specificGravity).toBe(0.51);
    expect(entered.product.specificGravitySource).toBe('entered');
    const nh3 = checkTank({ ...propane60(), product: 'ammonia' });
    expect(nh3.product.lpGas).toBe(false); // ammonia is not in 1910.110(a)(7)'s list
  });
});

describe('checkTank: pressure now and the site barometer', () => {
  it('the pressure now is the reference vapour pressure, gauge rounded up to 100 Pa', () => {
    const r = checkTank(propane60());
    const ref = satRow('propane', 293.15);
    const input = 'propane 293.15 K, sea level';
    expectRel(r.pAbs, ref.p, 0.005, { input, source: SAT_SRC, kind: 'published' });
    expect(r.barometricPressureAbs).toBe(P_STD);
    expect(r.pGauge % STEP).toBe(0);
    expect(r.pGauge).toBeGreaterThanOrEqual(r.pAbs - P_STD);
    expect(r.pGauge).toBeLessThan(r.pAbs - P_STD + STEP);
    expectWithin(r.pGaugeUpper, ceil100(r.pAbs * (1 + VAPOUR_ALLOWANCE) - P_STD), 1e-6, {
      input,
      source: 'README "Limits of validity": vapour pressure raised by 0.5 %, rounded up to 100 Pa',
      kind: 'identity',
    });
    // The raised figure covers the reference pressure (the cautious side).
    expect(r.pGaugeUpper).toBeGreaterThanOrEqual(ref.p - P_STD);
  });

  it('at 1,500 m the gauge pressure is higher by what the air pressure is lower', () => {
    const sea = checkTank(propane60());
    const high = checkTank(propane60({ elevation: 1500 }));
    // U.S. Standard Atmosphere 1976 (= ISO 2533): 84 556 Pa at 1,500 m geopotential (from memory;
    // the troposphere formula 101 325 · (1 − 2.25577e-5 · h)^5.25588 gives 84 556 Pa too).
    expectWithin(high.barometricPressureAbs, 84_556, 30, {
      input: '1500 m',
      source: 'U.S. Standard Atmosphere 1976 at 1,500 m (from memory; agrees with its formula)',
      kind: 'published',
    });
    expectWithin(high.pGauge - sea.pGauge, P_STD - high.barometricPressureAbs, STEP, {
      input: 'propane 293.15 K at 0 and 1500 m',
      source: 'gauge = absolute − barometric',
      kind: 'identity',
      why: 'each gauge figure rounded up to 100 Pa',
    });
    expect(checkTank(propane60({ barometricPressureAbs: 95_000 })).barometricPressureAbs).toBe(
      95_000,
    );
  });

  it('a gauge reading gives a diagnosis; without one there is none', () => {
    expect(checkTank(propane60()).diagnosis).toBeNull();
    const T70 = toSI('temperature', 70, 'F');
    const ref = tradeRow('propane', 70);
    const r = checkTank(
      propane60({ liquidTemperature: T70, peakTemperature: T70, pressureReadingGauge: psig(110) }),
    );
    expect(r.diagnosis).not.toBeNull();
    expectRel(r.diagnosis!.expectedGauge + P_STD, ref.pAbs, 0.005, {
      input: 'propane 70 °F',
      source: 'test/reference/trade/saturation_properties.csv (propane, 70 °F row)',
      kind: 'published',
    });
  });

  it('every result ends with the standing caution, which grants no permission', () => {
    const r = checkTank(propane60());
    expect(r.cautions.at(-1)!.code).toBe('standing');
    expect(r.standingCaution).toMatch(/never replace/);
    expect(r.standingCaution).toMatch(/do not say that filling/i);
  });
});

describe('checkTank: a product that is no liquefied gas', () => {
  it('is refused as the product, in the words of the product check', () => {
    // methane (from memory): Tc 190.56 K, Pc 4.599 MPa, ω 0.011, M 16.043 g/mol (Poling, Prausnitz, O'Connell,
    // The Properties of Gases and Liquids, 5th ed., Appendix A): a gas at 60 °F
    const methane = {
      custom: { name: 'methane', molarMass: 0.016043, Tc: 190.56, Pc: 4.599e6, omega: 0.011 },
    };
    let err: unknown;
    try {
      checkTank(propane60({ product: methane }));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).field).toBe('product');
    expect((err as InputError).validRange).toMatch(/^a liquefied gas/);
  });
});

describe('checkTank: the peak day (propane 60 % at 293.15 K, peak 313.15 K)', () => {
  it('the peak pressure is the reference vapour pressure at the peak, raised by 0.5 %', () => {
    const r = checkTank(propane60());
    const ref = satRow('propane', 313.15);
    const p = r.peak;
    const input = 'propane 60 % at 293.15 K, peak 313.15 K';
    expect(p.temperature).toBe(313.15);
    expect(p.phase).toBe('two-phase');
    expect(p.full).toBeNull();
    expect(p.allowance).toBe(VAPOUR_ALLOWANCE);
    expectRel(p.pAbs, ref.p, 0.005, { input, source: SAT_SRC, kind: 'published' });
    expect(p.pGauge % STEP).toBe(0);
    expect(p.pGauge).toBeGreaterThanOrEqual(p.pAbs - P_STD);
    expect(p.pGauge).toBeLessThan(p.pAbs - P_STD + STEP);
    expectWithin(p.pGaugeUpper, ceil100(p.pAbs * (1 + VAPOUR_ALLOWANCE) - P_STD), 1e-6, {
      input,
      source: 'README "Limits of validity": 0.5 % on a vapour pressure; rounding up to 100 Pa',
      kind: 'identity',
    });
  });

  it('the liquid fraction at the peak balances the mass with the reference densities', () => {
    const r = checkTank(propane60());
    const ref = satRow('propane', 313.15);
    const rho = r.contents.overallDensity;
    expectRel(r.peak.liquidFraction, (rho - ref.rhoV) / (ref.rhoL - ref.rhoV), 0.01, {
      input: 'propane, same mass heated to 313.15 K',
      source: SAT_SRC + '; mass balance in a closed tank',
      kind: 'published',
    });
  });

  it('the headrooms are the design and relief settings less the raised peak, rounded down', () => {
    const same = checkTank(propane60());
    // No relief setting entered: it is taken as the design pressure (types.ts).
    expect(same.peak.headroomToDesign).toBe(floor100(psig(250) - same.peak.pGaugeUpper));
    expect(same.peak.headroomToRelief).toBe(same.peak.headroomToDesign);
    const r = checkTank(
      propane60({
        tank: {
          waterCapacity: V,
          designPressureGauge: psig(250),
          reliefSetPressureGauge: psig(220),
        },
      }),
    );
    expect(r.peak.headroomToRelief).toBe(floor100(psig(220) - r.peak.pGaugeUpper));
    expect(r.peak.headroomToDesign).toBe(floor100(psig(250) - r.peak.pGaugeUpper));
    expect(r.peak.headroomToRelief % STEP).toBe(0);
    // A design pressure on the 100 Pa grid: the headroom is the plain difference, not a step less.
    const grid = checkTank(
      propane60({ tank: { waterCapacity: V, designPressureGauge: 1_700_000 } }),
    );
    expect(grid.peak.headroomToDesign).toBe(1_700_000 - grid.peak.pGaugeUpper);
  });

  it('a peak equal to the temperature now repeats the state now', () => {
    const r = checkTank(propane60({ peakTemperature: 293.15 }));
    expect(r.peak.pAbs).toBe(r.pAbs);
    expect(r.peak.liquidFraction * 100).toBeCloseTo(r.contents.liquidPercent, 9);
  });
});
