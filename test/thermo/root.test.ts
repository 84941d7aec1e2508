/**
 * The solver toolkit's root-finders against roots known in closed form (mathematical
 * constants), and their refusal to return a guess.
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError } from '../../thermo/errors.js';
import { bisectBoundary, bracketedRoot } from '../../thermo/solvers/root.js';
import { checkClose } from '../helpers/check.js';

/** ∛2, the real root of x³ − 2 (closed form; digits: OEIS A002580). */
const CUBE_ROOT_OF_2 = Math.cbrt(2);
/** The Dottie number, the root of cos x = x (OEIS A003957: 0.7390851332151606416…). */
const DOTTIE_NUMBER = 0.7390851332151606;
/** √2, OEIS A002193 (closed form). */
const SQRT_2 = Math.SQRT2;
/** e, the root of ln x = 1 (closed form). */
const EULER_E = Math.E;

// Tolerance: a few units in the last place of a double (the searches are asked for 1e-15).
const ULPS = 4e-16;

describe('bracketedRoot', () => {
  it('finds the cube root of 2 as the root of x³ − 2', () => {
    const r = bracketedRoot((x) => x ** 3 - 2, 0, 2, { name: 'cube root', xTol: 1e-15 });
    checkClose({
      what: '∛2',
      input: 'x³ − 2 on [0, 2]',
      actual: r.x,
      expected: CUBE_ROOT_OF_2,
      rtol: ULPS,
      kind: 'published',
      source: 'closed form ∛2 (OEIS A002580)',
    });
    expect(r.converged).toBe(true);
    expect(r.residual).toBeLessThan(1e-14);
    // Illinois keeps convergence superlinear: plain regula falsi would keep the x = 2 end for
    // dozens of steps on this convex function.
    expect(r.iterations).toBeLessThanOrEqual(15);
  });

  it('finds the Dottie number as the root of cos x − x', () => {
    const r = bracketedRoot((x) => Math.cos(x) - x, 0, 1, { name: 'Dottie', xTol: 1e-15 });
    checkClose({
      what: 'Dottie number',
      input: 'cos x − x on [0, 1]',
      actual: r.x,
      expected: DOTTIE_NUMBER,
      rtol: ULPS,
      kind: 'published',
      source: 'Dottie number, OEIS A003957',
    });
  });

  it('finds e as the root of ln x − 1 with the ends given in either order', () => {
    const r = bracketedRoot((x) => Math.log(x) - 1, 10, 1, { name: 'e', fTol: 1e-15 });
    checkClose({
      what: 'e',
      input: 'ln x − 1 on [10, 1]',
      actual: r.x,
      expected: EULER_E,
      rtol: ULPS,
      kind: 'published',
      source: 'closed form (ln e = 1)',
    });
  });

  it('closes the bracket on a flat root ((x − 1)⁹) by forcing bisection steps', () => {
    const r = bracketedRoot((x) => (x - 1) ** 9, 0, 3, { name: 'flat', xTol: 1e-12 });
    checkClose({
      what: 'root of (x − 1)⁹',
      input: '[0, 3]',
      actual: r.x,
      expected: 1,
      atol: 1e-12,
      kind: 'identity',
      source: 'closed form (x = 1)',
      why: 'the width asked for',
    });
  });

  it('uses the end values the caller gives instead of evaluating them', () => {
    let calls = 0;
    const f = (x: number) => {
      calls++;
      return x * x - 2;
    };
    const r = bracketedRoot(f, 1, 2, { name: 'sqrt2', fa: -1, fb: 2, xTol: 1e-15 });
    expect(calls).toBe(r.iterations);
    checkClose({
      what: '√2',
      input: 'x² − 2 on [1, 2]',
      actual: r.x,
      expected: SQRT_2,
      rtol: ULPS,
      kind: 'published',
      source: 'closed form √2 (OEIS A002193)',
    });
  });

  it('throws ConvergenceError when the ends do not bracket a root', () => {
    expect(() => bracketedRoot((x) => x * x + 1, -1, 1, { name: 'no root' })).toThrow(
      ConvergenceError,
    );
  });

  it('throws ConvergenceError rather than return a guess when the steps run out', () => {
    const run = () =>
      bracketedRoot((x) => Math.cos(x) - x, 0, 1, {
        name: 'too few steps',
        xTol: 1e-15,
        maxIterations: 3,
      });
    expect(run).toThrow(ConvergenceError);
    expect(run).toThrow(/too few steps did not converge/);
  });

  it('throws ConvergenceError when the function gives no number inside the bracket', () => {
    expect(() =>
      bracketedRoot((x) => (x > 0.4 && x < 0.6 ? NaN : x - 0.5), 0, 1, { name: 'hole' }),
    ).toThrow(ConvergenceError);
  });
});

describe('bisectBoundary', () => {
  it('finds √2 as the end of x² < 2, from the side where it holds', () => {
    const r = bisectBoundary((x) => x * x < 2, 0, 2, 1e-12);
    expect(r.x * r.x).toBeLessThan(2);
    checkClose({
      what: '√2 boundary',
      input: 'x² < 2 on [0, 2]',
      actual: r.x,
      expected: SQRT_2,
      atol: 1e-12,
      kind: 'published',
      source: 'closed form √2 (OEIS A002193)',
      why: 'the width asked for',
    });
  });
});
