/** Published single values and facts of the trade, each with its source. */
import { describe, expect, it } from 'vitest';
import { listFluids, saturation } from '../../thermo/index.js';
import { fluidById } from '../../thermo/data/fluids.js';
import { readTable } from '../reference/measure.js';
import { checkClose } from '../helpers/check.js';
import { PSI_PA, toSI } from '../../thermo/units.js';

const F = (f: number) => toSI('temperature', f, 'F');
const PSI = PSI_PA;
const ATM_PSIA = 14.696;

describe('saturation (default model)', () => {
  it.each([
    ['propane', 174],
    ['isobutane', 58],
    ['n-butane', 37],
    ['propylene', 213],
  ] as const)(
    '%s at 100 °F matches the ASTM D2598 Table 1 vapour pressure (%i psig)',
    (id, psig) => {
      // Source: ASTM D2598 Table 1 (component vapour pressures at 100 °F used as blend factors),
      // public preview restated in the project's trade notes. Printed to whole psig (±0.5) plus the
      // model's 0.5 % target.
      const p = saturation(id, F(100)).pAbs / PSI - ATM_PSIA;
      checkClose({
        what: 'gauge vapour pressure at 100 °F',
        input: { id },
        actual: p,
        expected: psig,
        atol: 0.5 + 0.005 * (psig + ATM_PSIA),
        kind: 'published',
        source: 'ASTM D2598 Table 1',
      });
    },
  );

  it('isobutane boils at 45.3 psia at 70 °F and at 60 psia near 87.5 °F', () => {
    // common practice (trade figure quoted in the product requirements); 45.3 psia is printed to
    // 0.1 psia (0.2 %), 60 psia to whole psia: rtol 0.5 % + rounding.
    checkClose({
      what: 'isobutane p_sat at 70 °F',
      input: { T_F: 70 },
      actual: saturation('isobutane', F(70)).pAbs,
      expected: 312_500,
      rtol: 0.007,
      kind: 'published',
      source: 'common practice: 3.125 bar a (45.3 psia) at 21.1 °C',
    });
    checkClose({
      what: 'isobutane p_sat at 87.5 °F',
      input: { T_F: 87.5 },
      actual: saturation('isobutane', F(87.5)).pAbs,
      expected: 413_700,
      rtol: 0.01,
      kind: 'published',
      source: 'common practice: 4.137 bar a (60 psia) near 30.8 °C',
    });
  });

  it('carbon dioxide at its triple point has the triple-point pressure 517.96 kPa', () => {
    // Source: Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, 1509, triple point 216.592 K,
    // 0.51795 MPa. Tolerance: the model's 0.5 % vapour-pressure target.
    checkClose({
      what: 'CO2 triple-point pressure',
      input: { T: 216.592 },
      actual: saturation('carbon-dioxide', 216.592).pAbs,
      expected: 517_960,
      rtol: 0.005,
      kind: 'published',
      source: 'Span & Wagner 1996',
    });
  });

  it.each(
    listFluids()
      .filter((f) => fluidById(f.id)!.Tb !== null)
      .map((f) => f.id),
  )('%s boils at 101.325 kPa at its normal boiling point', (id) => {
    // Source: normal boiling point of each fluid's reference equation (test/reference/fluid-constants.csv,
    // Tb_K). For ethane and nitrous oxide this point is also a fit point (below the tables): there it is
    // a regression check. Tolerance: 0.5 % target (1 % below 233 K, outside the target range).
    const Tb = fluidById(id)!.Tb!;
    checkClose({
      what: 'p_sat at Tb',
      input: { id, Tb },
      actual: saturation(id, Tb).pAbs,
      expected: 101_325,
      rtol: Tb < 233.15 ? 0.01 : 0.005,
      kind: 'published',
      source: 'reference EOS normal boiling point, fluid-constants.csv',
    });
  });
});

describe("textbook models ('PR', 'SRK')", () => {
  it.each(['PR', 'SRK'] as const)(
    '%s reproduces the acentric factor at Tr = 0.7 within 0.005',
    (model) => {
      // Source: Pitzer's definition ω = −1 − log10(p_sat/pc) at Tr = 0.7; Soave (1972) and Peng &
      // Robinson (1976) fitted m(ω) to reproduce it. 0.005 in ω ≈ 1 % in p_sat (from memory).
      for (const f of listFluids()) {
        const T = 0.7 * f.Tc;
        if (T < f.Ttriple) continue;
        const omega = -1 - Math.log10(saturation(f.id, T, { model }).pAbs / f.Pc);
        checkClose({
          what: `${model} ω`,
          input: { id: f.id },
          actual: omega,
          expected: f.omega,
          atol: 0.005,
          kind: 'published',
          source: 'acentric-factor definition; m(ω) of the model paper',
        });
      }
    },
  );

  it('are untranslated: SRK liquid densities are several percent low, which is why the default model exists', () => {
    // regression: documents the textbook model's known weakness against the propane reference
    // table (Lemmon et al. 2009, test/reference/sat/propane.csv) — not a validation.
    const row = readTable('sat/propane.csv').find((r) => r.T_K === '293.15')!;
    const srk = saturation('propane', 293.15, { model: 'SRK' }).rhoL / +row.rhoL_kg_m3! - 1;
    const tuned = saturation('propane', 293.15).rhoL / +row.rhoL_kg_m3! - 1;
    expect(srk).toBeLessThan(-0.05);
    expect(Math.abs(tuned)).toBeLessThan(0.005);
    expect(saturation('propane', 293.15, { model: 'SRK' }).model).toBe('SRK');
  });
});
