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

  it('takes an end that already meets fTol as the root, with no evaluation inside', () => {
    // x − 0.75 is 0.25 at x = 1 (exact in binary): within fTol = 0.25, so x = 1 is the answer.
    for (const [a, b] of [
      [1, -3],
      [-3, 1],
    ] as const) {
      const r = bracketedRoot((x) => x - 0.75, a, b, { name: 'end', fTol: 0.25 });
      expect(r.x).toBe(1);
      expect(r.iterations).toBe(0);
    }
  });

  it('is exact in one step on a straight line (regula falsi interpolates it)', () => {
    // The secant through the ends of a line is the line: x = 0.5 in one evaluation.
    const r = bracketedRoot((x) => x - 0.5, 0, 1, { name: 'line', maxIterations: 1 });
    expect(r.x).toBe(0.5);
    expect(r.iterations).toBe(1);
  });

  it('halves a bracket around a jump like bisection and stops when narrower than xTol', () => {
    // f = ±1 makes the secant point the midpoint; 1/3 (0.010101… in binary) falls on the
    // other side of each midpoint, so the kept end alternates and no Illinois halving occurs.
    // Widths 1/2, 1/4, 1/8, 1/16: the first below xTol = 1/8 is the 4th (worked by hand).
    const jump = (x: number) => (x < 1 / 3 ? -1 : 1);
    const r = bracketedRoot(jump, 0, 1, { name: 'jump', xTol: 0.125, maxIterations: 4 });
    expect(r.x).toBe(0.3125);
    expect(r.iterations).toBe(4);
    expect(() =>
      bracketedRoot(jump, 0, 1, { name: 'jump', xTol: 0.125, maxIterations: 3 }),
    ).toThrow(/jump did not converge: bracket \[0\.25, 0\.375\] still wider than 0\.125/);
  });

  it('replaces a secant point that lands on an end by the midpoint (steep exponentials)', () => {
    // e^{50(x−1)} − 2 on [1, 2]: f(2)/f(1) ≈ −5e21, so the first secant point rounds to x = 1.
    // Root 1 + ln 2/50 (closed form); the mirror image lands on x = 2, root 2 − ln 2/50.
    const cases: [(x: number) => number, number][] = [
      [(x) => Math.exp(50 * (x - 1)) - 2, 1 + Math.LN2 / 50],
      [(x) => 2 - Math.exp(50 * (2 - x)), 2 - Math.LN2 / 50],
    ];
    for (const [f, root] of cases) {
      const r = bracketedRoot(f, 1, 2, { name: 'steep', xTol: 1e-14 });
      checkClose({
        what: 'root of a steep exponential',
        input: '[1, 2]',
        actual: r.x,
        expected: root,
        atol: 1e-14,
        kind: 'identity',
        source: 'closed form (ln 2/50)',
        why: 'the width asked for',
      });
    }
  });

  it('ends on the correctly rounded root when no tolerance is given, counting its evaluations', () => {
    // With fTol = xTol = 0 the bracket closes to two neighbouring doubles and the one with the
    // smaller |f| is returned: √5 and √7 as IEEE 754 rounds them (Math.sqrt is correctly
    // rounded), from either end and for either sign of the slope.
    for (const c of [5, 7]) {
      for (const [f, a, b] of [
        [(x: number) => x * x - c, 1, 4],
        [(x: number) => x * x - c, 4, 1],
        [(x: number) => c - x * x, 1, 4],
        [(x: number) => c - x * x, 4, 1],
      ] as const) {
        let calls = 0;
        const counted = (x: number) => {
          calls++;
          return f(x);
        };
        const r = bracketedRoot(counted, a, b, { name: 'sqrt', fa: f(a), fb: f(b) });
        expect(r.x).toBe(Math.sqrt(c));
        expect(r.iterations).toBe(calls);
        expect(r.residual).toBe(Math.abs(f(r.x)));
      }
    }
  });

  it('throws ConvergenceError naming the ends when they do not bracket a root', () => {
    const run = () => bracketedRoot((x) => x * x + 1, -1, 2, { name: 'no root' });
    expect(run).toThrow(ConvergenceError);
    expect(run).toThrow(/no root did not converge: no sign change on \[-1, 2\] \(f = 2, 5\)/);
    try {
      run();
    } catch (e) {
      // The residual reported is the smaller |f| at the two ends: min(2, 5).
      expect((e as ConvergenceError).residual).toBe(2);
    }
  });

  it('throws ConvergenceError when an end gives no number', () => {
    for (const bad of [NaN, -Infinity]) {
      expect(() =>
        bracketedRoot((x) => (x === 0 ? bad : x - 0.5), 0, 1, { name: 'bad end' }),
      ).toThrow(/bad end did not converge: no sign change/);
      expect(() =>
        bracketedRoot((x) => (x === 1 ? bad : x - 0.5), 0, 1, { name: 'bad end' }),
      ).toThrow(/bad end did not converge: no sign change/);
    }
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
    ).toThrow(/hole did not converge: f\(0\.5\) is not a finite number/);
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

  it('halves [0, 1] twice to reach a width of 1/4 (worked by hand)', () => {
    // Widths 1, 1/2, 1/4: the loop runs while the width exceeds xTol, so two halvings.
    const r = bisectBoundary((x) => x < 0.3, 0, 1, 0.25);
    expect(r.x).toBe(0.25);
    expect(r.iterations).toBe(2);
  });

  it('stops at neighbouring doubles when xTol is 0, on the side where the property holds', () => {
    const r = bisectBoundary((x) => x * x < 2, 1, 2, 0);
    expect(r.x * r.x).toBeLessThan(2);
    checkClose({
      what: '√2 boundary at xTol 0',
      input: 'x² < 2 on [1, 2]',
      actual: r.x,
      expected: SQRT_2,
      atol: 4.5e-16,
      kind: 'published',
      source: 'closed form √2 (OEIS A002193)',
      why: 'two units in the last place at 1.4',
    });
    // [1, 2] holds 2^52 doubles: 52 halvings bring it to one spacing.
    expect(r.iterations).toBe(52);
  });

  it('stops when the midpoint of neighbouring doubles rounds up to the upper end (√5)', () => {
    // Near √5 the last `lo` has an odd significand, so 0.5·(lo + hi) rounds (to even) onto hi.
    const r = bisectBoundary((x) => x * x < 5, 1, 3, 0);
    expect(r.x * r.x).toBeLessThan(5);
    checkClose({
      what: '√5 boundary at xTol 0',
      input: 'x² < 5 on [1, 3]',
      actual: r.x,
      expected: Math.sqrt(5),
      atol: 9e-16,
      kind: 'published',
      source: 'closed form √5 (Math.sqrt is correctly rounded, IEEE 754)',
      why: 'two units in the last place at 2.2',
    });
  });
});
