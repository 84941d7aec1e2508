/**
 * solvers/inverse.ts (pressure from volume) on volume functions whose inverse is known in
 * closed form: the ideal gas v = R·T/p, and a liquid-like branch v = v0·(1 − κ·ln(p/p0)) that
 * falls slowly with p, and the model's own liquid branch against the cubic's pressure.
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError } from '../../thermo/errors.js';
import { pressureForVolume } from '../../thermo/solvers/inverse.js';
import { checkClose } from '../helpers/check.js';

const R = 8.314462618;
const T = 300;
const ideal = (p: number) => (R * T) / p;

describe('pressureForVolume', () => {
  it.each([
    ['a good guess', 1e5, undefined, undefined],
    ['a guess 1000× too high', 1e8, undefined, undefined],
    ['a guess 1000× too low', 1e2, undefined, undefined],
    ['both bounds given', 1e5, 1e4, 1e6],
    ['the lower bound only', 1e5, 5e4, undefined],
    ['the upper bound only', 1e5, undefined, 5e5],
    ['an upper bound below the guess', 1e7, undefined, 5e5],
  ] as const)('ideal gas: p = RT/v from %s', (_, guess, lo, hi) => {
    const p = 123456.7;
    const r = pressureForVolume(ideal, ideal(p), guess, lo, hi);
    checkClose({
      what: 'p from v',
      input: { guess, lo, hi },
      actual: r.p,
      expected: p,
      rtol: 1e-11,
      kind: 'identity',
      source: 'ideal-gas law, p = R·T/v',
      why: 'residual |ln(v(p)/v)| ≤ 1e-12',
    });
    expect(r.iterations).toBeGreaterThan(0);
  });

  it('counts the bracket expansion in the iterations it reports', () => {
    const p = 123456.7;
    const near = pressureForVolume(ideal, ideal(p), p).iterations;
    const far = pressureForVolume(ideal, ideal(p), p * 1e6).iterations;
    // 1e6 ≈ e^13.8: at least nine steps of −1.5 in ln p before the bracket closes.
    expect(far - near).toBeGreaterThanOrEqual(9);
  });

  it('a slowly falling liquid-like branch: v = v0·(1 − κ·ln(p/p0))', () => {
    const v0 = 1e-4;
    const kappa = 1e-3;
    const p0 = 1e6;
    const vOf = (p: number) => v0 * (1 - kappa * Math.log(p / p0));
    for (const p of [2e6, 7e6, 3e7]) {
      const r = pressureForVolume(vOf, vOf(p), 1e6);
      checkClose({
        what: 'p from v, liquid-like',
        input: { p },
        actual: r.p,
        expected: p,
        rtol: 1e-7,
        kind: 'identity',
        source: 'inverse in closed form: p = p0·exp((1 − v/v0)/κ)',
        why: 'v changes by κ = 1e-3 per e-fold of p, so |Δln v| ≤ 1e-12 fixes p to ~1e-9',
      });
    }
  });

  it('a target volume that the bounds do not bracket is a ConvergenceError', () => {
    // v(1e4) < v target: no pressure in [1e4, 1e6] gives it.
    expect(() => pressureForVolume(ideal, ideal(1e3), 1e5, 1e4, 1e6)).toThrow(ConvergenceError);
    // v(1e6) > v target: the upper bound is too low. Both say so in their own words.
    expect(() => pressureForVolume(ideal, ideal(1e8), 1e5, 1e4, 1e6)).toThrow(
      /could not bracket the pressure/,
    );
    expect(() => pressureForVolume(ideal, ideal(1e3), 1e5, 1e4, 1e6)).toThrow(
      /could not bracket the pressure/,
    );
    // A branch that never reaches the target at any pressure: the expansion gives up.
    const flat = () => 1;
    expect(() => pressureForVolume(flat, 2, 1e5)).toThrow(ConvergenceError);
    expect(() => pressureForVolume(flat, 0.5, 1e5)).toThrow(ConvergenceError);
  });

  it('says which solver failed and why, with the smaller bracket residual', () => {
    // Bounds [1e4, 1e6] Pa and the volume of 1e3 Pa: ln(v(p)/v) at the bounds is −ln 10 and
    // −ln 1000 (ideal gas, by hand), so the residual reported is ln 10, after no expansion.
    let err: unknown;
    try {
      pressureForVolume(ideal, ideal(1e3), 1e5, 1e4, 1e6);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ConvergenceError);
    const e = err as ConvergenceError;
    expect(e.solver).toBe('pressure from volume');
    expect(e.message).toMatch(/could not bracket the pressure/);
    expect(e.iterations).toBe(0);
    checkClose({
      what: 'residual of the failed bracket',
      input: { lo: 1e4, hi: 1e6, target: 1e3 },
      actual: e.residual,
      expected: Math.log(10),
      rtol: 1e-12,
      kind: 'identity',
      source: 'ideal gas, by hand',
    });
  });

  it('a volume function that fails inside the bracket is reported under this solver’s name', () => {
    const broken = (p: number) => (p > 2e4 && p < 5e5 ? NaN : ideal(p));
    expect(() => pressureForVolume(broken, ideal(1e5), 1e5, 1e4, 1e6)).toThrow(
      /^pressure from volume did not converge/,
    );
  });

  it('accepts a bound that is itself the root', () => {
    const r = pressureForVolume(ideal, ideal(1e5), 3e5, 1e5, 1e6);
    expect(Math.abs(r.p / 1e5 - 1)).toBeLessThan(1e-11);
  });
});
