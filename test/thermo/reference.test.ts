/**
 * The default model against reference tables computed from each fluid's published reference
 * equation of state (test/reference/README.md lists the papers). Ranges and targets are the
 * product's accuracy requirements: −40 °C … +50 °C (capped at 0.97·Tc), p_sat 0.5 %,
 * ρ_L 0.5 %, ρ_V 2 %, compressed liquid 1 % (p_sat + 1 and + 5 MPa), liquid-full temperature
 * 1 K. The tables carry 0.01–0.1 % uncertainty of their own, far inside these tolerances.
 * These are the rows scripts/fit-fluids.ts fits the model's parameters to (kind `fitted`): they
 * show how well the fit holds, not a prediction. Points held out of the fit are checked in
 * held-out.test.ts.
 */
import { describe, it } from 'vitest';
import { closedTank, liquidDensity, saturation } from '../../thermo/index.js';
import { checkClose } from '../helpers/check.js';
import {
  liquidFullT,
  readTable,
  REFERENCE_FLUIDS,
  TARGETS,
  targetRange,
} from '../reference/measure.js';
import { fluidById } from '../../thermo/data/fluids.js';
import { citation } from '../../thermo/data/sources.js';

const paper = (id: string) =>
  `${citation(readTable('fluids.csv').find((r) => r.fluid === id)!.eos_bibtex_key!)} (reference EOS, table in test/reference)`;

describe.each(REFERENCE_FLUIDS)('%s', (id) => {
  const [lo, hi] = targetRange(id);
  const sat = readTable(`sat/${id}.csv`).filter(
    (r) => +r.T_K! >= lo - 1e-9 && +r.T_K! <= hi + 1e-9,
  );
  const liq = readTable(`liquid/${id}.csv`).filter(
    (r) => +r.T_K! >= lo - 1e-9 && +r.T_K! <= hi + 1e-9,
  );

  it('saturation matches p_sat, ρ_L and ρ_V of the reference table over the target range', () => {
    for (const r of sat) {
      const T = +r.T_K!;
      const s = saturation(id, T);
      const src = `${paper(id)}/sat/${id}.csv`;
      checkClose({
        what: 'saturation().p',
        input: { id, T },
        actual: s.pAbs,
        expected: +r.p_Pa!,
        rtol: TARGETS.psat,
        kind: 'fitted',
        source: src,
      });
      checkClose({
        what: 'saturation().rhoL',
        input: { id, T },
        actual: s.rhoL,
        expected: +r.rhoL_kg_m3!,
        rtol: TARGETS.rhoL,
        kind: 'fitted',
        source: src,
      });
      checkClose({
        what: 'saturation().rhoV',
        input: { id, T },
        actual: s.rhoV,
        expected: +r.rhoV_kg_m3!,
        rtol: TARGETS.rhoV,
        kind: 'fitted',
        source: src,
      });
    }
  });

  it('liquidDensity matches the compressed-liquid table within 1 %', () => {
    for (const r of liq) {
      const T = +r.T_K!;
      const p = +r.p_Pa!;
      checkClose({
        what: 'liquidDensity()',
        input: { id, T, p },
        actual: liquidDensity(id, T, p),
        expected: +r.rho_kg_m3!,
        rtol: TARGETS.compressed,
        kind: 'fitted',
        source: `${paper(id)}/liquid/${id}.csv`,
      });
    }
  });

  const lf = readTable('liquid-full.csv').filter(
    (r) => r.fluid === id && r.transition === 'liquid-full',
  );
  if (lf.length > 0)
    it('closedTank goes liquid-full within 1 K of the reference temperature', () => {
      for (const r of lf) {
        const Tref = +r.T_transition_K!;
        const rho = +r.rho_overall_kg_m3!;
        const T = liquidFullT(id, rho, Tref - 15, Math.min(Tref + 15, fluidById(id)!.Tc + 20));
        checkClose({
          what: 'liquid-full temperature',
          input: { id, rho },
          actual: T,
          expected: Tref,
          atol: TARGETS.liquidFullK,
          kind: 'fitted',
          source: `${paper(id)}/liquid-full.csv`,
        });
        // Past the transition the tank is liquid-full: the state must say so.
        const after = closedTank(id, Tref + 2, rho);
        if (
          after.phase !== 'supercritical' &&
          (after.phase !== 'liquid' || after.liquidFraction !== 1)
        ) {
          throw new Error(
            `closedTank(${id}, ${Tref + 2}, ${rho}) should be liquid-full, got ${after.phase}`,
          );
        }
      }
    });
});
