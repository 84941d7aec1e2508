/**
 * Refrigerant blends as products by id. The ids are the ASHRAE 34 designations (trade terms),
 * lower-case without the hyphen. Compositions are the nominal ones, in mass fractions, each
 * with its source; mole fractions follow from the components' molar masses in data/fluids.ts.
 * Real charges vary within the blend tolerances (about ±1–2 % by mass per component).
 */

export interface RefrigerantBlend {
  /** Product id, e.g. `r410a`. */
  readonly id: string;
  /** Display name, e.g. `R-410A`. */
  readonly name: string;
  /** Component fluid ids with their nominal mass fractions (summing to 1). */
  readonly massFractions: readonly { readonly id: string; readonly w: number }[];
  /**
   * Highest temperature the blend is offered at, K: the last row of its reference table,
   * at least 1 K below the end of the dew curve (cricondentherm) of the reference mixture
   * model, and below the end of this model's own dew curve (test/thermo/refrigerant-blends.test.ts).
   */
  readonly Tmax: number;
  /** Where the composition comes from. */
  readonly source: string;
}

const TABLE =
  'nominal composition as in test/reference/blends/README.md (ASHRAE Standard 34 designation; reference tables of Lemmon & Jacobsen 2004 / Bell 2023)';

export const REFRIGERANT_BLENDS: readonly RefrigerantBlend[] = [
  {
    id: 'r410a',
    name: 'R-410A',
    massFractions: [
      { id: 'r32', w: 0.5 },
      { id: 'r125', w: 0.5 },
    ],
    Tmax: 343.15,
    source: `R-32/R-125 50/50 by mass: ${TABLE}`,
  },
  {
    id: 'r404a',
    name: 'R-404A',
    massFractions: [
      { id: 'r125', w: 0.44 },
      { id: 'r134a', w: 0.04 },
      { id: 'r143a', w: 0.52 },
    ],
    Tmax: 343.15,
    source: `R-125/R-134a/R-143a 44/4/52 by mass: ${TABLE}`,
  },
  {
    id: 'r407c',
    name: 'R-407C',
    massFractions: [
      { id: 'r32', w: 0.23 },
      { id: 'r125', w: 0.25 },
      { id: 'r134a', w: 0.52 },
    ],
    Tmax: 343.15,
    source: `R-32/R-125/R-134a 23/25/52 by mass: ${TABLE}`,
  },
  {
    id: 'r507a',
    name: 'R-507A',
    massFractions: [
      { id: 'r125', w: 0.5 },
      { id: 'r143a', w: 0.5 },
    ],
    Tmax: 342.15,
    source: `R-125/R-143a 50/50 by mass: ${TABLE}`,
  },
  {
    id: 'r454b',
    name: 'R-454B',
    massFractions: [
      { id: 'r32', w: 0.689 },
      { id: 'r1234yf', w: 0.311 },
    ],
    Tmax: 343.15,
    source: `R-32/R-1234yf 68.9/31.1 by mass: ${TABLE}`,
  },
];

export function refrigerantBlendById(id: string): RefrigerantBlend | undefined {
  return REFRIGERANT_BLENDS.find((b) => b.id === id);
}
