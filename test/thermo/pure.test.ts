/**
 * solvers/pure.ts against quantities computed outside the solver:
 * - held-out saturation states (test/reference/trade/saturation_properties.csv, whole-°F rows
 *   at least 0.5 K from the 5 K rows of test/reference/sat/ the models were fitted to;
 *   derived from the published reference equations named in the table's `# source:` line);
 * - the Clapeyron equation dp/dT = Δh_vap/(T·Δv), exact for any equation of state: Δh_vap
 *   and the cubic's volumes from the solver against a central difference of its own p_sat;
 * - equal fugacity recomputed with the fugacity function `lnPhiPure` of eos/cubic.ts at the
 *   returned pressure, and the returned Z checked as roots of the cubic there.
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { readCsv } from '../../scripts/lib/csv.js';
import { R_J_molK as R } from '../../thermo/constants.js';
import { fluidById } from '../../thermo/data/fluids.js';
import { compressibilityRoots, lnPhiPure } from '../../thermo/eos/cubic.js';
import { componentModel, type ModelId } from '../../thermo/eos/model.js';
import { ConvergenceError } from '../../thermo/errors.js';
import { pureCoefficients, pureSaturation, pureZ } from '../../thermo/solvers/pure.js';
import { toSI } from '../../thermo/units.js';
import { checkClose } from '../helpers/check.js';
import { readTable, TARGETS } from '../reference/measure.js';

const TRADE = 'test/reference/trade/saturation_properties.csv (held out of the fit)';
const IDS: Record<string, string> = {
  propane: 'propane',
  'n-butane': 'n-butane',
  isobutane: 'isobutane',
  ammonia: 'ammonia',
  R134a: 'r134a',
  R22: 'r22',
};

/** Whole-°F rows of the trade table at least 0.5 K from every fitted 5 K row, below 0.97·Tc. */
function heldOut(id: string) {
  const fitted = readTable(`sat/${id}.csv`).map((r) => +r.T_K!);
  const url = new URL('../reference/trade/saturation_properties.csv', import.meta.url);
  return readCsv(fileURLToPath(url))
    .filter((r) => IDS[r.fluid!] === id)
    .map((r) => ({
      T: toSI('temperature', Number(r.T_F), 'F'),
      p: Number(r.p_sat_kPa_abs) * 1000,
      rhoL: Number(r.rho_liq_kg_m3),
      rhoV: Number(r.rho_vap_kg_m3),
    }))
    .filter((r) => r.T < 0.97 * fluidById(id)!.Tc)
    .filter((r) => fitted.every((Tk) => Math.abs(Tk - r.T) >= 0.5));
}

describe('pureSaturation at held-out temperatures (not in the fit)', () => {
  it.each(Object.values(IDS))(
    '%s (tuned): p_sat, ρ_L within 0.5 %, ρ_V within 2 %, in a few Newton steps',
    (id) => {
      const f = fluidById(id)!;
      const m = componentModel(f, 'tuned');
      const rows = heldOut(id);
      expect(rows.length, 'held-out rows').toBeGreaterThan(5);
      for (const r of rows) {
        const s = pureSaturation(m, r.T);
        const input = { id, T: r.T };
        const why = 'README accuracy targets';
        checkClose({
          what: 'p_sat',
          input,
          actual: s.p,
          expected: r.p,
          rtol: TARGETS.psat,
          kind: 'published',
          source: TRADE,
          why,
        });
        checkClose({
          what: 'ρ_L',
          input,
          actual: f.molarMass / s.vL,
          expected: r.rhoL,
          rtol: TARGETS.rhoL,
          kind: 'published',
          source: TRADE,
          why,
        });
        checkClose({
          what: 'ρ_V',
          input,
          actual: f.molarMass / s.vV,
          expected: r.rhoV,
          rtol: TARGETS.rhoV,
          kind: 'published',
          source: TRADE,
          why,
        });
        // Newton in ln p from Wilson's estimate converges quadratically well below Tc: a
        // handful of steps (Wilson is within a factor ~2 of p_sat here).
        expect(s.iterations, `steps at ${r.T} K`).toBeLessThanOrEqual(8);
      }
    },
  );
});

describe('pureSaturation: Newton from Wilson’s estimate', () => {
  it('converges in at most 6 steps from 0.45·Tc to 0.97·Tc, seven fluids, three models', () => {
    // Newton in ln p converges quadratically; Wilson's estimate starts within a factor of about
    // 2 of p_sat, so a handful of steps suffice (measured 3–4 on this grid). A safeguard
    // (bisection, a bracket end) taken by mistake shows as many more steps.
    for (const id of [
      'propane',
      'n-butane',
      'isobutane',
      'ammonia',
      'r134a',
      'r22',
      'carbon-dioxide',
    ])
      for (const model of ['tuned', 'PR', 'SRK'] as const) {
        const f = fluidById(id)!;
        const m = componentModel(f, model);
        for (let T = 0.45 * f.Tc; T < 0.97 * f.Tc; T += 0.04 * f.Tc) {
          const s = pureSaturation(m, T);
          expect(s.iterations, `${id} ${model} ${T} K`).toBeLessThanOrEqual(6);
          expect(s.p).toBeLessThan(f.pc);
        }
      }
  });
});

describe('pureSaturation: the Clapeyron equation and equal fugacity', () => {
  const cases: [string, ModelId, number][] = [
    ['propane', 'tuned', 231.3],
    ['propane', 'tuned', 301.7],
    ['propane', 'PR', 262.4],
    ['n-butane', 'SRK', 333.3],
    ['ammonia', 'tuned', 288.8],
    ['r134a', 'tuned', 355.5],
  ];

  it.each(cases)('%s (%s) at %f K: Δh_vap = T·Δv·dp_sat/dT', (id, model, T) => {
    // Clapeyron (exact for any equation of state): the solver's Δh_vap, from residual
    // enthalpies, against its own saturation curve differentiated numerically and the cubic's
    // own volumes (the volume correction is applied after equilibrium and is not part of it).
    const m = componentModel(fluidById(id)!, model);
    const h = 0.01;
    const s = pureSaturation(m, T);
    const dpdT = (pureSaturation(m, T + h).p - pureSaturation(m, T - h).p) / (2 * h);
    checkClose({
      what: 'Δh_vap',
      input: { id, model, T },
      actual: s.dHvap,
      expected: T * (s.vVCub - s.vLCub) * dpdT,
      rtol: 1e-6,
      kind: 'identity',
      source: 'Clapeyron equation, central difference ±0.01 K (truncation ~1e-9)',
    });
    expect(s.dHvap).toBeGreaterThan(0);
  });

  it.each(cases)(
    '%s (%s) at %f K: equal ln φ from the fugacity function, Z = pv/RT',
    (id, model, T) => {
      const m = componentModel(fluidById(id)!, model);
      const s = pureSaturation(m, T);
      const k = pureCoefficients(m, T);
      const A = (k.a * s.p) / (R * R * T * T);
      const B = (k.b * s.p) / (R * T);
      const roots = compressibilityRoots(m.family, A, B);
      expect(roots).toHaveLength(3);
      expect(s.ZL).toBe(roots[0]);
      expect(s.ZV).toBe(roots[2]);
      const g = lnPhiPure(m.family, s.ZL, A, B) - lnPhiPure(m.family, s.ZV, A, B);
      expect(Math.abs(g), 'ln φ_L − ln φ_V').toBeLessThan(1e-12);
      expect(s.residual).toBe(Math.abs(g));
      checkClose({
        what: 'v_L,cub',
        input: T,
        actual: s.vLCub,
        expected: (s.ZL * R * T) / s.p,
        rtol: 1e-15,
        kind: 'identity',
        source: 'Z = pv/RT',
      });
      checkClose({
        what: 'v_V,cub',
        input: T,
        actual: s.vVCub,
        expected: (s.ZV * R * T) / s.p,
        rtol: 1e-15,
        kind: 'identity',
        source: 'Z = pv/RT',
      });
    },
  );
});

describe('pureSaturation and pureZ: starts and input outside the model', () => {
  it('a start at or above 1.5·pc is replaced by 0.99·pc: the same steps and the same pressure', () => {
    // No saturation pressure exceeds pc, so a start above the bracket's top carries no
    // information; the solver restarts just below pc, whatever the start was.
    const m = componentModel(fluidById('propane')!, 'tuned');
    for (const T of [200, 300]) {
      const ref = pureSaturation(m, T, m.pc * 0.99);
      for (const g of [m.pc * 1.5, m.pc * 3, 1e12]) {
        const s = pureSaturation(m, T, g);
        expect(s.p, `T ${T}, start ${g}`).toBe(ref.p);
        expect(s.iterations, `T ${T}, start ${g}`).toBe(ref.iterations);
      }
    }
  });

  it('a pressure that is not a number: an error, never a silent NaN', () => {
    const m = componentModel(fluidById('propane')!, 'tuned');
    const k = pureCoefficients(m, 300);
    expect(() => pureZ(m, k, 300, NaN, 'stable')).toThrow(ConvergenceError);
    expect(() => pureZ(m, k, 300, NaN, 'liquid')).toThrow(
      'cubic roots did not converge: no root above the co-volume',
    );
  });
});
