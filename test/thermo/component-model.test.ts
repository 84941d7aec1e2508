/**
 * componentModel (eos/model.ts): a_c, b, α and the critical volume of each model against the
 * published constants of its family, the tuned model's critical density against the reference
 * equations of state (test/reference/fluids.csv), and the choice of model for a fluid without
 * fitted parameters.
 */
import { describe, expect, it } from 'vitest';
import { fluidById } from '../../thermo/data/fluids.js';
import { componentModel } from '../../thermo/eos/model.js';
import { NO_CORRECTION } from '../../thermo/eos/volumeCorrection.js';
import { checkClose } from '../helpers/check.js';
import { readTable } from '../reference/measure.js';

const R = 8.314462618; // CODATA 2018
const PR_SRC = 'Peng & Robinson 1976, Ind. Eng. Chem. Fundam. 15, 59–64, eqs. 9–11, 17–18';
const SRK_SRC =
  'Soave 1972, Chem. Eng. Sci. 27, 1197–1203, eqs. 7–8, 16 (Ωa = 0.42748, Ωb = 0.08664)';

// Printed constants (5 decimals: atol half a unit in the last place, relative ~1e-4).
const FAMILIES = [
  { model: 'PR', omegaA: 0.45724, omegaB: 0.0778, Zc: 0.307, src: PR_SRC },
  { model: 'SRK', omegaA: 0.42748, omegaB: 0.08664, Zc: 1 / 3, src: SRK_SRC },
] as const;
const mPR = (w: number) => 0.37464 + 1.54226 * w - 0.26992 * w * w; // PR 1976 eq. 18
const mSRK = (w: number) => 0.48 + 1.574 * w - 0.176 * w * w; // Soave 1972 eq. 16

describe('componentModel: the textbook families', () => {
  it.each(['propane', 'ammonia', 'r134a'])(
    '%s: a_c, b, v_c and ρ_c from the printed Ωa, Ωb, Zc',
    (id) => {
      const f = fluidById(id)!;
      for (const fam of FAMILIES) {
        const m = componentModel(f, fam.model);
        const input = { id, model: fam.model };
        expect(m.model).toBe(fam.model);
        expect(m.family.name).toBe(fam.model);
        checkClose({
          what: 'a_c',
          input,
          actual: m.ac,
          expected: (fam.omegaA * R * R * f.Tc * f.Tc) / f.pc,
          rtol: 2e-5,
          kind: 'published',
          source: fam.src,
          why: 'Ωa printed to 5 decimals',
        });
        checkClose({
          what: 'b',
          input,
          actual: m.b,
          expected: (fam.omegaB * R * f.Tc) / f.pc,
          rtol: 1e-4,
          kind: 'published',
          source: fam.src,
          why: 'Ωb printed to 4–5 decimals',
        });
        checkClose({
          what: 'critical volume of the cubic',
          input,
          actual: m.vcCub,
          expected: (fam.Zc * R * f.Tc) / f.pc,
          rtol: 2e-3,
          kind: 'published',
          source: fam.src,
          why: 'PR Zc printed as 0.307',
        });
        checkClose({
          what: 'ρ_c of the untranslated cubic = M/v_c',
          input,
          actual: m.rhoc,
          expected: (f.molarMass * f.pc) / (fam.Zc * R * f.Tc),
          rtol: 2e-3,
          kind: 'published',
          source: fam.src,
        });
        expect(m.correction).toBe(NO_CORRECTION);
        expect([m.id, m.Tc, m.pc, m.omega, m.molarMass]).toEqual([
          f.id,
          f.Tc,
          f.pc,
          f.omega,
          f.molarMass,
        ]);
      }
    },
  );

  it.each(['propane', 'ammonia', 'r134a'])(
    '%s: α(T) is Soave’s form with each family’s m(ω)',
    (id) => {
      const f = fluidById(id)!;
      for (const [model, mOf, src] of [
        ['PR', mPR, PR_SRC],
        ['SRK', mSRK, SRK_SRC],
      ] as const) {
        const m = componentModel(f, model);
        for (const Tr of [0.5, 0.8, 1, 1.3]) {
          const T = Tr * f.Tc;
          const want = (1 + mOf(f.omega) * (1 - Math.sqrt(Tr))) ** 2;
          checkClose({
            what: 'α',
            input: { id, model, Tr },
            actual: m.alpha(T).alpha,
            expected: want,
            rtol: 1e-12,
            kind: 'published',
            source: src,
          });
        }
      }
    },
  );
});

describe('componentModel: the tuned model', () => {
  const ref = readTable('fluids.csv');
  it.each(['propane', 'n-butane', 'ammonia', 'carbon-dioxide', 'r134a'])(
    '%s: the critical density is the reference equation’s',
    (id) => {
      const row = ref.find((r) => r.fluid === id)!;
      const m = componentModel(fluidById(id)!, 'tuned');
      expect(m.model).toBe('tuned');
      expect(m.family.name).toBe('PR');
      checkClose({
        what: 'tuned ρ_c',
        input: { id },
        actual: m.rhoc,
        expected: Number(row.rhoc_eos_kg_m3),
        rtol: 1e-4,
        kind: 'published',
        why: 'the compiled constants round some critical densities to 4 figures',
        source: `reference equation of state ${row.eos_bibtex_key} (test/reference/fluids.csv)`,
      });
    },
  );

  it('a fluid with no fitted parameters gets plain Peng–Robinson under `tuned`', () => {
    const spec = { id: 'no-such-fluid', molarMass: 0.05, Tc: 400, pc: 4e6, omega: 0.2 };
    const m = componentModel(spec, 'tuned');
    expect(m.model).toBe('PR');
    expect(m.correction).toBe(NO_CORRECTION);
    checkClose({
      what: 'α of the fallback',
      input: spec,
      actual: m.alpha(300).alpha,
      expected: (1 + mPR(0.2) * (1 - Math.sqrt(300 / 400))) ** 2,
      rtol: 1e-12,
      kind: 'published',
      source: PR_SRC,
    });
  });

  it('an override with Mathias–Copeman (m, 0, 0) and no correction is Peng–Robinson', () => {
    // Mathias & Copeman 1983 (Fluid Phase Equilib. 13, 91): with c2 = c3 = 0 their α is
    // Soave's form with m = c1, below Tc and above.
    const f = fluidById('propane')!;
    const m = componentModel(f, 'tuned', {
      mathiasCopeman: [mPR(f.omega), 0, 0],
      volume: NO_CORRECTION,
    });
    expect(m.model).toBe('tuned');
    expect(m.correction).toBe(NO_CORRECTION);
    for (const T of [200, 300, 400]) {
      checkClose({
        what: 'α of the override',
        input: { T },
        actual: m.alpha(T).alpha,
        expected: (1 + mPR(f.omega) * (1 - Math.sqrt(T / f.Tc))) ** 2,
        rtol: 1e-12,
        kind: 'published',
        source: 'Mathias & Copeman 1983 with c2 = c3 = 0; ' + PR_SRC,
      });
    }
  });
});
