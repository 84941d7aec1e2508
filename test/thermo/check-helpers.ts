/**
 * Positional shorthands over the one numeric assertion, `checkClose` (test/helpers/check.ts),
 * used by the tank-check tests: the failure message prints the input, actual, expected, delta,
 * tolerance, source and the kind of check (published / identity / regression).
 */
import { checkClose, type CheckKind } from '../helpers/check.js';

export type { CheckKind };

export interface CheckInfo {
  /** What went in, in words or a short object. */
  input: unknown;
  /** Document, table, edition (or "common practice" / "from memory"). */
  source: string;
  kind: CheckKind;
  /** Why this tolerance. */
  why?: string;
}

/** |actual − expected| ≤ atol (absolute tolerance, same unit as the values). */
export function expectWithin(
  actual: number,
  expected: number,
  atol: number,
  info: CheckInfo,
): void {
  checkClose({ what: 'value', actual, expected, atol, ...info });
}

/** |actual/expected − 1| ≤ rtol. */
export function expectRel(actual: number, expected: number, rtol: number, info: CheckInfo): void {
  checkClose({ what: 'value', actual, expected, rtol, ...info });
}
