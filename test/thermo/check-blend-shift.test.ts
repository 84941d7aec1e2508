/**
 * What a composition shift does to a blend's pressure reading (thermo/check/blendShift.ts),
 * checked against figures from outside the code:
 *
 * - the temperature glide against the bubble and dew pressures of the reference tables
 *   (test/reference/blends/: Lemmon & Jacobsen 2004 mixture model for R-407C, R-404A, R-410A;
 *   Bell 2023 for R-454B): glide ≈ ln(p_bubble/p_dew) ÷ (d ln p_bubble/dT), the slope taken
 *   over the table's 5 K step;
 * - which components are the volatile ones against the incipient-vapour compositions of
 *   test/reference/bubble.csv (GERG-2008, Kunz & Wagner 2012: y_i > x_i), and for the
 *   refrigerant blends against Raoult's law with the pure fluids' reference vapour pressures
 *   (test/reference/sat: a component whose vapour pressure is above the blend's bubble pressure
 *   has K_i = y_i/x_i > 1);
 * - the direction of the shift against the core's bubble pressure of the shifted liquid (a
 *   liquid that has lost some of its volatile components boils at a lower pressure).
 */
import { describe, expect, it } from 'vitest';
import {
  blendGlide,
  compositionShiftCauses,
  ZEOTROPIC_GLIDE_K,
} from '../../thermo/check/blendShift.js';
import { describeProduct, dewPoint, saturation } from '../../thermo/api.js';
import type { Product } from '../../thermo/product.js';
import { readTable } from '../reference/measure.js';
import { expectWithin } from './check-helpers.js';

const BLEND_SRC = (id: string) =>
  `test/reference/blends/${id}.csv (${id === 'r454b' ? 'Bell 2023' : 'Lemmon & Jacobsen 2004'} mixture model)`;
const BUBBLE_SRC = 'test/reference/bubble.csv (GERG-2008, Kunz & Wagner 2012)';

/** Reference glide at T (a row of the table) from the bubble and dew pressures, K. */
function refGlide(id: string, T: number): number {
  const rows = readTable(`blends/${id}.csv`);
  const at = (t: number) => rows.find((r) => Math.abs(+r.T_K! - t) < 1e-6)!;
  const r = at(T);
  const slope = Math.log(+r.p_bubble_Pa! / +at(T - 5).p_bubble_Pa!) / 5;
  return Math.log(+r.p_bubble_Pa! / +r.p_dew_Pa!) / slope;
}

function refPsat(id: string, T: number): number {
  return +readTable(`sat/${id}.csv`).find((r) => Math.abs(+r.T_K! - T) < 1e-6)!.p_Pa!;
}

const PROPANE_BUTANE: Product = {
  components: [
    { id: 'propane', moleFraction: 0.5 },
    { id: 'n-butane', moleFraction: 0.5 },
  ],
};

describe('the temperature glide of a blend', () => {
  const cases: [string, number][] = [
    ['r407c', 258.15],
    ['r407c', 278.15],
    ['r407c', 318.15],
    ['r454b', 298.15],
    ['r404a', 298.15],
    ['r410a', 298.15],
  ];
  for (const [id, T] of cases)
    it(`${id} at ${T} K`, () => {
      expectWithin(blendGlide(id, T)!.kelvin, refGlide(id, T), 0.3, {
        input: { id, T },
        source: BLEND_SRC(id),
        kind: 'published',
        why: 'bubble- and dew-pressure targets of 2 % and the 1 K vs 5 K slope',
      });
    });

  it('is none for a pure fluid', () => {
    expect(blendGlide('propane', 298.15)).toBeNull();
    expect(blendGlide('r134a', 298.15)).toBeNull();
  });

  it('is none at a temperature the core refuses (R-407C past its dew curve, 380 K)', () => {
    expect(() => saturation('r407c', 380)).toThrow();
    expect(blendGlide('r407c', 380)).toBeNull();
  });

  it('is worked out at the temperature rounded to 0.1 K', () => {
    // The glide from the core's own bubble and dew pressures at 291.3 K (the same formula as
    // the reference glide above, with a 1 K slope), asked at 291.26 K.
    const T = 291.3;
    const pb = saturation('r407c', T).pAbs;
    const pd = dewPoint('r407c', T).pAbs;
    const pb1 = saturation('r407c', T - 1).pAbs;
    const expected = Math.log(pb / pd) / Math.log(pb / pb1);
    expect(blendGlide('r407c', 291.26)!.kelvin).toBeCloseTo(expected, 10);
  });

  it('is kept per product and 0.1 K step (the same answer object again)', () => {
    const a = blendGlide('r407c', 288.11);
    expect(blendGlide('r407c', 288.11)).toBe(a);
    expect(blendGlide('r407c', 288.14)).toBe(a);
    expect(blendGlide('r407c', 288.26)).not.toBe(a);
    // Another step asked in between does not push the first one out.
    expect(blendGlide('r407c', 288.11)).toBe(a);
  });

  it('keeps at most 64 answers, the oldest going first', () => {
    const first = blendGlide('r407c', 250.01);
    // 64 other steps of 0.1 K (250.1 … 256.4 K): the first answer is no longer kept.
    for (let i = 1; i <= 64; i++) blendGlide('r407c', 250 + i / 10);
    const again = blendGlide('r407c', 250.01);
    expect(again).not.toBe(first);
    expect(again).toEqual(first);
  });
});

describe('which components are the volatile ones', () => {
  it('propane in a 50/50 propane/n-butane liquid, as the reference incipient vapour says', () => {
    for (const T of [253.15, 273.15, 293.15]) {
      const r = readTable('bubble.csv').find(
        (x) => x.mixture === 'propane0.50+n-butane0.50' && +x.T_K! === T,
      )!;
      expect(+r.y_propane!, BUBBLE_SRC).toBeGreaterThan(+r.x_propane!);
      expect(+r.y_n_butane!, BUBBLE_SRC).toBeLessThan(+r.x_n_butane!);
      const g = blendGlide(PROPANE_BUTANE, T)!;
      expect(g.light).toEqual(['Propane']);
      expect(g.heavy).toEqual(['n-butane']);
    }
  });

  it('ethane alone in propane with a little ethane and n-butane: propane itself is the heavier there', () => {
    // bubble.csv at 273.15 K: x = 0.95/0.025/0.025 (propane/ethane/n-butane), y = 0.901/0.092/0.006.
    const r = readTable('bubble.csv').find(
      (x) => x.mixture === 'propane0.95+ethane0.025+n-butane0.025' && +x.T_K! === 273.15,
    )!;
    expect(+r.y_ethane!).toBeGreaterThan(+r.x_ethane!);
    expect(+r.y_propane!).toBeLessThan(+r.x_propane!);
    const g = blendGlide(
      {
        components: [
          { id: 'propane', moleFraction: 0.95 },
          { id: 'ethane', moleFraction: 0.025 },
          { id: 'n-butane', moleFraction: 0.025 },
        ],
      },
      273.15,
    )!;
    expect(g.light).toEqual(['Ethane']);
    expect(g.heavy).toEqual(['Propane', 'n-butane']);
    expect(
      compositionShiftCauses(
        {
          components: [
            { id: 'propane', moleFraction: 0.95 },
            { id: 'ethane', moleFraction: 0.025 },
            { id: 'n-butane', moleFraction: 0.025 },
          ],
        },
        273.15,
        'low',
      )[0],
    ).toContain('takes more of Ethane and leaves a liquid richer in Propane and n-butane,');
  });

  it('R-32 and R-125 in R-407C: their vapour pressures are above the blend’s bubble pressure (Raoult)', () => {
    const T = 298.15;
    const pBubble = +readTable('blends/r407c.csv').find((r) => +r.T_K! === T)!.p_bubble_Pa!;
    expect(refPsat('r32', T)).toBeGreaterThan(pBubble);
    expect(refPsat('r125', T)).toBeGreaterThan(pBubble);
    expect(refPsat('r134a', T)).toBeLessThan(pBubble);
    const g = blendGlide('r407c', T)!;
    expect(g.light).toEqual(['R-32', 'R-125']);
    expect(g.heavy).toEqual(['R-134a']);
  });
});

describe('the causes a composition shift adds to a reading off the band', () => {
  it('names the shift toward the heavy ends for a low R-407C reading, with its glide', () => {
    const [text, ...rest] = compositionShiftCauses('r407c', 298.15, 'low');
    expect(rest).toEqual([]);
    const glide = +/glides about ([\d.]+) K/.exec(text!)![1]!;
    expectWithin(glide, refGlide('r407c', 298.15), 0.3, {
      input: 'R-407C at 298.15 K',
      source: BLEND_SRC('r407c'),
      kind: 'published',
    });
    expect(text).toBe(
      `R-407C is a zeotropic blend (it glides about ${glide.toFixed(1)} K between bubble and dew point here): a vapour-only withdrawal or a vapour leak takes more of R-32 and R-125 and leaves a liquid richer in R-134a, whose pressure is lower than the nominal blend's.`,
    );
  });

  it('names the shift toward the volatile ends for a high reading', () => {
    const [text, ...rest] = compositionShiftCauses('r407c', 298.15, 'high');
    expect(rest).toEqual([]);
    expect(text).toMatch(
      /^R-407C is a zeotropic blend \(it glides about \d+\.\d K between bubble and dew point here\): contents richer in R-32 and R-125 than the nominal blend \(recovered vapour, or product taken from another cylinder's vapour side\) read higher\.$/,
    );
    const p: Product = PROPANE_BUTANE;
    expect(compositionShiftCauses(p, 273.15, 'high')[0]).toContain(
      'contents richer in Propane than the nominal blend',
    );
  });

  it('says the right way round: the liquid left richer in the heavy ends reads lower', () => {
    // R-407C's liquid after some R-32 and R-125 left with the vapour (mole fractions from the
    // nominal 0.381/0.180/0.439, ASHRAE 34 mass fractions 23/25/52 %): the core's bubble
    // pressure of that liquid is below the nominal blend's, and that of a richer one above.
    const z = describeProduct('r407c').components.map((c) => c.moleFraction);
    const shifted = (d: number): Product => ({
      components: [
        { id: 'r32', moleFraction: z[0]! + d },
        { id: 'r125', moleFraction: z[1]! },
        { id: 'r134a', moleFraction: z[2]! - d },
      ],
    });
    const p0 = saturation(shifted(0), 298.15).pAbs;
    expect(saturation(shifted(-0.05), 298.15).pAbs).toBeLessThan(p0);
    expect(saturation(shifted(0.05), 298.15).pAbs).toBeGreaterThan(p0);
    expect(compositionShiftCauses('r407c', 298.15, 'low')[0]).toMatch(
      /leaves a liquid richer in R-134a, whose pressure is lower/,
    );
    expect(compositionShiftCauses('r407c', 298.15, 'high')[0]).toMatch(/read higher\.$/);
  });

  it('adds none for a reading that fits, a near-azeotrope or a pure fluid', () => {
    expect(compositionShiftCauses('r407c', 298.15, 'fits')).toEqual([]);
    // R-404A glides 0.4 K at 298.15 K in the reference table: under the 1 K of a zeotrope.
    expect(refGlide('r404a', 298.15)).toBeLessThan(ZEOTROPIC_GLIDE_K);
    expect(compositionShiftCauses('r404a', 298.15, 'low')).toEqual([]);
    expect(compositionShiftCauses('r410a', 298.15, 'high')).toEqual([]);
    expect(compositionShiftCauses('propane', 298.15, 'low')).toEqual([]);
    expect(compositionShiftCauses('r407c', 380, 'low')).toEqual([]);
  });

  it('adds one for R-454B, which glides 1.5 K in the reference table (over the 1 K line)', () => {
    expect(refGlide('r454b', 298.15)).toBeGreaterThan(ZEOTROPIC_GLIDE_K);
    expect(compositionShiftCauses('r454b', 298.15, 'low')[0]).toMatch(
      /takes more of R-32 and leaves a liquid richer in R-1234yf/,
    );
  });
});
