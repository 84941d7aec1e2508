/**
 * The product as the tank check sees it (thermo/check/model.ts): constants, saturation, the
 * closed-tank state, the top of the saturation curve and the model's holding limit, against the
 * reference tables (test/reference/sat, test/reference/blends, test/reference/trade; sources in
 * test/reference/README.md and test/reference/blends/README.md), the fluids' reference constants
 * (test/reference/fluids.csv), blend compositions by mass (ASHRAE Standard 34 designations,
 * as test/reference/blends/README.md lists them), and the core's saturation, closedTank and
 * maxDensity at the same state.
 *
 * Every result is computed inside its own test (mutation testing ties each assertion to it).
 */
import { describe, expect, it } from 'vitest';
import { closedTank, InputError, maxDensity, saturation } from '../../thermo/index.js';
import { ProductModel, productBasics } from '../../thermo/check/model.js';
import { readTable } from '../reference/measure.js';
import { expectRel, expectWithin } from './check-helpers.js';

const SAT_SRC = 'test/reference/sat/propane.csv (Lemmon, McLinden, Wagner 2009 reference EOS)';
const BLEND_SRC =
  'test/reference/blends/r407c.csv (Lemmon & Jacobsen 2004 mixture model, nominal composition)';

function satRow(fluid: string, T: number) {
  const row = readTable(`sat/${fluid}.csv`).find((r) => Math.abs(Number(r.T_K) - T) < 1e-6)!;
  return { p: Number(row.p_Pa), rhoL: Number(row.rhoL_kg_m3), rhoV: Number(row.rhoV_kg_m3) };
}

function fluidRow(fluid: string) {
  const r = readTable('fluids.csv').find((x) => x.fluid === fluid)!;
  return {
    M: Number(r.molar_mass_kg_mol),
    Ttriple: Number(r.T_triple_K),
    Tc: Number(r.Tc_eos_K),
    rhoc: Number(r.rhoc_eos_kg_m3),
  };
}

function blendRow(blend: string, T: number) {
  const row = readTable(`blends/${blend}.csv`).find((r) => Math.abs(Number(r.T_K) - T) < 1e-6)!;
  return { pBubble: Number(row.p_bubble_Pa), rhoL: Number(row.rhoL_bubble_kg_m3) };
}

describe('ProductModel: constants of a pure fluid (propane)', () => {
  it('liquid densities at 60 °F and 15 °C, critical and triple points, critical density', () => {
    const b = productBasics('propane');
    const f = fluidRow('propane');
    // 60 °F: 506.7 kg/m³ (test/reference/trade/saturation_properties.csv, propane 60 °F row)
    expectRel(b.rho60, 506.7, 0.005, {
      input: 'propane 60 °F',
      source: 'test/reference/trade/saturation_properties.csv',
      kind: 'published',
    });
    expectRel(b.rho15, satRow('propane', 288.15).rhoL, 0.005, {
      input: 'propane 288.15 K',
      source: SAT_SRC,
      kind: 'published',
    });
    // 15 °C is 0.56 K colder than 60 °F: the liquid is denser there.
    expect(b.rho15).toBeGreaterThan(b.rho60);
    expectWithin(b.Tc, f.Tc, 0.01, { input: 'propane', source: 'fluids.csv', kind: 'published' });
    expectWithin(b.Tmin, f.Ttriple, 0.01, {
      input: 'propane',
      source: 'fluids.csv T_triple',
      kind: 'published',
    });
    expectRel(b.rhoc, f.rhoc, 0.001, { input: 'propane', source: 'fluids.csv', kind: 'published' });
    expect(b.pure).toBe(true);
    expect(b.label).toMatch(/propane/i);
    // The same product's constants are worked out once, and kept while others are asked for.
    expect(productBasics('propane')).toBe(b);
    productBasics('n-butane');
    expect(productBasics('propane')).toBe(b);
  });

  it('a gas that is not liquid at 60 °F is refused as a product', () => {
    // methane (from memory): M 16.043 g/mol, Tc 190.56 K, Pc 4.599 MPa, ω 0.011 (Poling, Prausnitz,
    // O'Connell, The Properties of Gases and Liquids, 5th ed., Appendix A)
    const methane = {
      custom: { name: 'methane', molarMass: 0.016043, Tc: 190.56, Pc: 4.599e6, omega: 0.011 },
    };
    let err: unknown;
    try {
      productBasics(methane);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).field).toBe('product');
    expect((err as InputError).validRange).toMatch(/liquefied gas/);
    expect((err as InputError).validRange).toMatch(/60 °F/);
    expect((err as InputError).message).toMatch(/\(got "methane"\)$/);
  });
});

describe('ProductModel: constants of a blend (R-407C, R-32/R-125/R-134a 23/25/52 by mass)', () => {
  it("Kay's rule on mole fractions from the mass fractions, and the bubble-liquid density at 15 °C", () => {
    const b = productBasics('r407c');
    const parts = [
      ['r32', 0.23],
      ['r125', 0.25],
      ['r134a', 0.52],
    ] as const;
    const moles = parts.map(([id, w]) => w / fluidRow(id).M);
    const n = moles.reduce((s, x) => s + x, 0);
    const x = moles.map((m) => m / n);
    const Tc = parts.reduce((s, [id], i) => s + x[i]! * fluidRow(id).Tc, 0);
    const M = parts.reduce((s, [id], i) => s + x[i]! * fluidRow(id).M, 0);
    const vc = parts.reduce((s, [id], i) => s + (x[i]! * fluidRow(id).M) / fluidRow(id).rhoc, 0);
    expect(b.pure).toBe(false);
    expectWithin(b.Tc, Tc, 0.05, {
      input: 'R-407C',
      source: "Kay's rule on fluids.csv Tc_eos; ASHRAE 34 composition",
      kind: 'published',
      why: 'critical temperatures in the data rounded to 0.01 K',
    });
    expectRel(b.rhoc, M / vc, 0.002, {
      input: 'R-407C',
      source: "Kay's rule on molar volumes from fluids.csv rhoc_eos",
      kind: 'published',
    });
    expectRel(b.rho15, blendRow('r407c', 288.15).rhoL, 0.01, {
      input: 'R-407C 288.15 K',
      source: BLEND_SRC,
      kind: 'published',
      why: 'bubble-liquid density of a blend, 1 %',
    });
    expect(b.Tmin).toBeGreaterThanOrEqual(fluidRow('r125').Ttriple - 0.01); // the highest triple point
  });
});

describe('ProductModel: saturation and the top of the curve', () => {
  it('propane saturation at 293.15 K is the reference one; none past Tc − 0.5 K', () => {
    const m = new ProductModel('propane');
    const ref = satRow('propane', 293.15);
    const s = m.sat(293.15)!;
    const input = 'propane 293.15 K';
    expectRel(s.pAbs, ref.p, 0.005, { input, source: SAT_SRC, kind: 'published' });
    expectRel(s.rhoL, ref.rhoL, 0.005, { input, source: SAT_SRC, kind: 'published' });
    expectRel(s.rhoV, ref.rhoV, 0.02, { input, source: SAT_SRC, kind: 'published' });
    const Tc = fluidRow('propane').Tc;
    expectWithin(m.satTop(), Math.min(400, Tc - 0.5), 1e-4, {
      input: 'propane',
      source: 'fluids.csv Tc_eos; the core’s saturation ends 0.5 K below Tc (thermo/api.ts)',
      kind: 'published',
      why: 'a pure fluid’s top is Tc − 0.5 K itself, not searched (a search stops at 0.01 K)',
    });
    expect(m.sat(m.satTop())).not.toBeNull(); // the top itself still has a saturation state
    expect(m.sat(Tc - 0.6)).not.toBeNull();
    expect(m.sat(Tc - 0.4)).toBeNull();
    expect(m.sat(Tc + 5)).toBeNull();
  });

  it('a blend the app offers: its top has a bubble point, 0.01 K above it there is none', () => {
    const m = new ProductModel('r407c');
    const top = m.satTop();
    const s = m.sat(top)!;
    expect(s).not.toBeNull();
    expect(s.rhoL).toBeGreaterThan(s.rhoV);
    expect(m.sat(top + 0.011)).toBeNull();
    // The reference bubble curve runs to 343.15 K at least (blends/README.md).
    expect(top).toBeGreaterThanOrEqual(343.15 - 0.5);
    expectRel(m.sat(293.15)!.pAbs, blendRow('r407c', 293.15).pBubble, 0.02, {
      input: 'R-407C 293.15 K',
      source: BLEND_SRC,
      kind: 'published',
      why: '2 %, the core’s stated bubble-pressure target (test/reference/measure.ts)',
    });
  });

  it('a blend not offered: its top is found by bisection, to 0.01 K', () => {
    const m = new ProductModel({
      components: [
        { id: 'propane', moleFraction: 0.37 },
        { id: 'isobutane', moleFraction: 0.63 },
      ],
    });
    const top = m.satTop();
    expect(m.sat(top)).not.toBeNull();
    expect(m.sat(top + 0.011)).toBeNull();
    // Between the two critical temperatures (fluids.csv): 369.89 K and 407.81 K, capped at 400 K.
    expect(top).toBeGreaterThan(fluidRow('propane').Tc);
    expect(top).toBeLessThanOrEqual(400);
  });
});

describe('ProductModel: shared per product', () => {
  it('a saturation state is worked out once per product and temperature, for every check', () => {
    const a = new ProductModel('propane');
    const first = a.sat(291.15);
    expect(a.sat(291.15)).toBe(first);
    a.sat(292.15); // another temperature is kept beside it
    expect(a.sat(291.15)).toBe(first);
    const b = new ProductModel('propane');
    expect(b.sat(291.15)).toBe(first);
    const other = new ProductModel('isobutene').sat(291.15); // another product, kept beside it
    expect(other).not.toBe(first);
    expect(other!.pAbs).toBeLessThan(first!.pAbs); // isobutene is the less volatile
    expect(new ProductModel('propane').sat(291.15)).toBe(first);
  });

  it('a blend whose bubble curve runs past 400 K ends at 400 K, the top of the check', () => {
    // n-butane/n-pentane: both critical temperatures above 400 K (fluids.csv: 425.1 K, 469.7 K)
    const m = new ProductModel({
      components: [
        { id: 'n-butane', moleFraction: 0.5 },
        { id: 'n-pentane', moleFraction: 0.5 },
      ],
    });
    expect(fluidRow('n-butane').Tc).toBeGreaterThan(400);
    expect(m.satTop()).toBe(400);
  });
});

describe('ProductModel: closed-tank states', () => {
  it('pure propane two-phase: the mass balances with the reference densities', () => {
    const m = new ProductModel('propane');
    const ref = satRow('propane', 293.15);
    const rho = 300;
    const s = m.state(293.15, rho);
    expect(s.phase).toBe('two-phase');
    expect(s.approximate).toBe(false);
    expectRel(s.lf * ref.rhoL + (1 - s.lf) * ref.rhoV, rho, 0.005, {
      input: 'propane 300 kg/m³ at 293.15 K',
      source: SAT_SRC + '; mass balance',
      kind: 'published',
    });
    expectRel(s.pAbs, ref.p, 0.005, { input: 'propane', source: SAT_SRC, kind: 'published' });
  });

  it('pure propane: vapour only below the vapour density, liquid-full above the liquid density', () => {
    const m = new ProductModel('propane');
    const ref = satRow('propane', 293.15); // ρV 17.4, ρL 500.2 kg/m³
    const v = m.state(293.15, 0.5 * ref.rhoV);
    expect(v.phase).toBe('vapour-only');
    expect(v.lf).toBe(0);
    expect(v.pAbs).toBeLessThan(ref.p);
    const l = m.state(293.15, 1.01 * ref.rhoL);
    expect(l.phase).toBe('liquid-full');
    expect(l.lf).toBe(1);
    expect(l.pAbs).toBeGreaterThan(ref.p);
  });

  it('CO2 above its critical temperature is supercritical', () => {
    expect(new ProductModel('carbon-dioxide').state(310, 700).phase).toBe('supercritical');
  });

  it('a blend two-phase: bubble pressure, liquid fraction from the bubble-point densities', () => {
    const m = new ProductModel('r407c');
    const rho = 600;
    const s = m.state(293.15, rho);
    const sat = saturation('r407c', 293.15);
    expect(s.phase).toBe('two-phase');
    expect(s.approximate).toBe(true);
    const same = {
      input: 'R-407C 293.15 K',
      source: 'core saturation (bubble point)',
      kind: 'identity' as const,
    };
    expectRel(s.pAbs, sat.pAbs, 1e-9, same);
    expectRel(s.rhoL!, sat.rhoL, 1e-9, same);
    expectRel(s.rhoV!, sat.rhoV, 1e-9, same);
    expectRel(s.lf * sat.rhoL + (1 - s.lf) * sat.rhoV, rho, 1e-12, {
      input: 'R-407C 600 kg/m³ at 293.15 K',
      source: 'mass balance with the core’s bubble-point densities',
      kind: 'identity',
    });
    expectRel(s.pAbs, blendRow('r407c', 293.15).pBubble, 0.02, {
      input: 'R-407C 293.15 K',
      source: BLEND_SRC,
      kind: 'published',
    });
    // The bubble pressure bounds the flash's two-phase pressure from above (the cautious side).
    expect(s.pAbs).toBeGreaterThanOrEqual(closedTank('r407c', 293.15, rho).pAbs);
  });

  it('a blend at or above its bubble-liquid density is liquid-full, never below the bubble pressure', () => {
    const m = new ProductModel('r407c');
    const sat = saturation('r407c', 293.15);
    for (const k of [1, 1.01]) {
      const rho = k * sat.rhoL;
      const s = m.state(293.15, rho);
      expect(s.phase).toBe('liquid-full');
      expect(s.lf).toBe(1);
      expect(s.rhoL).toBe(rho);
      expect(s.rhoV).toBeNull();
      expect(s.approximate).toBe(false);
      expect(s.pAbs).toBeGreaterThanOrEqual(sat.pAbs);
      expect(s.pAbs).toBeGreaterThanOrEqual(closedTank('r407c', 293.15, rho).pAbs);
    }
  });

  it('all liquid at its bubble point is liquid-full, whatever the flash rounds to', () => {
    // R-410A at 250 K: the flash of exactly the bubble-liquid density can come out a hair short
    // of full; a tank of liquid at its bubble point has no vapour space.
    const sat = saturation('r410a', 250);
    const s = new ProductModel('r410a').state(250, sat.rhoL);
    expect(s.phase).toBe('liquid-full');
    expect(s.lf).toBe(1);
    expect(s.pAbs).toBeGreaterThanOrEqual(sat.pAbs);
  });

  it('a blend all but empty is an ideal gas at the flash pressure', () => {
    // R-407C, M = 86.2036 g/mol (test/reference/blends/README.md); R = 8.314462618 J/(mol·K)
    // (CODATA 2018). At 0.01 kg/m³ the second virial term is below 1e-4 of p.
    const rho = 0.01;
    const s = new ProductModel('r407c').state(293.15, rho);
    expect(s.phase).toBe('vapour-only');
    expectRel(s.pAbs, (rho * 8.314462618 * 293.15) / 0.0862036, 1e-3, {
      input: 'R-407C 0.01 kg/m³ at 293.15 K',
      source: 'ideal-gas law, p = ρRT/M',
      kind: 'published',
    });
  });

  it('a blend heated past the vapour end: the pressure never falls, and never below the flash', () => {
    // A closed tank's pressure rises with temperature ((∂p/∂T) at constant density > 0).
    const m = new ProductModel('r407c');
    const rho = 5;
    let last = 0;
    for (let T = 226; T <= 258; T += 2) {
      const s = m.state(T, rho);
      expect(s.pAbs, `R-407C 5 kg/m³ at ${T} K`).toBeGreaterThanOrEqual(last);
      if (!s.approximate) {
        expect(s.pAbs).toBeGreaterThanOrEqual(closedTank('r407c', T, rho).pAbs);
      }
      last = s.pAbs;
    }
    // Far past the end the flash stands alone (its pressure above the floor).
    const far = m.state(300, rho);
    expectRel(far.pAbs, closedTank('r407c', 300, rho).pAbs, 1e-12, {
      input: 'R-407C 5 kg/m³ at 300 K',
      source: 'core closedTank at the same state',
      kind: 'identity',
    });
  });
});

describe('ProductModel: what the model can hold', () => {
  it('stateOrNull refuses a density above the 100 MPa liquid, and maxDensityAt is that density', () => {
    const m = new ProductModel('propane');
    const dmax = maxDensity('propane', 300);
    expect(m.maxDensityAt(300)).toBe(dmax);
    // More than the compressed liquid at p_sat + 5 MPa (test/reference/liquid/propane.csv, 303.15 K: 495.6 kg/m³ hotter)
    const liquid5 = readTable('liquid/propane.csv').find(
      (r) => r.T_K === '303.15' && r.dp_above_psat_MPa === '5',
    )!;
    expect(dmax).toBeGreaterThan(Number(liquid5.rho_kg_m3));
    expect(m.stateOrNull(300, dmax * 1.001)).toBeNull();
    expect(m.stateOrNull(300, dmax)).not.toBeNull(); // the limit itself is held
    expect(m.stateOrNull(300, 0.99 * dmax)!.phase).toBe('liquid-full');
  });

  it('maxTemperatureFor: the top of the range when it can hold the fill there, else where it stops', () => {
    const m = new ProductModel('propane');
    expect(m.maxTemperatureFor(300, 250, 340)).toBe(340);
    expect(m.maxTemperatureFor(maxDensity('propane', 340), 250, 340)).toBe(340); // held at 340 K itself
    const rho = maxDensity('propane', 300);
    const T = m.maxTemperatureFor(rho, 250, 340);
    expectWithin(T, 300, 0.002, {
      input: 'propane, the 300 K limit density',
      source: 'core maxDensity (falls as T rises)',
      kind: 'identity',
      why: 'bisection to 0.001 K',
    });
  });
});
