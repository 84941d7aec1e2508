/**
 * LP-gas maximum filling density by liquid specific gravity at 60/60 °F: percent of the weight
 * of water (at 60 °F) the container holds. Three public-domain tables, CFR 2015 annual edition
 * text (check the current eCFR before release):
 *
 * - 29 CFR 1910.110(b)(12)(i) Table H-27: non-DOT storage containers, by placement and size
 *   (same table in WAC 296-307-41037 Table U-4).
 * - 49 CFR 173.315(b): DOT cargo and portable tanks, 1,200 US gal and less / over 1,200 US gal;
 *   Note 1: with a fixed-length dip tube or other fixed maximum-level indicator, 97 % of the
 *   weight value.
 * - 49 CFR 173.304a(d)(1): DOT specification cylinders.
 *
 * The tables print band edges to 3 decimals and leave gaps (nothing covers 0.5035). As
 * recommended for the project (not a rule), the specific gravity is rounded DOWN to 3 decimals
 * before the look-up, which lands a gap value in the lower band (lower filling density).
 * Outside a table's range there is no rule: the functions return null and the caller must
 * refuse or say so.
 */

/** [lowest SG, highest SG (null = "and over"), filling density percent …columns]. */
type Band = readonly [number, number | null, ...number[]];

/** Table H-27: [min, max, aboveground ≤ 1,200 US gal, aboveground > 1,200 US gal, underground]. */
export const TABLE_H27: readonly Band[] = [
  [0.496, 0.503, 41, 44, 45],
  [0.504, 0.51, 42, 45, 46],
  [0.511, 0.519, 43, 46, 47],
  [0.52, 0.527, 44, 47, 48],
  [0.528, 0.536, 45, 48, 49],
  [0.537, 0.544, 46, 49, 50],
  [0.545, 0.552, 47, 50, 51],
  [0.553, 0.56, 48, 51, 52],
  [0.561, 0.568, 49, 52, 53],
  [0.569, 0.576, 50, 53, 54],
  [0.577, 0.584, 51, 54, 55],
  [0.585, 0.592, 52, 55, 56],
  [0.593, 0.6, 53, 56, 57],
];

/** 49 CFR 173.315(b): [min, max, ≤ 1,200 US gal, > 1,200 US gal]. The column heading reads "maximum specific gravity". */
export const TABLE_173_315B: readonly Band[] = [
  [0.473, 0.48, 38, 41],
  [0.481, 0.488, 39, 42],
  [0.489, 0.495, 40, 43],
  [0.496, 0.503, 41, 44],
  [0.504, 0.51, 42, 45],
  [0.511, 0.519, 43, 46],
  [0.52, 0.527, 44, 47],
  [0.528, 0.536, 45, 48],
  [0.537, 0.544, 46, 49],
  [0.545, 0.552, 47, 50],
  [0.553, 0.56, 48, 51],
  [0.561, 0.568, 49, 52],
  [0.569, 0.576, 50, 53],
  [0.577, 0.584, 51, 54],
  [0.585, 0.592, 52, 55],
  [0.593, 0.6, 53, 56],
  [0.601, 0.608, 54, 57],
  [0.609, 0.617, 55, 58],
  [0.618, 0.626, 56, 59],
  [0.627, null, 57, 60],
];

/** 49 CFR 173.304a(d)(1): [min, max, percent] for DOT cylinders. The column heading reads "minimum specific gravity". */
export const TABLE_173_304A_D1: readonly Band[] = [
  [0.271, 0.289, 26],
  [0.29, 0.306, 27],
  [0.307, 0.322, 28],
  [0.323, 0.338, 29],
  [0.339, 0.354, 30],
  [0.355, 0.371, 31],
  [0.372, 0.398, 32],
  [0.399, 0.425, 33],
  [0.426, 0.44, 34],
  [0.441, 0.452, 35],
  [0.453, 0.462, 36],
  [0.463, 0.472, 37],
  [0.473, 0.48, 38],
  [0.481, 0.488, 39],
  [0.489, 0.495, 40],
  [0.496, 0.503, 41],
  [0.504, 0.51, 42],
  [0.511, 0.519, 43],
  [0.52, 0.527, 44],
  [0.528, 0.536, 45],
  [0.537, 0.544, 46],
  [0.545, 0.552, 47],
  [0.553, 0.56, 48],
  [0.561, 0.568, 49],
  [0.569, 0.576, 50],
  [0.577, 0.584, 51],
  [0.585, 0.592, 52],
  [0.593, 0.6, 53],
  [0.601, 0.608, 54],
  [0.609, 0.617, 55],
  [0.618, 0.626, 56],
  [0.627, 0.634, 57],
];

/** Which LP-gas table and column. */
export type LpgColumn =
  | 'h27-aboveground-small'
  | 'h27-aboveground-large'
  | 'h27-underground'
  | 'dot-cargo-small'
  | 'dot-cargo-large'
  | 'dot-cylinder';

export interface LpgFillingDensity {
  /** Filling density, percent of water weight capacity. */
  percent: number;
  /** The band's printed limits. */
  band: readonly [number, number | null];
  citation: string;
}

/** Specific gravity rounded down to 3 decimals (the project's reading of the tables' gaps). */
export function sgForTable(sg: number): number {
  return Math.floor(sg * 1000 + 1e-7) / 1000;
}

/**
 * Maximum filling density (percent of the water weight capacity) for LP-gas of specific
 * gravity `sg` (60/60 °F), or null when the table has no band for it.
 */
export function lpgFillingDensity(sg: number, column: LpgColumn): LpgFillingDensity | null {
  const [table, col, citation] = pick(column);
  const fd = sgBandPercent(table, col, sg);
  return fd ? { ...fd, citation } : null;
}

/**
 * The percent in column `col` of a band table by specific gravity (rounded down to 3 decimals
 * first), with the band's printed limits; null outside the table or for a non-finite `sg`.
 */
export function sgBandPercent(
  table: readonly Band[],
  col: number,
  sg: number,
): { percent: number; band: readonly [number, number | null] } | null {
  if (!Number.isFinite(sg)) return null;
  const s = sgForTable(sg);
  for (const b of table) {
    const lo = b[0];
    const hi = b[1];
    if (s >= lo - 1e-9 && (hi === null || s <= hi + 1e-9)) {
      const pct = b[2 + col];
      if (typeof pct !== 'number') return null;
      return { percent: pct, band: [lo, hi] };
    }
  }
  return null;
}

function pick(column: LpgColumn): [readonly Band[], number, string] {
  switch (column) {
    case 'h27-aboveground-small':
      return [
        TABLE_H27,
        0,
        '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, 1,200 US gal or less (CFR 2015 ed.)',
      ];
    case 'h27-aboveground-large':
      return [
        TABLE_H27,
        1,
        '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, over 1,200 US gal (CFR 2015 ed.)',
      ];
    case 'h27-underground':
      return [TABLE_H27, 2, '29 CFR 1910.110(b)(12)(i) Table H-27, underground (CFR 2015 ed.)'];
    case 'dot-cargo-small':
      return [
        TABLE_173_315B,
        0,
        '49 CFR 173.315(b), cargo/portable tanks 1,200 US gal or less (CFR 2015 ed.)',
      ];
    case 'dot-cargo-large':
      return [
        TABLE_173_315B,
        1,
        '49 CFR 173.315(b), cargo/portable tanks over 1,200 US gal (CFR 2015 ed.)',
      ];
    case 'dot-cylinder':
      return [TABLE_173_304A_D1, 0, '49 CFR 173.304a(d)(1), DOT cylinders (CFR 2015 ed.)'];
  }
}

/** 49 CFR 173.315(b) Note 1: a fixed-length dip tube or other fixed maximum-level indicator limits the fill to 97 % of the weight value. */
export const DOT_DIP_TUBE_FACTOR = 0.97;

/**
 * Maximum liquid volume, percent of the container, for volumetric filling (29 CFR
 * 1910.110(b)(19)(v)): FD / (SG · VCF) · 100, with VCF = volume at 60 °F ÷ volume at the liquid
 * temperature (Table H-29 at 40 °F / 50 °F). FD in percent.
 */
export function maxLiquidVolumePercent(fdPercent: number, sg: number, vcf: number): number {
  return (fdPercent / (sg * vcf * 100)) * 100;
}
