/**
 * The closed-tank (isochoric) solver, solvers/closedTank.ts, in each of its cases, against the
 * reference equations of state (test/reference/sat/propane.csv: Lemmon, McLinden & Wagner 2009,
 * J. Chem. Eng. Data 54, 3141; test/reference/bubble.csv: GERG-2008, Kunz & Wagner 2012,
 * J. Chem. Eng. Data 57, 3032), the ideal-gas limit, and balances recomputed by hand from the
 * returned phases (mass, components, equal fugacity from the fugacity function).
 */
import { describe, expect, it } from 'vitest';
import { resolveProduct } from '../../thermo/product.js';
import { closedTankState } from '../../thermo/solvers/closedTank.js';
import { mixtureAtT, phaseAt } from '../../thermo/solvers/mixture.js';
import { pureVolume } from '../../thermo/solvers/pure.js';
import { R_J_molK as R } from '../../thermo/constants.js';
import { checkClose } from '../helpers/check.js';
import { readTable, TARGETS } from '../reference/measure.js';

const propane = resolveProduct('propane');
const pm = propane.components[0]!;
const M = pm.molarMass;
const SAT = 'Lemmon, McLinden & Wagner 2009 via test/reference/sat/propane.csv';
const ref = readTable('sat/propane.csv').find((r) => +r.T_K! === 283.15)!;
const T = 283.15;
const [pRef, rhoLRef, rhoVRef] = [+ref.p_Pa!, +ref.rhoL_kg_m3!, +ref.rhoV_kg_m3!];

describe('closed tank, pure fluid', () => {
  it.each([0.05, 0.5, 0.95])(
    'two-phase at %f of the way from ρ_V to ρ_L: p_sat and the phase densities of the reference',
    (w) => {
      const rho = rhoVRef + w * (rhoLRef - rhoVRef);
      const c = closedTankState(propane, T, rho);
      const input = { T, rho };
      expect(c.phase).toBe('two-phase');
      checkClose({
        what: 'p',
        input,
        actual: c.pAbs,
        expected: pRef,
        rtol: TARGETS.psat,
        kind: 'fitted',
        source: SAT,
      });
      checkClose({
        what: 'ρ_L',
        input,
        actual: c.rhoL!,
        expected: rhoLRef,
        rtol: TARGETS.rhoL,
        kind: 'fitted',
        source: SAT,
      });
      checkClose({
        what: 'ρ_V',
        input,
        actual: c.rhoV!,
        expected: rhoVRef,
        rtol: TARGETS.rhoV,
        kind: 'fitted',
        source: SAT,
      });
      checkClose({
        what: 'liquid fraction',
        input,
        actual: c.liquidFraction,
        expected: w,
        atol: 0.01,
        kind: 'fitted',
        source: SAT + ' (lever rule on the reference densities)',
      });
      // Mass balance and the vapour's share of the mass, recomputed from the returned phases.
      checkClose({
        what: 'mass balance',
        input,
        actual: c.liquidFraction * c.rhoL! + (1 - c.liquidFraction) * c.rhoV!,
        expected: rho,
        rtol: 1e-12,
        kind: 'identity',
        source: 'mass balance',
      });
      checkClose({
        what: 'vapour mass fraction',
        input,
        actual: c.vapourMassFraction,
        expected: ((1 - c.liquidFraction) * c.rhoV!) / rho,
        rtol: 1e-12,
        kind: 'identity',
        source: 'mass of vapour ÷ total mass',
      });
      expect(c.x).toEqual([1]);
      expect(c.iterations).toBeGreaterThan(0);
    },
  );

  it('liquid-full: the pressure at which the liquid branch has the tank’s density, above p_sat', () => {
    for (const rho of [rhoLRef * 1.002, rhoLRef * 1.01, rhoLRef * 1.03]) {
      const c = closedTankState(propane, T, rho);
      expect(c.phase).toBe('liquid');
      expect(c.pAbs).toBeGreaterThan(pRef * (1 - TARGETS.psat));
      checkClose({
        what: 'v at the tank pressure',
        input: { rho },
        actual: pureVolume(pm, T, c.pAbs, 'liquid'),
        expected: M / rho,
        rtol: 1e-10,
        kind: 'identity',
        source: 'liquid root of the model at (T, p)',
      });
      expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction, c.iterations]).toEqual([
        1,
        rho,
        null,
        0,
        0,
      ]);
    }
  });

  it('vapour only: below p_sat, and the ideal gas at low density', () => {
    for (const rho of [0.9 * rhoVRef, 0.3 * rhoVRef, 1e-3]) {
      const c = closedTankState(propane, T, rho);
      expect(c.phase).toBe('vapour');
      expect(c.pAbs).toBeLessThan(pRef * (1 + TARGETS.psat));
      checkClose({
        what: 'v at the tank pressure',
        input: { rho },
        actual: pureVolume(pm, T, c.pAbs, 'vapour'),
        expected: M / rho,
        rtol: 1e-10,
        kind: 'identity',
        source: 'vapour root of the model at (T, p)',
      });
      expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([0, null, rho, 1]);
    }
    checkClose({
      what: 'ideal-gas limit',
      input: { rho: 1e-3 },
      actual: closedTankState(propane, T, 1e-3).pAbs,
      expected: (1e-3 * R * T) / M,
      rtol: 1e-4,
      kind: 'identity',
      source: 'p = ρRT/M as ρ → 0',
    });
  });

  it('above Tc: one phase; "liquid" fraction 1 at or above the reference critical density, 0 below', () => {
    // Reference critical density 220.478 kg/m³ (test/reference/fluids.csv).
    for (const [rho, dense] of [
      [400, true],
      [221, true],
      [219, false],
      [20, false],
    ] as const) {
      const c = closedTankState(propane, 400, rho);
      expect(c.phase).toBe('supercritical');
      expect(c.liquidFraction).toBe(dense ? 1 : 0);
      expect(c.rhoL).toBe(dense ? rho : null);
      expect(c.rhoV).toBe(dense ? null : rho);
      expect(c.vapourMassFraction).toBe(dense ? 0 : 1);
      checkClose({
        what: 'v at the tank pressure',
        input: { rho },
        actual: pureVolume(pm, 400, c.pAbs, 'stable'),
        expected: M / rho,
        rtol: 1e-10,
        kind: 'identity',
        source: 'the model’s root at (T, p)',
      });
    }
  });

  it('within a few mK of Tc: a finite state, no error', () => {
    const c = closedTankState(propane, pm.Tc - 0.002, 220);
    expect(Number.isFinite(c.pAbs)).toBe(true);
    expect(c.pAbs).toBeGreaterThan(0.99 * pm.pc);
  });
});

describe('closed tank, blend (propane/n-butane 50/50)', () => {
  const blend = resolveProduct({
    components: [
      { id: 'propane', moleFraction: 0.5 },
      { id: 'n-butane', moleFraction: 0.5 },
    ],
  });
  const Tb = 293.15;
  const row = readTable('bubble.csv').find(
    (r) => r.mixture === 'propane0.50+n-butane0.50' && +r.T_K! === Tb,
  )!;
  const mx = mixtureAtT(blend, Tb);

  it('liquid-full just above the bubble-liquid density: at or above the GERG bubble pressure', () => {
    const rho = +row.rhoL_kg_m3! * 1.01;
    const c = closedTankState(blend, Tb, rho);
    expect(c.phase).toBe('liquid');
    // GERG-2008 via test/reference/bubble.csv, less the 2 % bubble-pressure target.
    expect(c.pAbs).toBeGreaterThan(+row.p_bubble_Pa! * 0.98);
    checkClose({
      what: 'v at the tank pressure',
      input: { rho },
      actual: phaseAt(mx, c.pAbs, blend.z, 'liquid').v,
      expected: blend.molarMass / rho,
      rtol: 1e-10,
      kind: 'identity',
      source: 'liquid root of the mixture model at (T, p)',
    });
    expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([1, rho, null, 0]);
    expect(c.x).toEqual([...blend.z]);
    expect(c.y).toEqual([...blend.z]);
  });

  it.each([0.1, 0.5, 0.9])(
    'two-phase at liquid fraction about %f: mass and component balances, equal fugacities, p within the GERG bubble pressure',
    (w) => {
      const rho = 10 + w * (+row.rhoL_kg_m3! - 10);
      const c = closedTankState(blend, Tb, rho);
      expect(c.phase).toBe('two-phase');
      // GERG-2008 via test/reference/bubble.csv, plus the 2 % bubble-pressure target.
      expect(c.pAbs).toBeLessThan(+row.p_bubble_Pa! * 1.02);
      const input = { Tb, rho };
      checkClose({
        what: 'mass balance',
        input,
        actual: c.liquidFraction * c.rhoL! + (1 - c.liquidFraction) * c.rhoV!,
        expected: rho,
        rtol: 1e-6,
        kind: 'identity',
        source: 'mass balance from the returned phases',
      });
      // Moles per unit volume of each phase from the returned densities and compositions.
      const Mof = (x: number[]) =>
        x.reduce((s, xi, i) => s + xi * blend.components[i]!.molarMass, 0);
      const nL = (c.liquidFraction * c.rhoL!) / Mof(c.x);
      const nV = ((1 - c.liquidFraction) * c.rhoV!) / Mof(c.y);
      blend.z.forEach((zi, i) =>
        checkClose({
          what: `component ${i} balance`,
          input,
          actual: (nL * c.x[i]! + nV * c.y[i]!) / (nL + nV),
          expected: zi,
          rtol: 1e-6,
          kind: 'identity',
          source: 'component balance recomputed from the phases',
        }),
      );
      checkClose({
        what: 'vapour mass fraction',
        input,
        actual: c.vapourMassFraction,
        expected: ((1 - c.liquidFraction) * c.rhoV!) / rho,
        rtol: 1e-6,
        kind: 'identity',
        source: 'mass of vapour ÷ total mass',
      });
      const L = phaseAt(mx, c.pAbs, c.x, 'liquid');
      const V = phaseAt(mx, c.pAbs, c.y, 'vapour');
      for (let i = 0; i < 2; i++)
        expect(
          Math.abs(Math.log(c.x[i]!) + L.lnPhi[i]! - Math.log(c.y[i]!) - V.lnPhi[i]!),
        ).toBeLessThan(1e-8);
      checkClose({
        what: 'ρ_L of the returned liquid',
        input,
        actual: c.rhoL!,
        expected: Mof(c.x) / L.v,
        rtol: 1e-9,
        kind: 'identity',
        source: 'phaseAt at the liquid composition',
      });
    },
  );

  it('vapour only at low density: below the two-phase pressures, the ideal gas in the limit', () => {
    const c = closedTankState(blend, Tb, 1e-3);
    expect(c.phase).toBe('vapour');
    checkClose({
      what: 'ideal-gas limit',
      input: { rho: 1e-3 },
      actual: c.pAbs,
      expected: (1e-3 * R * Tb) / blend.molarMass,
      rtol: 1e-4,
      kind: 'identity',
      source: 'p = ρRT/M as ρ → 0',
    });
    expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([0, null, 1e-3, 1]);
  });

  it('above the blend’s critical region: one phase, dense above the pseudo-critical density', () => {
    // Kay's rule on the reference critical densities (220.5 and 228 kg/m³): about 225 kg/m³.
    for (const [rho, dense] of [
      [450, true],
      [60, false],
    ] as const) {
      const c = closedTankState(blend, 440, rho);
      expect(c.phase).toBe('supercritical');
      expect(c.liquidFraction).toBe(dense ? 1 : 0);
      expect(c.rhoL).toBe(dense ? rho : null);
      checkClose({
        what: 'v at the tank pressure',
        input: { rho },
        actual: phaseAt(mixtureAtT(blend, 440), c.pAbs, blend.z, 'stable').v,
        expected: blend.molarMass / rho,
        rtol: 1e-10,
        kind: 'identity',
        source: 'the mixture model’s root at (T, p)',
      });
    }
  });

  it('pressure rises with density across the dome', () => {
    let prev = 0;
    for (let rho = 5; rho < +row.rhoL_kg_m3! * 1.02; rho += 25) {
      const c = closedTankState(blend, Tb, rho);
      expect(c.pAbs, `rho ${rho}`).toBeGreaterThanOrEqual(prev);
      prev = c.pAbs;
    }
  });
});
