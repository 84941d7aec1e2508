/**
 * The closed-tank solver's guards (solvers/closedTank.ts), which the real models never trip:
 * here the pressure-from-volume solver and the blend saturation solver are wrapped so that they
 * fail in a chosen way, and the solver must either report the failure or fall back to a state
 * that the model's own root at the returned pressure confirms (pureVolume, phaseAt), never turn
 * a failure into a confident answer.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ConvergenceError } from '../../thermo/errors.js';
import { resolveProduct } from '../../thermo/product.js';
import { closedTankState } from '../../thermo/solvers/closedTank.js';
import { mixtureAtT, phaseAt, saturationPointAt } from '../../thermo/solvers/mixture.js';
import { pureSaturation } from '../../thermo/solvers/pure.js';
import { checkClose } from '../helpers/check.js';

const hooks = vi.hoisted(() => ({
  /** Factor applied to every pressure the pressure-from-volume solver returns. */
  pFactor: 1,
  /** The bounds [pLo, pHi] of each pressure-from-volume search. */
  bounds: [] as [number | undefined, number | undefined][],
  /** An error thrown instead of the saturation point of that kind. */
  fail: undefined as undefined | { kind: 'bubble' | 'dew'; error: () => Error },
}));

vi.mock('../../thermo/solvers/inverse.js', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../thermo/solvers/inverse.js')>();
  return {
    ...real,
    pressureForVolume: (...args: Parameters<typeof real.pressureForVolume>) => {
      hooks.bounds.push([args[3], args[4]]);
      const r = real.pressureForVolume(...args);
      return { ...r, p: r.p * hooks.pFactor };
    },
  };
});

vi.mock('../../thermo/solvers/mixture.js', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../thermo/solvers/mixture.js')>();
  return {
    ...real,
    saturationPointAt: (...args: Parameters<typeof real.saturationPointAt>) => {
      if (hooks.fail?.kind === args[2]) throw hooks.fail.error();
      return real.saturationPointAt(...args);
    },
  };
});

afterEach(() => {
  hooks.pFactor = 1;
  hooks.fail = undefined;
  hooks.bounds.length = 0;
});

const propane = resolveProduct('propane');
const pm = propane.components[0]!;
const T = 283.15;

describe('pure fluid: a single-phase pressure on the wrong side of p_sat', () => {
  it('liquid-full: a pressure below p_sat beyond round-off is an error, not clamped', () => {
    const sat = pureSaturation(pm, T);
    hooks.pFactor = 1 - 1e-6;
    let err: unknown;
    try {
      // At ρ = ρ_L the solver lands on p_sat itself; moved down by 1e-6 relative.
      closedTankState(propane, T, pm.molarMass / sat.vL);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ConvergenceError);
    const c = err as ConvergenceError;
    expect(c.message).toMatch(
      /^closed tank did not converge: single-phase pressure .* Pa on the wrong side of p_sat = .* Pa at T = 283.15 K/,
    );
    checkClose({
      what: 'reported miss',
      input: { T },
      actual: c.residual,
      expected: 1e-6,
      rtol: 1e-3,
      kind: 'identity',
      source: 'the relative miss put in: (p_sat − p)/p_sat with p = p_sat·(1 − 1e-6)',
    });
  });

  it('vapour only: a pressure above p_sat beyond round-off is an error', () => {
    const sat = pureSaturation(pm, T);
    hooks.pFactor = 1 + 1e-6;
    expect(() => closedTankState(propane, T, pm.molarMass / sat.vV)).toThrow(/wrong side of p_sat/);
  });

  it('a round-off miss (below 1e-9) is snapped onto p_sat: up for the liquid, down for the vapour', () => {
    const sat = pureSaturation(pm, T);
    // At the saturated densities the solver lands on p_sat itself; a miss of 5e-10 is round-off.
    hooks.pFactor = 1 - 5e-10;
    const liquid = closedTankState(propane, T, pm.molarMass / sat.vL);
    expect(liquid.phase).toBe('liquid');
    expect(liquid.pAbs).toBeGreaterThanOrEqual(sat.p);
    expect(liquid.pAbs / sat.p - 1).toBeLessThan(1e-12);
    hooks.pFactor = 1 + 5e-10;
    const vapour = closedTankState(propane, T, pm.molarMass / sat.vV);
    expect(vapour.phase).toBe('vapour');
    expect(vapour.pAbs).toBeLessThanOrEqual(sat.p);
    expect(1 - vapour.pAbs / sat.p).toBeLessThan(1e-12);
  });
});

describe('blend: a saturation point that cannot be found', () => {
  const blend = resolveProduct({
    components: [
      { id: 'propane', moleFraction: 0.5 },
      { id: 'n-butane', moleFraction: 0.5 },
    ],
  });
  const Tb = 293.15;
  const notFound = () => new ConvergenceError('dew pressure', 'made to fail by the test', 0, NaN);

  it('a liquid-full blend is searched at or above its bubble pressure, a vapour-only one at or below its dew pressure', () => {
    // The single-phase pressure lies on that side of the saturation pressure; searching there
    // keeps the solver on the right branch of the model.
    const bubble = saturationPointAt(blend, Tb, 'bubble');
    const dew = saturationPointAt(blend, Tb, 'dew');
    hooks.bounds.length = 0;
    const liquid = closedTankState(blend, Tb, (blend.molarMass / bubble.vBulk) * 1.01);
    expect(liquid.phase).toBe('liquid');
    expect(hooks.bounds).toEqual([[bubble.p, undefined]]);
    hooks.bounds.length = 0;
    const vapour = closedTankState(blend, Tb, (blend.molarMass / dew.vBulk) * 0.99);
    expect(vapour.phase).toBe('vapour');
    expect(hooks.bounds).toEqual([[undefined, dew.p]]);
  });

  it('no dew point (bubble point found): one phase at the model’s pressure for the density', () => {
    hooks.fail = { kind: 'dew', error: notFound };
    // A vapour-like density (below the dew density there), where the one-phase root is continuous.
    const rho = 5;
    const c = closedTankState(blend, Tb, rho);
    expect(c.phase).toBe('supercritical');
    expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([0, null, rho, 1]);
    checkClose({
      what: 'v at the tank pressure',
      input: { Tb, rho },
      actual: phaseAt(mixtureAtT(blend, Tb), c.pAbs, blend.z, 'stable').v,
      expected: blend.molarMass / rho,
      rtol: 1e-9,
      kind: 'identity',
      source: 'the mixture model’s root at (T, p)',
    });
  });

  it('no dew point near the critical region: dense at the pseudo-critical density (Kay’s rule)', () => {
    hooks.fail = { kind: 'dew', error: notFound };
    // At 400 K the bubble point still exists (its liquid is denser than the pseudo-critical
    // density) and the model has one root at every pressure, so the state is well defined.
    // Kay's rule (Kay 1936, Ind. Eng. Chem. 28, 1014) on the models' critical densities, summed
    // as the solver sums it so that the border itself is hit.
    const mx = mixtureAtT(blend, 400);
    const M = blend.z.reduce((s, zi, i) => s + zi * mx.M[i]!, 0);
    const rhoPc =
      M / blend.components.reduce((s, m, i) => s + blend.z[i]! * (m.molarMass / m.rhoc), 0);
    const c = closedTankState(blend, 400, rhoPc);
    expect(c.phase).toBe('supercritical');
    expect([c.liquidFraction, c.rhoL, c.rhoV, c.vapourMassFraction]).toEqual([1, rhoPc, null, 0]);
    checkClose({
      what: 'v at the tank pressure',
      input: { T: 400, rho: rhoPc },
      actual: phaseAt(mx, c.pAbs, blend.z, 'stable').v,
      expected: M / rhoPc,
      rtol: 1e-9,
      kind: 'identity',
      source: 'the mixture model’s root at (T, p)',
    });
  });

  it.each(['bubble', 'dew'] as const)(
    'a failure other than non-convergence in the %s point is passed on, not hidden',
    (kind) => {
      hooks.fail = { kind, error: () => new RangeError('not a convergence failure') };
      expect(() => closedTankState(blend, Tb, 100)).toThrow(RangeError);
    },
  );
});
