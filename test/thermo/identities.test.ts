/**
 * Thermodynamic consistency of the solvers (identity checks: no external data). Each check
 * compares a solver's output with a quantity computed another way (the fugacity function, the
 * liquid or vapour root at the same state), never with the solver's output rebuilt.
 */
import { describe, expect, it } from 'vitest';
import {
  closedTank,
  liquidDensity,
  listFluids,
  maxDensity,
  saturation,
} from '../../thermo/index.js';
import { fluidById } from '../../thermo/data/fluids.js';
import { componentModel } from '../../thermo/eos/model.js';
import { compressibilityRoots, lnPhiPure } from '../../thermo/eos/cubic.js';
import { pureCoefficients, pureSaturation, pureVolume } from '../../thermo/solvers/pure.js';
import { resolveProduct } from '../../thermo/product.js';
import { flashPT, mixtureAtT, phaseAt, saturationPressure } from '../../thermo/solvers/mixture.js';
import { checkClose } from '../helpers/check.js';
import { R_J_molK as R } from '../../thermo/constants.js';

const FLUID_IDS = listFluids().map((f) => f.id);

describe('pureSaturation', () => {
  it.each(FLUID_IDS)(
    '%s: liquid and vapour fugacities are equal at the solution (|Δ ln φ| < 1e-10)',
    (id) => {
      const f = fluidById(id)!;
      const m = componentModel(f, 'tuned');
      for (const Tr of [0.45, 0.6, 0.75, 0.9, 0.98]) {
        const T = Math.max(Tr * f.Tc, f.Ttriple + 1);
        const s = pureSaturation(m, T);
        const k = pureCoefficients(m, T);
        const A = (k.a * s.p) / (R * R * T * T);
        const B = (k.b * s.p) / (R * T);
        const d = lnPhiPure(m.family, s.ZL, A, B) - lnPhiPure(m.family, s.ZV, A, B);
        expect(Math.abs(d), `${id} at ${T} K`).toBeLessThan(1e-10);
        expect(s.converged).toBe(true);
      }
    },
  );

  it.each(FLUID_IDS)(
    '%s: Clausius–Clapeyron dp/dT = Δh/(T·Δv) against a central difference (rtol 1e-5)',
    (id) => {
      const f = fluidById(id)!;
      const m = componentModel(f, 'tuned');
      for (const Tr of [0.6, 0.8, 0.95]) {
        const T = Tr * f.Tc;
        const h = 1e-3;
        const dpdT = (pureSaturation(m, T + h).p - pureSaturation(m, T - h).p) / (2 * h);
        const s = pureSaturation(m, T);
        // The cubic's own volumes: the volume correction is applied after equilibrium.
        const clapeyron = s.dHvap / (T * (s.vVCub - s.vLCub));
        checkClose({
          what: 'Clausius–Clapeyron',
          input: { id, T },
          actual: clapeyron,
          expected: dpdT,
          rtol: 1e-5,
          kind: 'identity',
          source: 'Clapeyron equation; finite difference h = 1 mK',
        });
      }
    },
  );

  it.each(FLUID_IDS)(
    '%s: p_sat rises and ρ_L falls monotonically from the triple point to Tc − 0.5 K',
    (id) => {
      const f = fluidById(id)!;
      let prev = { pAbs: 0, rhoL: Infinity, rhoV: 0 };
      for (let T = f.Ttriple; T <= f.Tc - 0.5; T += (f.Tc - 0.5 - f.Ttriple) / 200) {
        const s = saturation(id, T);
        expect(
          s.pAbs > prev.pAbs && s.rhoL < prev.rhoL && s.rhoV > prev.rhoV,
          `${id} at ${T} K`,
        ).toBe(true);
        prev = s;
      }
    },
  );
});

describe('closedTank', () => {
  it.each(FLUID_IDS)(
    '%s: two-phase densities equal the liquid and vapour roots at the tank pressure, and balance the mass',
    (id) => {
      const f = fluidById(id)!;
      const m = componentModel(f, 'tuned');
      const T = Math.min(0.85 * f.Tc, 320);
      const s = saturation(id, T);
      for (const w of [0.1, 0.5, 0.9]) {
        const rho = s.rhoV + w * (s.rhoL - s.rhoV);
        const c = closedTank(id, T, rho);
        expect(c.phase).toBe('two-phase');
        // Independent of the tank solver: the liquid density at (T, p) from `liquidDensity`
        // and the vapour root of the model at the same (T, p).
        const rhoL = liquidDensity(id, T, c.pAbs);
        const rhoV = f.molarMass / pureVolume(m, T, c.pAbs, 'vapour');
        const input = { id, T, rho };
        const why = 'p converged to |Δ ln φ| < 1e-10; the roots move little with p';
        checkClose({
          what: 'tank ρ_L',
          input,
          actual: c.rhoL!,
          expected: rhoL,
          rtol: 1e-7,
          kind: 'identity',
          source: 'liquidDensity(T, p) at the tank pressure',
          why,
        });
        checkClose({
          what: 'tank ρ_V',
          input,
          actual: c.rhoV!,
          expected: rhoV,
          rtol: 1e-6,
          kind: 'identity',
          source: 'vapour root of the model at (T, p)',
          why,
        });
        checkClose({
          what: 'closed-tank mass balance',
          input,
          actual: c.liquidFraction * rhoL + (1 - c.liquidFraction) * rhoV,
          expected: rho,
          rtol: 1e-6,
          kind: 'identity',
          source: 'mass balance with the independent densities',
        });
        // The pressure is the vapour pressure: liquid and vapour fugacities equal there.
        const k = pureCoefficients(m, T);
        const A = (k.a * c.pAbs) / (R * R * T * T);
        const B = (k.b * c.pAbs) / (R * T);
        const roots = compressibilityRoots(m.family, A, B);
        const d = lnPhiPure(m.family, roots[0]!, A, B) - lnPhiPure(m.family, roots.at(-1)!, A, B);
        expect(Math.abs(d), `${id} Δ ln φ at the tank pressure`).toBeLessThan(1e-8);
      }
    },
  );

  it.each(FLUID_IDS)(
    '%s: pressure rises with density along an isotherm, on both sides of the dome and above Tc',
    (id) => {
      const f = fluidById(id)!;
      for (const T of [Math.max(f.Ttriple + 5, 0.6 * f.Tc), 0.9 * f.Tc, 1.05 * f.Tc]) {
        let prev = -Infinity;
        const top = Math.min(2.6 * f.rhoc, maxDensity(id, T));
        for (let rho = 0.05 * f.rhoc; rho < top; rho += 0.02 * f.rhoc) {
          const c = closedTank(id, T, rho);
          expect(c.pAbs, `${id} T=${T} rho=${rho}`).toBeGreaterThanOrEqual(prev * (1 - 1e-12));
          prev = c.pAbs;
        }
      }
    },
  );

  it('is continuous at the liquid-full transition (pressure from both sides within 0.1 %)', () => {
    const id = 'propane';
    const T = 300;
    const s = saturation(id, T);
    const below = closedTank(id, T, s.rhoL * (1 - 1e-9));
    const above = closedTank(id, T, s.rhoL * (1 + 1e-9));
    expect(below.phase).toBe('two-phase');
    expect(above.phase).toBe('liquid');
    checkClose({
      what: 'p across liquid-full',
      input: { id, T },
      actual: above.pAbs,
      expected: below.pAbs,
      rtol: 1e-3,
      kind: 'identity',
      source: 'continuity',
    });
  });
});

describe('flashPT', () => {
  it('closes the component mass balance z = (1 − β)x + βy and equal fugacities', () => {
    const r = resolveProduct({
      components: [
        { id: 'propane', moleFraction: 0.6 },
        { id: 'n-butane', moleFraction: 0.3 },
        { id: 'ethane', moleFraction: 0.05 },
        { id: 'isobutane', moleFraction: 0.05 },
      ],
    });
    const T = 300;
    const mx = mixtureAtT(r, T);
    const bub = saturationPressure(mx, r.z, 'bubble');
    const dew = saturationPressure(mx, r.z, 'dew');
    const p = Math.sqrt(bub.p * dew.p);
    const f = flashPT(mx, r.z, p);
    expect(f.beta).toBeGreaterThan(0);
    expect(f.beta).toBeLessThan(1);
    // Equal fugacities, from the mixture fugacity function at the flash's phase compositions
    // (not from the flash's own K): ln(x_i·φ_i^L) = ln(y_i·φ_i^V).
    const L = phaseAt(mx, p, f.x, 'liquid');
    const V = phaseAt(mx, p, f.y, 'vapour');
    expect(V.Z - L.Z, 'distinct liquid and vapour roots').toBeGreaterThan(0.1);
    r.z.forEach((_, i) => {
      const lnfL = Math.log(f.x[i]!) + L.lnPhi[i]!;
      const lnfV = Math.log(f.y[i]!) + V.lnPhi[i]!;
      expect(Math.abs(lnfL - lnfV), `Δ ln f of component ${i}`).toBeLessThan(1e-8);
    });
    r.z.forEach((zi, i) => {
      checkClose({
        what: 'flash mass balance',
        input: { T, p, i },
        actual: (1 - f.beta) * f.x[i]! + f.beta * f.y[i]!,
        expected: zi,
        rtol: 1e-9,
        kind: 'identity',
        source: 'component balance',
      });
    });
  });
});
