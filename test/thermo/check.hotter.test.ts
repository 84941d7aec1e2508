/**
 * Past the critical temperature, contents denser than the critical density fill the tank with
 * dense fluid (Span & Wagner 1996 give CO2's critical point; test/reference/fluids.csv), and the
 * cases of the check that once read safer when hotter, each checked against something outside
 * the code: the reference critical constants, the physics of a closed vessel (pressure never
 * falls as it warms; common practice), or the definition of the relief setting.
 */
import { describe, it, expect } from 'vitest';
import {
  checkTank,
  InputError,
  LPG_PRESETS,
  maxDensity,
  saturation,
  type TankCheckInput,
} from '../../thermo/index.js';
import { checkClose } from '../helpers/check.js';
import { readTable } from '../reference/measure.js';

const ref = (id: string) => readTable('fluids.csv').find((r) => r.fluid === id)!;
const co2 = ref('carbon-dioxide');
const co2Tc = Number(co2.Tc_eos_K);
const co2Rhoc = Number(co2.rhoc_eos_kg_m3);
const SW = 'Span & Wagner 1996 (J. Phys. Chem. Ref. Data 25, 1509), test/reference/fluids.csv';

const co2Tank = (peak: number): TankCheckInput => ({
  tank: { waterCapacity: 1, designPressureGauge: 2e7 },
  product: 'carbon-dioxide',
  liquidTemperature: 283.15,
  contents: { netMass: 700 },
  peakTemperature: peak,
});

describe('checkTank: a tank full of dense fluid past the critical temperature', () => {
  it('CO2 700 kg/m³ at a peak above Tc is a danger, and the limit keeps it below ρc', () => {
    const below = checkTank(co2Tank(303.15));
    const above = checkTank(co2Tank(co2Tc + 0.2));
    expect(700).toBeGreaterThan(co2Rhoc); // denser than critical: the premise of the case
    expect(below.peak.full).toBe('liquid');
    expect(above.peak.full).toBe('dense-fluid');
    expect(above.cautions[0]!.level).toBe('danger');
    expect(above.cautions.map((c) => c.code)).toContain('dense-fluid-at-peak');
    // The not-full limit above Tc keeps the contents at or below the critical density.
    expect(above.fillLimit.maxMass).toBeLessThanOrEqual(co2Rhoc);
    checkClose({
      what: 'CO2 not-full limit above Tc, kg in 1 m³',
      input: 'peak Tc + 0.2 K',
      actual: above.fillLimit.maxMass,
      expected: co2Rhoc,
      // 0.5 % model allowance on density plus the model's own critical density (within 1 %)
      rtol: 0.015,
      kind: 'published',
      source: SW,
    });
    expect(above.fillLimit.maxMass).toBeLessThanOrEqual(below.fillLimit.maxMass);
    // A full tank's pressure takes the 10 % allowance on both sides of Tc.
    expect(above.peak.headroomToDesign).toBeLessThanOrEqual(below.peak.headroomToDesign);
  });

  it('contents below the critical density past Tc are not full (no danger from fill alone)', () => {
    const r = checkTank({ ...co2Tank(co2Tc + 5), contents: { netMass: 0.8 * co2Rhoc } });
    expect(r.peak.phase).toBe('supercritical');
    expect(r.peak.full).toBeNull();
    expect(r.liquidFullTemperature).toBeNull();
  });
});

describe('checkTank: cases that read safer when hotter', () => {
  it('a pb-50-50 tank at 0.031 % gauge: the pressure does not fall from 272.08 K to 282.89 K', () => {
    const pb = LPG_PRESETS.find((p) => p.id === 'pb-50-50')!.product;
    const run = (peak: number) =>
      checkTank({
        tank: { waterCapacity: 5.116, designPressureGauge: 1.7e6 },
        product: pb,
        liquidTemperature: 272.08,
        contents: { gaugePercent: 0.031 },
        peakTemperature: peak,
      });
    const a = run(272.08);
    const b = run(282.89);
    // closed vessel: the pressure never falls as the contents warm (physics)
    expect(b.peak.pGauge).toBeGreaterThanOrEqual(a.peak.pGauge);
  });

  it('a blend at 100 % gauge is liquid-full now, with a danger', () => {
    const pb = LPG_PRESETS.find((p) => p.id === 'pb-50-50')!.product;
    const r = checkTank({
      tank: { waterCapacity: 1, designPressureGauge: 1.7e6 },
      product: pb,
      liquidTemperature: 290,
      contents: { gaugePercent: 100 },
      peakTemperature: 300,
    });
    expect(r.phase).toBe('liquid-full');
    expect(r.cautions.map((c) => c.code)).toContain('liquid-full-now');
    expect(r.cautions[0]!.level).toBe('danger');
  });

  it('a relief setting below the vapour pressure now is reached now, not at liquid-full', () => {
    const T = 300;
    const pSat = saturation('propane', T).pAbs; // about 1 MPa absolute (core, checked against the reference tables)
    const relief = 0.5 * (pSat - 101_325);
    const r = checkTank({
      tank: { waterCapacity: 1, designPressureGauge: 2e6, reliefSetPressureGauge: relief },
      product: 'propane',
      liquidTemperature: T,
      contents: { gaugePercent: 50 },
      peakTemperature: 310,
    });
    expect(r.reliefTemperature).toBe(T);
    expect(r.reliefTemperature).not.toBe(r.liquidFullTemperature);
    expect(r.cautions.map((c) => c.code)).toContain('relief-now');
  });
});

describe('checkTank and the core refuse bad input by naming an input field', () => {
  it('ethane liquid-full below its lowest temperature names no internal "density"', () => {
    // 609.4 kg in 1 m³ at 161.66 K with a peak of 152.29 K and a low design pressure: the relief
    // search used to ask the core for a state beyond what it can hold.
    for (const designPressureGauge of [1e4, 1e5, 1e6, 2e7]) {
      try {
        const r = checkTank({
          tank: { waterCapacity: 1, designPressureGauge },
          product: 'ethane',
          liquidTemperature: 161.66,
          contents: { netMass: 609.4 },
          peakTemperature: 152.29,
        });
        expect(r.full).toBe('liquid');
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).field).not.toBe('density');
      }
    }
  });

  it('a BigInt, a string or a symbol gives InputError, not TypeError', () => {
    const base = co2Tank(300);
    for (const bad of [1n, '300', Symbol('x'), { valueOf: () => 300 }]) {
      expect(() => checkTank({ ...base, liquidTemperature: bad as unknown as number })).toThrow(
        InputError,
      );
      expect(() =>
        checkTank({ ...base, tank: { ...base.tank, waterCapacity: bad as unknown as number } }),
      ).toThrow(InputError);
    }
  });

  it('maxDensity validates its temperature like the rest of the API', () => {
    for (const bad of [1n, '300', NaN, -5, 1e6, null]) {
      let err: unknown;
      try {
        maxDensity('propane', bad as unknown as number);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(InputError);
      expect((err as InputError).field).toBe('T');
    }
  });
});
