/**
 * One assertion for numeric checks, so every failure prints the input, actual, expected,
 * deviation, tolerance, the kind of check and its source.
 */
import { expect } from 'vitest';

/**
 * published: a figure from outside the project the code was not fitted to; fitted: a reference
 * point the model's parameters were fitted to (shows the fit, not a prediction; held-out points
 * are `published`); identity: a relation the results must satisfy; regression: a pinned value.
 */
export type CheckKind = 'published' | 'fitted' | 'identity' | 'regression';

export interface Check {
  what: string;
  input: unknown;
  actual: number;
  expected: number;
  /** Relative tolerance (|a/e − 1|). */
  rtol?: number;
  /** Absolute tolerance, in the quantity's unit. */
  atol?: number;
  kind: CheckKind;
  source: string;
  /** Why this tolerance (printed with it). */
  why?: string;
}

export function checkClose(c: Check): void {
  const delta = c.actual - c.expected;
  const rel = c.expected !== 0 ? Math.abs(delta / c.expected) : Math.abs(delta);
  const ok =
    Number.isFinite(c.actual) &&
    ((c.rtol !== undefined && rel <= c.rtol) ||
      (c.atol !== undefined && Math.abs(delta) <= c.atol));
  const msg = [
    `${c.what} [${c.kind}]`,
    `  input:     ${JSON.stringify(c.input)}`,
    `  actual:    ${c.actual}`,
    `  expected:  ${c.expected}`,
    `  delta:     ${delta} (relative ${rel.toExponential(3)})`,
    `  tolerance: ${c.rtol !== undefined ? `rtol ${c.rtol}` : ''}${c.atol !== undefined ? ` atol ${c.atol}` : ''}${c.why ? ` (${c.why})` : ''}`,
    `  source:    ${c.source}`,
  ].join('\n');
  expect(ok, msg).toBe(true);
}
