/**
 * Binary interaction parameters k_ij for the van der Waals one-fluid rule,
 * a_ij = √(a_i·a_j)·(1 − k_ij), with k_ij(T) = k_ij + k'_ij·t + k''_ij·t², t = T/T_REF_KIJ − 1,
 * where a temperature dependence is fitted (the HFC/HFO pairs of the refrigerant blends, data/kij-fitted.ts, written by
 * scripts/fit-blends.ts). Pairs not listed use 0, which the cubic literature commonly
 * takes for chemically similar pairs (light alkanes, alkenes, HFC refrigerants of one family).
 *
 * The listed hydrocarbon pairs were checked against the reference bubble-point table
 * (test/reference/bubble.csv: GERG-2008 mixture model, Kunz & Wagner 2012, J. Chem. Eng. Data
 * 57, 3032–3091, with the pure reference equations): with k_ij = 0 the tuned model's bubble
 * pressures are within 0.3 % over 233–333 K (test/thermo/blend.test.ts), well inside the 2 %
 * target and inside the GERG model's own 0.5 % average deviation from experiment, so no
 * non-zero value is justified by that data.
 */

import { FITTED_PAIRS } from './kij-fitted.js';

/** Reference temperature of the k_ij slopes, K. */
export const T_REF_KIJ = 298.15;

interface PairEntry {
  readonly a: string;
  readonly b: string;
  /** k_ij for the tuned model (at T_REF_KIJ). */
  readonly tuned: number;
  /** Temperature slope for the tuned model: k_ij(T) = tuned + tunedSlope·(T/T_REF_KIJ − 1). */
  readonly tunedSlope?: number;
  /** Curvature for the tuned model: adds tunedCurve·(T/T_REF_KIJ − 1)². */
  readonly tunedCurve?: number;
  /** Volume-correction excesses for the tuned model (eos/blendVolume.ts): ξ_ij in K, v^E_ij in m³/mol. */
  readonly xi?: number;
  readonly vE?: number;
  readonly vESlope?: number;
  /**
   * Asymmetric term m_ab for the tuned model (eos/asymmetricMixing.ts): k_ab(x) = k_ab +
   * m_ab·(x_a − x_b), m_ba = −m_ab.
   */
  readonly asym?: number;
  /** Excess of the distance-function amplitude δ for the tuned model, m³/mol (eos/blendVolume.ts). */
  readonly deltaE?: number;
  /** k_ij for textbook PR and SRK. */
  readonly textbook: number;
  readonly source: string;
}

const CHECKED_ZERO =
  'k_ij = 0 checked against test/reference/bubble.csv (GERG-2008), see file header';

export const PAIRS: readonly PairEntry[] = [
  { a: 'propane', b: 'n-butane', tuned: 0, textbook: 0, source: CHECKED_ZERO },
  { a: 'ethane', b: 'propane', tuned: 0, textbook: 0, source: CHECKED_ZERO },
  { a: 'ethane', b: 'n-butane', tuned: 0, textbook: 0, source: CHECKED_ZERO },
  // HFC/HFO pairs of the refrigerant blends: fitted for the tuned model only (textbook PR and
  // SRK keep 0, as the literature defaults they are measured against).
  ...FITTED_PAIRS.map((p) => ({
    a: p.a,
    b: p.b,
    tuned: p.k,
    tunedSlope: p.slope,
    tunedCurve: p.curve,
    asym: p.asym,
    xi: p.xi,
    vE: p.vE,
    vESlope: p.vESlope,
    deltaE: p.deltaE,
    textbook: 0,
    source: p.source,
  })),
];

function pair(a: string, b: string): PairEntry | undefined {
  return PAIRS.find((p) => (p.a === a && p.b === b) || (p.a === b && p.b === a));
}

export function interactionParameter(a: string, b: string, model: string): number {
  const e = pair(a, b);
  if (!e) return 0;
  return model === 'tuned' ? e.tuned : e.textbook;
}

/** Temperature slope of k_ij (0 for constant pairs and the textbook models). */
export function interactionSlope(a: string, b: string, model: string): number {
  const e = pair(a, b);
  return e && model === 'tuned' ? (e.tunedSlope ?? 0) : 0;
}

/** Curvature of k_ij(T) (0 where not fitted). */
export function interactionCurve(a: string, b: string, model: string): number {
  const e = pair(a, b);
  return e && model === 'tuned' ? (e.tunedCurve ?? 0) : 0;
}

/** Asymmetric term m_ab of the ordered pair (a, b): −m_ba; 0 where not fitted. */
export function interactionAsymmetry(a: string, b: string, model: string): number {
  const e = pair(a, b);
  if (!e || model !== 'tuned' || !e.asym) return 0;
  return e.a === a ? e.asym : -e.asym;
}

/** Volume-correction excesses ξ_ij (K), v^E_ij and δ^E_ij (m³/mol) of a pair; zero where not fitted. */
export function volumeExcess(
  a: string,
  b: string,
  model: string,
): { xi: number; vE: number; vESlope: number; deltaE: number } {
  const e = pair(a, b);
  return e && model === 'tuned'
    ? { xi: e.xi ?? 0, vE: e.vE ?? 0, vESlope: e.vESlope ?? 0, deltaE: e.deltaE ?? 0 }
    : { xi: 0, vE: 0, vESlope: 0, deltaE: 0 };
}
