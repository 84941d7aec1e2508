/**
 * The one error type the public API throws for bad input. The message always names the
 * argument (field) and its valid range, so an app can show it as is.
 */
export class InputError extends Error {
  /** Dotted path of the offending argument, e.g. `product.components[1].moleFraction`. */
  readonly field: string;
  /** Human-readable valid range, e.g. `> 0 K and at or above the triple point (85.5 K)`. */
  readonly validRange: string;

  constructor(field: string, validRange: string, got?: unknown) {
    const shown =
      got === undefined
        ? ''
        : ` (got ${typeof got === 'number' ? formatNumber(got) : JSON.stringify(got)})`;
    super(`${field} must be ${validRange}${shown}`);
    this.name = 'InputError';
    this.field = field;
    this.validRange = validRange;
  }
}

/**
 * A solver that could not reach a converged answer. Never returned silently: the public API
 * either recovers (another method) or throws this so a caller can say "no answer" honestly.
 */
export class ConvergenceError extends Error {
  readonly solver: string;
  readonly iterations: number;
  readonly residual: number;
  constructor(solver: string, reason: string, iterations: number, residual: number) {
    super(
      `${solver} did not converge: ${reason} (after ${iterations} iterations, residual ${formatNumber(residual)})`,
    );
    this.name = 'ConvergenceError';
    this.solver = solver;
    this.iterations = iterations;
    this.residual = residual;
  }
}

function formatNumber(x: number): string {
  if (Number.isNaN(x)) return 'not a number';
  if (!Number.isFinite(x)) return x > 0 ? 'infinity' : '-infinity';
  return Math.abs(x) >= 1e-3 && Math.abs(x) < 1e7
    ? String(Number(x.toPrecision(6)))
    : x.toExponential(4);
}

/** Throws unless `x` is a finite number. */
export function requireFinite(field: string, x: unknown, range: string): asserts x is number {
  if (typeof x !== 'number' || !Number.isFinite(x)) throw new InputError(field, range, x);
}
