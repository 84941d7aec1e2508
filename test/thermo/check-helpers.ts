/**
 * Shared assertion for numeric checks: the failure message prints the input, actual,
 * expected, delta, tolerance, source and the kind of check (published / identity / regression).
 */
import { expect } from 'vitest';

export type CheckKind = 'published' | 'identity' | 'regression';

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
  const delta = actual - expected;
  const ok = Number.isFinite(actual) && Math.abs(delta) <= atol;
  expect(
    ok,
    `[${info.kind}] input: ${JSON.stringify(info.input)}\n  actual: ${actual}\n  expected: ${expected}\n  delta: ${delta}\n  tolerance: ±${atol}${info.why ? ` (${info.why})` : ''}\n  source: ${info.source}`,
  ).toBe(true);
}

/** |actual/expected − 1| ≤ rtol. */
export function expectRel(actual: number, expected: number, rtol: number, info: CheckInfo): void {
  expectWithin(actual, expected, Math.abs(expected) * rtol, {
    ...info,
    why: `${info.why ? `${info.why}; ` : ''}rtol ${rtol}`,
  });
}
