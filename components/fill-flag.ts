/**
 * The flag a tank carries after a fill whose gauge read low: from that fill until a later
 * check of the tank clears it. Pure, for the tank list and the walkdown board.
 */
import type { FillRecord } from '../thermo/fill/index.js';

export interface FillFlag {
  /** The fill that raised the flag. */
  fillId: string;
  /** When that fill was saved (ISO 8601). */
  at: string;
  /** Reading − expected, percentage points (negative). */
  difference: number;
}

/**
 * The gauge-low flag of one tank, or null. `fills` and `checks` are that tank's (any order):
 * the newest fill raises the flag when its reconciliation found the gauge reading low (its
 * verdict, or a `fill-gauge-low` finding under an over-limit danger), and any check saved after
 * that fill clears it.
 */
export function lastFillFlag(
  fills: readonly Pick<FillRecord, 'id' | 'finishedAt' | 'result'>[],
  checks: readonly { at: string }[],
): FillFlag | null {
  let last: (typeof fills)[number] | undefined;
  for (const f of fills) if (!last || f.finishedAt > last.finishedAt) last = f;
  if (!last) return null;
  const low =
    last.result.verdict === 'gauge-low' ||
    last.result.findings.some((x) => x.code === 'fill-gauge-low');
  if (!low) return null;
  const t = Date.parse(last.finishedAt);
  if (checks.some((c) => Date.parse(c.at) > t)) return null;
  return { fillId: last.id, at: last.finishedAt, difference: last.result.difference };
}
