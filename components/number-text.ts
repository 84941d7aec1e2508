/** Small number helpers of `<number-field>`: rounding a range for its question, comparing values. */
import { parseNumber, resolveNumberFormat } from './number-parse.js';

/**
 * Reads typed text in the browser locale's number format (kept for callers of the old helper;
 * new code uses `parseNumber` with the user's format). Empty text is null; refused text is
 * undefined.
 */
export function parseDecimal(text: string): number | null | undefined {
  const r = parseNumber(text, resolveNumberFormat('auto'));
  return r.ok ? r.value : undefined;
}

/** `x` to `digits` significant figures, rounded up or down, as plain text ("3700000", "0.25"). */
export function roundSignificant(x: number, digits: number, dir: 'up' | 'down'): string {
  if (x === 0 || !Number.isFinite(x)) return '0';
  const e = Math.floor(Math.log10(Math.abs(x))) - digits + 1;
  const k = 10 ** e;
  const scaled = x / k;
  const eps = 1e-9 * Math.abs(scaled);
  const r = dir === 'up' ? Math.ceil(scaled - eps) : Math.floor(scaled + eps);
  return e >= 0 ? String(r * k) : (r * k).toFixed(-e);
}

/** Equal, or both null, to 12 significant figures. */
export function sameNumber(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(a));
}
