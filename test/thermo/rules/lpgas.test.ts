/**
 * The LP-gas filling-density look-up (thermo/rules/lpgas.ts) at every printed band edge of every
 * column, read from test/reference/trade/filling_density_lpg.csv (29 CFR 1910.110(b)(12)(i)
 * Table H-27; 49 CFR 173.315(b); 49 CFR 173.304a(d)(1); CFR 2015 annual edition text), and the
 * gaps between bands as FACTS.md section a1 recommends (round the SG down to 3 decimals; refuse
 * outside the table).
 */
import { describe, it, expect } from 'vitest';
import { fileURLToPath } from 'node:url';
import { readCsv } from '../../../scripts/lib/csv.js';
import {
  TABLE_173_304A_D1,
  TABLE_H27,
  lpgFillingDensity,
  sgBandPercent,
  sgForTable,
  type LpgColumn,
} from '../../../thermo/rules/lpgas.js';

const ROWS = readCsv(
  fileURLToPath(new URL('../../reference/trade/filling_density_lpg.csv', import.meta.url)),
);
/** The CSV's container classes, the column each is, and words its citation must hold. */
const COLUMNS: Record<string, [LpgColumn, string]> = {
  aboveground_0_to_1200_usgal: [
    'h27-aboveground-small',
    '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, 1,200 US gal or less',
  ],
  aboveground_over_1200_usgal: [
    'h27-aboveground-large',
    '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, over 1,200 US gal',
  ],
  underground_all_capacities: [
    'h27-underground',
    '29 CFR 1910.110(b)(12)(i) Table H-27, underground',
  ],
  dot_cargo_or_portable_tank_1200_usgal_or_less: [
    'dot-cargo-small',
    '49 CFR 173.315(b), cargo/portable tanks 1,200 US gal or less',
  ],
  dot_cargo_or_portable_tank_over_1200_usgal: [
    'dot-cargo-large',
    '49 CFR 173.315(b), cargo/portable tanks over 1,200 US gal',
  ],
  dot_specification_cylinder: ['dot-cylinder', '49 CFR 173.304a(d)(1), DOT cylinders'],
};

describe('every printed band, both edges, every column (filling_density_lpg.csv)', () => {
  it('the look-up gives the printed percent, the band and the table’s citation', () => {
    let n = 0;
    for (const r of ROWS) {
      const [column, citation] = COLUMNS[r.container_class!]!;
      const lo = Number(r.sg_60F_min);
      const hi = r.sg_60F_max === 'and over' ? null : Number(r.sg_60F_max);
      const pct = Number(r.max_filling_density_pct_of_water_weight);
      for (const sg of hi === null ? [lo, lo + 0.1] : [lo, hi]) {
        const got = lpgFillingDensity(sg, column);
        const where = `${r.regulation} ${r.container_class} SG ${sg}`;
        expect(got, where).not.toBeNull();
        expect(got!.percent, where).toBe(pct);
        expect(got!.band, where).toEqual([lo, hi]);
        expect(got!.citation, where).toBe(`${citation} (CFR 2015 ed.)`);
        n++;
      }
    }
    expect(n).toBe(2 * (13 * 3 + 20 * 2 + 32));
  });
});

describe('between and beyond the bands (FACTS.md a1: round down to 3 decimals, refuse outside)', () => {
  it('a gap value falls in the lower band: 0.5035 → 41 % and 0.5109 → 42 % (H-27 aboveground small)', () => {
    expect(lpgFillingDensity(0.5035, 'h27-aboveground-small')!.percent).toBe(41);
    expect(lpgFillingDensity(0.5109, 'h27-aboveground-small')!.band).toEqual([0.504, 0.51]);
    expect(lpgFillingDensity(0.5039999, 'dot-cylinder')!.percent).toBe(41);
  });
  it('rounding down to 3 decimals keeps a printed edge as printed', () => {
    // 0.504 × 1000 is 503.99999999999994 in binary floating point: still 0.504
    for (const sg of [0.504, 0.51, 0.519, 0.52, 0.6, 0.627]) expect(sgForTable(sg)).toBe(sg);
    expect(sgForTable(0.5039999)).toBe(0.503);
    expect(sgForTable(0.5109)).toBe(0.51);
  });
  it('below the lowest band or above the highest: no rule', () => {
    expect(lpgFillingDensity(0.495, 'h27-underground')).toBeNull();
    expect(lpgFillingDensity(0.601, 'h27-aboveground-large')).toBeNull();
    expect(lpgFillingDensity(0.472, 'dot-cargo-large')).toBeNull();
    expect(lpgFillingDensity(0.27, 'dot-cylinder')).toBeNull();
    expect(lpgFillingDensity(0.635, 'dot-cylinder')).toBeNull();
    expect(lpgFillingDensity(0.9, 'dot-cargo-small')!.percent).toBe(57); // "0.627 and over"
  });
  it('no number, no rule: NaN and ±Infinity', () => {
    for (const sg of [NaN, Infinity, -Infinity])
      expect(lpgFillingDensity(sg, 'dot-cargo-small'), String(sg)).toBeNull();
  });
  it('a column a table does not have: no rule (the cylinder table prints one column)', () => {
    expect(sgBandPercent(TABLE_173_304A_D1, 1, 0.508)).toBeNull();
    expect(sgBandPercent(TABLE_H27, 3, 0.508)).toBeNull();
    expect(sgBandPercent(TABLE_H27, 2, 0.508)).toEqual({ percent: 46, band: [0.504, 0.51] });
  });
});
