/**
 * The check's temperature searches (thermo/check/search.ts), each answer checked two ways:
 *
 * - against the reference tables of test/reference (computed from each fluid's published
 *   reference equation of state; see test/reference/README.md): `sat/<fluid>.csv` for the
 *   saturation temperature of a pressure, `liquid-full.csv` for the temperature at which a closed
 *   tank of fixed overall density becomes liquid-full, and both for the relief temperature;
 * - by recomputing the quantity searched for with the core at the returned temperature and just
 *   beside it (the saturation pressure from `ProductModel.sat`, the closed-tank pressure from
 *   `ProductModel.stateOrNull`): equal there, below it 0.01 K colder and above it 0.01 K warmer,
 *   so the answer is the crossing itself and not a point near it.
 *
 * Tolerances against the tables: the model's targets of test/reference/measure.ts (vapour
 * pressure 0.5 %, which is under 0.25 K of saturation temperature at these pressures; liquid-full
 * temperature 1 K).
 */
import { describe, expect, it } from 'vitest';
import { ProductModel, type State } from '../../thermo/check/model.js';
import {
  liquidFullTemperature,
  reliefTemperature,
  saturationTemperature,
  satTop,
} from '../../thermo/check/search.js';
import { pressureAllowance } from '../../thermo/check/full.js';
import { MODEL_ALLOWANCE } from '../../thermo/rules/allowance.js';
import { T_CHECK_MAX_K } from '../../thermo/limits.js';
import { PSI_PA } from '../../thermo/units.js';
import { readTable, TARGETS } from '../reference/measure.js';
import { expectRel, expectWithin } from './check-helpers.js';

const SAT_SRC = (id: string) => `test/reference/sat/${id}.csv (reference EOS, see README there)`;
const LF_SRC = 'test/reference/liquid-full.csv (reference EOS, see README there)';
const ATM = 101_325;

/** Reference saturation temperature of a pressure: ln p interpolated linearly in 1/T. */
function refSatT(id: string, pAbs: number): number {
  const rows = readTable(`sat/${id}.csv`).map((r) => [+r.T_K!, +r.p_Pa!] as const);
  for (let i = 1; i < rows.length; i++) {
    const [T0, p0] = rows[i - 1]!;
    const [T1, p1] = rows[i]!;
    if (p0 <= pAbs && pAbs <= p1) {
      const w = Math.log(pAbs / p0) / Math.log(p1 / p0);
      return 1 / (1 / T0 + w * (1 / T1 - 1 / T0));
    }
  }
  throw new Error(`${pAbs} Pa is outside the ${id} table`);
}

function refLiquidFull(id: string, ratio: number) {
  const r = readTable('liquid-full.csv').find((x) => x.fluid === id && +x.ratio_to_999! === ratio)!;
  return {
    rho: +r.rho_overall_kg_m3!,
    transition: r.transition!,
    T: +r.T_transition_K!,
    p: +r.p_at_transition_Pa!,
    p2: +r.p_T_plus_2K_Pa!,
    p5: +r.p_T_plus_5K_Pa!,
  };
}

/** Saturation pressure of the model at T, Pa (fails the test where there is none). */
const psat = (m: ProductModel, T: number) => m.sat(T)!.pAbs;
const rhoL = (m: ProductModel, T: number) => m.sat(T)!.rhoL;

describe('the highest saturation temperature searched', () => {
  it('is half a kelvin below the critical temperature, or the check’s ceiling when that is lower', () => {
    // Critical temperatures of the reference equations (test/reference/fluids.csv): propane
    // 369.890 K (Lemmon et al. 2009), n-butane 425.125 K (Bücker & Wagner 2006).
    expectWithin(satTop(new ProductModel('propane')), 369.89 - 0.5, 0.01, {
      input: 'propane',
      source: 'test/reference/fluids.csv, Tc of Lemmon, McLinden & Wagner 2009',
      kind: 'published',
    });
    expect(satTop(new ProductModel('n-butane'))).toBe(T_CHECK_MAX_K);
  });
});

describe('the saturation temperature of a pressure', () => {
  const cases: [string, number, number[]][] = [
    // [fluid, pressure absolute, hints]
    ['propane', 1_000_000, [290]],
    ['propane', 1_000_000, []], // no hint: starts from the lowest temperature searched
    ['propane', 2_500_000, [250, 300]], // a hint on each side
    ['n-butane', 250_000, [330]], // hint above the answer only
    ['ammonia', 1_500_000, [300, 360]],
    ['carbon-dioxide', 5_000_000, [230]],
  ];
  for (const [id, p, hints] of cases)
    it(`${id} at ${p / 1000} kPa absolute (hints ${hints.join(', ') || 'none'})`, () => {
      const m = new ProductModel(id);
      const T = saturationTemperature(m, p, hints, 230)!;
      expectWithin(T, refSatT(id, p), 0.25, {
        input: { id, p },
        source: SAT_SRC(id),
        kind: 'published',
        why: 'vapour-pressure target 0.5 % = under 0.25 K here',
      });
      // The model's own saturation pressure there is the pressure asked for, and the crossing
      // is not off to one side.
      expectRel(psat(m, T), p, 1e-5, {
        input: { id, p, T },
        source: 'ProductModel.sat',
        kind: 'identity',
      });
      expect(psat(m, T - 0.01)).toBeLessThan(p);
      expect(psat(m, T + 0.01)).toBeGreaterThan(p);
    });

  it('is none for a pressure above the critical pressure (4.2512 MPa for propane)', () => {
    const m = new ProductModel('propane');
    expect(saturationTemperature(m, 5_000_000, [300, 360], 230)).toBeNull();
  });

  it('is none for a pressure below the saturation pressure at the lowest temperature searched', () => {
    // Propane at 230 K boils at about 97 kPa (test/reference/sat/propane.csv): 10 kPa is colder.
    const m = new ProductModel('propane');
    expect(saturationTemperature(m, 10_000, [300], 230)).toBeNull();
    expect(saturationTemperature(m, 10_000, [], 230)).toBeNull();
  });

  it('is none when the lowest temperature searched is already above the curve', () => {
    const m = new ProductModel('propane');
    expect(saturationTemperature(m, 1_000_000, [300], 369.5)).toBeNull();
  });

  it('finds the pressure at the lowest temperature searched when the hint is outside the range', () => {
    // 230 K is under the hint range's low end; the hint at 380 K is past propane's curve.
    const m = new ProductModel('propane');
    const p = psat(m, 240);
    const T = saturationTemperature(m, p, [380], 230)!;
    expectWithin(T, 240, 0.005, {
      input: 'propane at its 240 K pressure',
      source: 'ProductModel.sat',
      kind: 'identity',
    });
  });
});

describe('the liquid-full temperature of a closed tank', () => {
  const full: [string, number][] = [
    ['propane', 0.42],
    ['n-butane', 0.42],
    ['n-butane', 0.56],
    ['ammonia', 0.56],
    ['isobutane', 0.56],
    ['r32', 0.56],
  ];
  for (const [id, ratio] of full)
    it(`${id} at ${ratio} of water's density`, () => {
      const ref = refLiquidFull(id, ratio);
      expect(ref.transition).toBe('liquid-full');
      const m = new ProductModel(id);
      const T = liquidFullTemperature(m, ref.rho, [300], 230)!;
      expectWithin(T, ref.T, TARGETS.liquidFullK, {
        input: { id, rho: ref.rho },
        source: LF_SRC,
        kind: 'published',
        why: 'liquid-full temperature target of the model',
      });
      // There the saturated liquid has the tank's overall density; colder it is denser (room
      // left), warmer it would not fit.
      expectRel(rhoL(m, T), ref.rho, 1e-4, {
        input: { id, T },
        source: 'ProductModel.sat',
        kind: 'identity',
      });
      expect(rhoL(m, T - 0.01)).toBeGreaterThan(ref.rho);
      expect(rhoL(m, T + 0.01)).toBeLessThan(ref.rho);
    });

  it('is none below the critical density: the liquid boils away instead (R-134a at 0.42)', () => {
    const ref = refLiquidFull('r134a', 0.42);
    expect(ref.transition).toBe('vapour-full');
    expect(liquidFullTemperature(new ProductModel('r134a'), ref.rho, [300], 230)).toBeNull();
  });

  it('is none at exactly the critical density', () => {
    const m = new ProductModel('propane');
    expect(liquidFullTemperature(m, m.basics.rhoc, [300], 230)).toBeNull();
  });

  it('is none when the tank fills only above the highest temperature searched (n-pentane, 441.7 K)', () => {
    const ref = refLiquidFull('n-pentane', 0.42);
    expect(ref.T).toBeGreaterThan(T_CHECK_MAX_K);
    expect(liquidFullTemperature(new ProductModel('n-pentane'), ref.rho, [300], 230)).toBeNull();
  });

  it('is none when the lowest temperature searched is past the curve', () => {
    expect(liquidFullTemperature(new ProductModel('propane'), 450, [300], 369.5)).toBeNull();
  });

  it('is the lowest temperature searched for contents denser than the liquid there', () => {
    // Propane's saturated liquid at 230 K is about 561 kg/m³ (test/reference/sat/propane.csv).
    const m = new ProductModel('propane');
    expect(rhoL(m, 230)).toBeLessThan(600);
    expect(liquidFullTemperature(m, 600, [300], 230)).toBe(230);
  });

  it('is the end of the curve, no later than the reference, when the fluid is denser than critical but the liquid has not filled the tank there (CO2 and R-134a at 0.56)', () => {
    for (const id of ['carbon-dioxide', 'r134a']) {
      const ref = refLiquidFull(id, 0.56);
      const m = new ProductModel(id);
      const T = liquidFullTemperature(m, ref.rho, [300], 230)!;
      expect(T, id).toBe(satTop(m));
      // The cautious side: not after the reference liquid-full temperature, and within the target.
      expect(T, id).toBeLessThanOrEqual(ref.T);
      expectWithin(T, ref.T, TARGETS.liquidFullK, {
        input: { id, rho: ref.rho },
        source: LF_SRC,
        kind: 'published',
      });
      expect(rhoL(m, T), id).toBeGreaterThan(ref.rho);
    }
  });
});

describe('the relief temperature of a closed tank', () => {
  const relief = 250 * PSI_PA + ATM;
  const allowanceFor = (m: ProductModel, rho: number) => (s: State) =>
    pressureAllowance(s, rho, m.basics.rhoc);
  /** The closed-tank pressure raised by its allowance, Pa absolute. */
  const raised = (m: ProductModel, rho: number, T: number) => {
    const s = m.stateOrNull(T, rho)!;
    return s.pAbs * (1 + allowanceFor(m, rho)(s));
  };

  it('two-phase: where the vapour pressure plus its allowance reaches the relief setting (propane at 0.42)', () => {
    const ref = refLiquidFull('propane', 0.42);
    const m = new ProductModel('propane');
    const Tfull = liquidFullTemperature(m, ref.rho, [300], 230);
    const T = reliefTemperature(m, ref.rho, relief, allowanceFor(m, ref.rho), 300, Tfull, [300])!;
    const pSat = relief / (1 + MODEL_ALLOWANCE.vapourPressure);
    expectWithin(T, refSatT('propane', pSat), 0.25, {
      input: { relief: '250 psig' },
      source: SAT_SRC('propane'),
      kind: 'published',
    });
    expect(m.stateOrNull(T, ref.rho)!.phase).toBe('two-phase');
    expectRel(raised(m, ref.rho, T), relief, 1e-4, {
      input: { T },
      source: 'ProductModel.stateOrNull',
      kind: 'identity',
    });
    expect(raised(m, ref.rho, T - 0.01)).toBeLessThan(relief);
    expect(raised(m, ref.rho, T + 0.01)).toBeGreaterThan(relief);
  });

  it('two-phase without a liquid-full temperature (R-134a at 0.42 boils dry instead)', () => {
    const rho = refLiquidFull('r134a', 0.42).rho;
    const m = new ProductModel('r134a');
    const T = reliefTemperature(m, rho, relief, allowanceFor(m, rho), 300, null, [300])!;
    expectWithin(T, refSatT('r134a', relief / (1 + MODEL_ALLOWANCE.vapourPressure)), 0.25, {
      input: { relief: '250 psig' },
      source: SAT_SRC('r134a'),
      kind: 'published',
    });
    expectRel(raised(m, rho, T), relief, 1e-4, {
      input: { T },
      source: 'ProductModel.stateOrNull',
      kind: 'identity',
    });
  });

  it('liquid-full: on the compressed-liquid branch past the liquid-full temperature (n-butane at 0.56)', () => {
    // Reference: liquid-full at 309.45 K, 1.563 MPa 2 K above it and 3.393 MPa 5 K above it;
    // the raised pressure (allowance 10 %) meets 250 psig where the reference pressure is
    // relief/1.1 = 1.651 MPa, about 2.1 K past liquid-full (linear between the two rows).
    const ref = refLiquidFull('n-butane', 0.56);
    const m = new ProductModel('n-butane');
    const Tfull = liquidFullTemperature(m, ref.rho, [300], 230)!;
    const T = reliefTemperature(m, ref.rho, relief, allowanceFor(m, ref.rho), 300, Tfull, [300])!;
    const pTarget = relief / (1 + MODEL_ALLOWANCE.liquidFullPressure);
    const Tref = ref.T + 2 + (3 * (pTarget - ref.p2)) / (ref.p5 - ref.p2);
    expectWithin(T, Tref, TARGETS.liquidFullK, {
      input: { relief: '250 psig', rho: ref.rho },
      source: LF_SRC,
      kind: 'published',
      why: 'the liquid-full temperature target carries over to the steep branch past it',
    });
    expect(T).toBeGreaterThan(Tfull);
    expect(m.stateOrNull(T, ref.rho)!.phase).toBe('liquid-full');
    expectRel(raised(m, ref.rho, T), relief, 2e-3, {
      input: { T },
      source: 'ProductModel.stateOrNull',
      kind: 'identity',
      why: 'the search stops within 0.002 K; the liquid-full branch climbs about 0.6 MPa/K',
    });
    expect(raised(m, ref.rho, T - 0.01)).toBeLessThan(relief);
    expect(raised(m, ref.rho, T + 0.01)).toBeGreaterThan(relief);
  });

  it('is the present temperature when the pressure is at or above the setting already', () => {
    const m = new ProductModel('propane');
    const rho = 419.58;
    // Propane's vapour pressure at 300 K is about 998 kPa (test/reference/sat/propane.csv).
    expect(reliefTemperature(m, rho, 900_000, allowanceFor(m, rho), 300, null)).toBe(300);
    // Exactly at the raised pressure: reached already.
    const at = raised(m, rho, 300);
    expect(reliefTemperature(m, rho, at, allowanceFor(m, rho), 300, null)).toBe(300);
  });

  it('is none when the setting is not reached below the highest temperature searched', () => {
    // 100 MPa: far above what a 0.42 propane tank holds at 400 K (the liquid-full branch from
    // 2.28 MPa at 336.8 K rises about 0.3–0.5 MPa/K in the reference table: some 30 MPa at
    // 400 K); R-134a at 0.42 is a gas of some 6 MPa at 400 K (Tc 374.2 K, pc 4.06 MPa).
    const m = new ProductModel('propane');
    const rho = 419.58;
    const Tfull = liquidFullTemperature(m, rho, [300], 230);
    expect(reliefTemperature(m, rho, 100e6, allowanceFor(m, rho), 300, Tfull, [300])).toBeNull();
    const r = new ProductModel('r134a');
    expect(reliefTemperature(r, rho, 30e6, allowanceFor(r, rho), 300, null, [300])).toBeNull();
  });
});
