/**
 * The solver toolkit's one-dimensional root-finders. Every bracketed search in the core goes
 * through `bracketedRoot`; a search on a yes/no question (where does a state stop existing)
 * through `bisectBoundary`. Neither returns a guess: they converge or throw `ConvergenceError`.
 *
 * `bracketedRoot` is regula falsi with the Illinois modification (Dowell & Jarratt 1971,
 * BIT 11, 168–174): when the same end of the bracket is kept twice, its function value is
 * halved, which restores superlinear convergence. A bisection step is forced whenever four
 * steps in a row fail to halve the bracket, so the bracket always closes.
 */
import { ConvergenceError } from '../errors.js';

/** A converged root and how it was reached (a failed search throws instead). */
export interface RootReport {
  /** The root: the last point evaluated, inside the final bracket. */
  x: number;
  /** f(x). */
  fx: number;
  converged: true;
  /** Function evaluations inside the bracket (0 when an end already met the tolerance). */
  iterations: number;
  /** |f(x)|. */
  residual: number;
}

export interface BracketOptions {
  /** Name of the search, for the error a failure throws. */
  name: string;
  /** Stop when |f(x)| ≤ fTol (default 0: only an exact zero). */
  fTol?: number;
  /** Stop when the bracket is narrower than xTol (default 0: never on width alone). */
  xTol?: number;
  /** Most evaluations inside the bracket (default 200). */
  maxIterations?: number;
  /** f(a) and f(b) when the caller has them already (saves two evaluations). */
  fa?: number;
  fb?: number;
}

/**
 * A root of f on [a, b], where f(a) and f(b) differ in sign (either order of a, b; either
 * sign at either end). Throws ConvergenceError when they do not, when f gives a non-finite
 * value, or when neither tolerance is met within `maxIterations`.
 */
export function bracketedRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  options: BracketOptions,
): RootReport {
  const { name, fTol = 0, xTol = 0, maxIterations = 200 } = options;
  let fa = options.fa ?? f(a);
  let fb = options.fb ?? f(b);
  if (Math.abs(fa) <= fTol) return report(a, fa, 0);
  if (Math.abs(fb) <= fTol) return report(b, fb, 0);
  if (!(Number.isFinite(fa) && Number.isFinite(fb)) || Math.sign(fa) === Math.sign(fb)) {
    throw new ConvergenceError(
      name,
      `no sign change on [${a}, ${b}] (f = ${fa}, ${fb})`,
      0,
      Math.min(Math.abs(fa), Math.abs(fb)),
    );
  }
  let rawA = fa; // f at the ends before any Illinois halving
  let rawB = fb;
  let side = 0; // which end was kept last: −1 the a end, +1 the b end
  let slow = 0; // steps in a row that did not halve the bracket
  let x = a;
  let fx = fa;
  for (let it = 1; it <= maxIterations; it++) {
    const width = Math.abs(b - a);
    x = slow >= 4 ? 0.5 * (a + b) : (a * fb - b * fa) / (fb - fa);
    if (!(x > Math.min(a, b) && x < Math.max(a, b))) x = 0.5 * (a + b);
    if (x === a || x === b) {
      // The bracket is two neighbouring floating-point numbers: as close as it gets.
      return Math.abs(rawA) <= Math.abs(rawB) ? report(a, rawA, it - 1) : report(b, rawB, it - 1);
    }
    fx = f(x);
    if (!Number.isFinite(fx))
      throw new ConvergenceError(name, `f(${x}) is not a finite number`, it, NaN);
    if (Math.abs(fx) <= fTol) return report(x, fx, it);
    if (Math.sign(fx) === Math.sign(fb)) {
      b = x;
      fb = rawB = fx;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = x;
      fa = rawA = fx;
      if (side === 1) fb /= 2;
      side = 1;
    }
    slow = Math.abs(b - a) > 0.5 * width ? slow + 1 : 0;
    if (Math.abs(b - a) < xTol) return report(x, fx, it);
  }
  throw new ConvergenceError(
    name,
    `bracket [${a}, ${b}] still wider than ${xTol}`,
    maxIterations,
    Math.abs(fx),
  );
}

function report(x: number, fx: number, iterations: number): RootReport {
  return { x, fx, converged: true, iterations, residual: Math.abs(fx) };
}

/**
 * Where a yes/no property of x stops holding: `holds(lo)` is true and `holds(hi)` false (the
 * caller checks both ends); bisection until the bracket is narrower than xTol. Returns the
 * last x known to hold (the cautious end: the property is certain there).
 */
export function bisectBoundary(
  holds: (x: number) => boolean,
  lo: number,
  hi: number,
  xTol: number,
): { x: number; iterations: number } {
  let it = 0;
  while (Math.abs(hi - lo) > xTol) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break; // as narrow as floating point allows
    if (holds(mid)) lo = mid;
    else hi = mid;
    it++;
  }
  return { x: lo, iterations: it };
}
