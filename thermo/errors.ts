import type { Quantity } from './units.js';

/**
 * The valid range of a refused number, for an app that shows it in the user's units. The
 * bounds are in the field's own unit as the API takes it: SI for a `quantity` of
 * `thermo/units.ts` (K, Pa, Pa gauge, m³, kg, kg/m³, m, fraction 0…1), or a plain number
 * (a percent 0…100, a specific gravity) when `quantity` is absent.
 */
export interface InputLimits {
  /** Lowest valid value; inclusive unless `minExclusive`. */
  readonly min?: number;
  /** The lowest value itself is refused (e.g. a pressure must be above 0). */
  readonly minExclusive?: boolean;
  /** Highest valid value, inclusive. */
  readonly max?: number;
  /** What the bounds measure, when it is a quantity of `thermo/units.ts`. */
  readonly quantity?: Quantity;
  /** Why the range is what it is, in words holding no figure in a unit (e.g. `for this product`). */
  readonly note?: string;
}

export type InputErrorCode = 'not-a-number' | 'out-of-range' | 'invalid';

/**
 * The one error type the public API throws for bad input. The message always names the
 * argument (field) and its valid range in SI, so a script can read it as is; `limits`, where
 * given, carries the same range as numbers so an app can show it in the user's units.
 */
export class InputError extends Error {
  /** Dotted path of the offending argument, e.g. `product.components[1].moleFraction`. */
  readonly field: string;
  /** Human-readable valid range, e.g. `> 0 K and at or above the triple point (85.5 K)`. */
  readonly validRange: string;
  /** The range of `validRange` as numbers, when the field is a number with a numeric range. */
  readonly limits?: InputLimits;
  /**
   * What kind of refusal, for an app to word it: `not-a-number` (a number was expected: a
   * string, a BigInt, NaN, an object…), `out-of-range` (a number outside `limits`), `invalid`
   * (anything else: a choice, a shape, a product).
   */
  readonly code: InputErrorCode;

  constructor(field: string, validRange: string, got?: unknown, limits?: InputLimits) {
    const shown = got === undefined ? '' : ` (got ${describeValue(got)})`;
    super(`${field} must be ${validRange}${shown}`);
    this.name = 'InputError';
    this.field = field;
    this.validRange = validRange;
    if (limits !== undefined) this.limits = limits;
    this.code =
      limits === undefined && typeof got === 'number' && Number.isFinite(got)
        ? 'invalid'
        : typeof got === 'number' && Number.isFinite(got)
          ? 'out-of-range'
          : limits !== undefined
            ? 'not-a-number'
            : 'invalid';
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

/** A refused value in words; never throws (a BigInt, a cycle or a symbol is shown, not serialised). */
function describeValue(x: unknown): string {
  if (typeof x === 'number') return formatNumber(x);
  if (typeof x === 'bigint') return `the integer ${x.toString()}n (not a number)`;
  if (typeof x === 'symbol' || typeof x === 'function') return `a ${typeof x}`;
  try {
    return JSON.stringify(x) ?? String(x);
  } catch {
    return 'an object that cannot be shown';
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
