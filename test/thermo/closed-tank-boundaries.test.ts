/**
 * The closed-tank solver (solvers/closedTank.ts) exactly on the borders between its cases, and
 * with models whose stated critical temperature disagrees with their cubic's.
 *
 * On a border the two neighbouring cases must give the same pressure (continuity), and the tank
 * is called full on the side that leaves no vapour space (the safe side: a liquid-full tank is
 * the dangerous one, so a tie is reported as liquid-full). The saturated densities and pressures
 * come from the saturation solvers (pureSaturation, saturationPointAt), the pressures are
 * checked against the reference equation of state (test/reference/sat/propane.csv: Lemmon,
 * McLinden & Wagner 2009, J. Chem. Eng. Data 54, 3141; test/reference/bubble.csv: GERG-2008,
 * Kunz & Wagner 2012, J. Chem. Eng. Data 57, 3032), and the single-phase volumes against the
 * model's own root at the returned pressure (pureVolume, phaseAt).
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError } from '../../thermo/errors.js';
import { resolveProduct, type ResolvedProduct } from '../../thermo/product.js';
import { closedTankState } from '../../thermo/solvers/closedTank.js';
import { mixtureAtT, phaseAt, saturationPointAt } from '../../thermo/solvers/mixture.js';
import { pureSaturation, pureVolume } from '../../thermo/solvers/pure.js';
import { checkClose } from '../helpers/check.js';
import { readTable, TARGETS } from '../reference/measure.js';

const propane = resolveProduct('propane');
const pm = propane.components[0]!;
const T = 283.15;
const SAT = 'Lemmon, McLinden & Wagner 2009 via test/reference/sat/propane.csv';
const pRef = +readTable('sat/propane.csv').find((r) => +r.T_K! === T)!.p_Pa!;

/** Within 1e-9 of p_sat: continuity across a border (the solver's own tolerance is 1e-12 in ln v). */
function continuous(what: string, actual: number, expected: number) {
  checkClose({
    what,
    input: { T },
    actual,
    expected,
    rtol: 1e-9,
    kind: 'identity',
    source: 'continuity at the border: the saturation pressure from the saturation solver',
  });
}

describe('pure fluid, exactly at the saturated densities', () => {
  it('at ρ = ρ_L the tank is liquid-full at p_sat (no vapour space: the safe side)', () => {
    const sat = pureSaturation(pm, T);
    const rho = pm.molarMass / sat.vL;
    const c = closedTankState(propane, T, rho);
    expect(c.phase).toBe('liquid');
    expect(c.pAbs).toBeGreaterThanOrEqual(sat.p);
    continuous('p at ρ_L', c.pAbs, sat.p);
    checkClose({
      what: 'p at ρ_L against the reference vapour pressure',
      input: { T },
      actual: c.pAbs,
      expected: pRef,
      rtol: TARGETS.psat,
      kind: 'fitted',
      source: SAT,
    });
    expect([c.liquidFraction, c.vapourMassFraction, c.rhoV]).toEqual([1, 0, null]);
    // Just below ρ_L: two-phase at the same pressure, with next to no vapour space.
    const below = closedTankState(propane, T, rho * (1 - 1e-9));
    expect(below.phase).toBe('two-phase');
    continuous('p just below ρ_L', below.pAbs, sat.p);
    expect(below.liquidFraction).toBeGreaterThan(1 - 1e-6);
  });

  it('at ρ = ρ_V the tank holds vapour only, at p_sat', () => {
    const sat = pureSaturation(pm, T);
    const rho = pm.molarMass / sat.vV;
    const c = closedTankState(propane, T, rho);
    expect(c.phase).toBe('vapour');
    expect(c.pAbs).toBeLessThanOrEqual(sat.p);
    continuous('p at ρ_V', c.pAbs, sat.p);
    expect([c.liquidFraction, c.vapourMassFraction, c.rhoL]).toEqual([0, 1, null]);
    const above = closedTankState(propane, T, rho * (1 + 1e-9));
    expect(above.phase).toBe('two-phase');
    continuous('p just above ρ_V', above.pAbs, sat.p);
    expect(above.liquidFraction).toBeLessThan(1e-6);
  });

  it('above Tc, exactly at the model’s critical density: counted as filling the tank', () => {
    const c = closedTankState(propane, 400, pm.rhoc);
    expect(c.phase).toBe('supercritical');
    expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([1, pm.rhoc, null, 0]);
    checkClose({
      what: 'v at the tank pressure',
      input: { T: 400, rho: pm.rhoc },
      actual: pureVolume(pm, 400, c.pAbs, 'stable'),
      expected: pm.molarMass / pm.rhoc,
      rtol: 1e-10,
      kind: 'identity',
      source: 'the model’s root at (T, p)',
    });
  });
});

/**
 * Deliberately inconsistent models: propane's cubic (critical point at 369.89 K, the reference
 * equation's 369.890 K, test/reference/fluids.csv) with another stated Tc. The stated Tc decides
 * which case applies; a saturation that fails well below it is an error, not a guess.
 */
function withStatedTc(Tc: number): ResolvedProduct {
  return { ...propane, components: [{ ...pm, Tc }] };
}

function expectOnePhase(product: ResolvedProduct, TT: number, rho: number) {
  const c = closedTankState(product, TT, rho);
  expect(c.phase).toBe('supercritical');
  checkClose({
    what: 'v at the tank pressure',
    input: { TT, rho },
    actual: pureVolume(product.components[0]!, TT, c.pAbs, 'stable'),
    expected: pm.molarMass / rho,
    rtol: 1e-10,
    kind: 'identity',
    source: 'the model’s root at (T, p)',
  });
  return c;
}

describe('pure fluid, stated Tc and the cubic’s disagree', () => {
  it('at or above the stated Tc: one phase, even where the cubic still has two', () => {
    const p = withStatedTc(pm.Tc - 1);
    // The cubic still splits there (a saturation pressure exists)…
    expect(pureSaturation(pm, pm.Tc - 0.5).p).toBeGreaterThan(0);
    // …but the stated Tc is below: one phase at the model's pressure for that density.
    // (Densities outside the cubic's dome, where its one stable root is continuous in p.)
    expectOnePhase(p, pm.Tc - 0.5, 450);
    expectOnePhase(p, pm.Tc - 1, 30);
  });

  it('within 0.05 K below the stated Tc, a saturation that cannot be found means one phase', () => {
    // Stated Tc 0.03 K above the cubic's: at Tc + 0.01 K the cubic has one root only.
    expect(() => pureSaturation(pm, pm.Tc + 0.01)).toThrow(ConvergenceError);
    const c = expectOnePhase(withStatedTc(pm.Tc + 0.03), pm.Tc + 0.01, 400);
    expect([c.liquidFraction, c.rhoV]).toEqual([1, null]);
    // Exactly 0.05 K below the stated Tc still counts as within.
    const q = withStatedTc(pm.Tc + 0.0625);
    const Tq = q.components[0]!.Tc - 0.05;
    const d = expectOnePhase(q, Tq, 100);
    expect([d.liquidFraction, d.rhoL]).toEqual([0, null]);
  });

  it('more than 0.05 K below the stated Tc, a failed saturation is reported, not guessed', () => {
    const p = withStatedTc(pm.Tc + 1);
    expect(() => closedTankState(p, pm.Tc + 0.5, 220)).toThrow(ConvergenceError);
    expect(() => closedTankState(p, pm.Tc + 0.5, 220)).toThrow(/pure saturation/);
  });
});

describe('blend (propane/n-butane 50/50), exactly at its borders', () => {
  const blend = resolveProduct({
    components: [
      { id: 'propane', moleFraction: 0.5 },
      { id: 'n-butane', moleFraction: 0.5 },
    ],
  });
  // At 283.15 K the bubble volume and at 293.15 K the dew volume are each M/ρ for some double ρ
  // (not every double is), so the border itself can be hit.
  const [Tb, Td] = [283.15, 293.15];
  const row = readTable('bubble.csv').find(
    (r) => r.mixture === 'propane0.50+n-butane0.50' && +r.T_K! === Tb,
  )!;
  const molarMass = (TT: number) => {
    const mx = mixtureAtT(blend, TT);
    return blend.z.reduce((s, zi, i) => s + zi * mx.M[i]!, 0);
  };
  /** A density whose molar volume M/ρ is exactly v (the doubles next to M/v tried in turn). */
  const densityFor = (M: number, v: number) => {
    const bits = new BigInt64Array(Float64Array.of(M / v).buffer)[0]!;
    for (let k = 0n; k <= 64n; k++)
      for (const b of [bits + k, bits - k]) {
        const rho = new Float64Array(BigInt64Array.of(b).buffer)[0]!;
        if (M / rho === v) return rho;
      }
    throw new Error('no density with that exact molar volume');
  };

  it('at the bubble point’s density: liquid-full at the bubble pressure (the safe side)', () => {
    const bubble = saturationPointAt(blend, Tb, 'bubble');
    const rho = densityFor(molarMass(Tb), bubble.vBulk);
    const c = closedTankState(blend, Tb, rho);
    expect(c.phase).toBe('liquid');
    expect(c.liquidFraction).toBe(1);
    checkClose({
      what: 'p at the bubble density',
      input: { Tb, rho },
      actual: c.pAbs,
      expected: bubble.p,
      rtol: 1e-9,
      kind: 'identity',
      source: 'continuity: the bubble pressure from saturationPointAt',
    });
    checkClose({
      what: 'p at the bubble density against GERG-2008',
      input: { Tb, rho },
      actual: c.pAbs,
      expected: +row.p_bubble_Pa!,
      rtol: TARGETS.bubble,
      kind: 'published',
      source: 'GERG-2008 (Kunz & Wagner 2012) via test/reference/bubble.csv',
    });
  });

  it('at the dew point’s density: vapour only at the dew pressure', () => {
    const dew = saturationPointAt(blend, Td, 'dew');
    const rho = densityFor(molarMass(Td), dew.vBulk);
    const c = closedTankState(blend, Td, rho);
    expect(c.phase).toBe('vapour');
    expect(c.liquidFraction).toBe(0);
    checkClose({
      what: 'p at the dew density',
      input: { Td, rho },
      actual: c.pAbs,
      expected: dew.p,
      rtol: 1e-9,
      kind: 'identity',
      source: 'continuity: the dew pressure from saturationPointAt',
    });
  });

  it('above its critical region, exactly at the pseudo-critical density: counted as filling the tank', () => {
    // Kay's rule (Kay 1936, Ind. Eng. Chem. 28, 1014) on the models' critical densities, summed
    // in the same order as the solver so that the border is hit exactly.
    const M = molarMass(440);
    const rhoPc =
      M / blend.components.reduce((s, m, i) => s + blend.z[i]! * (m.molarMass / m.rhoc), 0);
    const c = closedTankState(blend, 440, rhoPc);
    expect(c.phase).toBe('supercritical');
    expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([1, rhoPc, null, 0]);
    checkClose({
      what: 'v at the tank pressure',
      input: { rho: rhoPc },
      actual: phaseAt(mixtureAtT(blend, 440), c.pAbs, blend.z, 'stable').v,
      expected: M / rhoPc,
      rtol: 1e-10,
      kind: 'identity',
      source: 'the mixture model’s root at (T, p)',
    });
  });
});
