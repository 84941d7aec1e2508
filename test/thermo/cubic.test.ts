import { describe, expect, it } from 'vitest';
import {
  criticalConstants,
  cubicRealRoots,
  PENG_ROBINSON,
  SOAVE_REDLICH_KWONG,
} from '../../thermo/eos/cubic.js';
import { checkClose } from '../helpers/check.js';

describe('criticalConstants', () => {
  it('gives the Peng–Robinson constants printed in the 1976 paper', () => {
    // Source: Peng & Robinson (1976), Ind. Eng. Chem. Fundam. 15, 59–64, eqs. 9–11: Ωa = 0.45724,
    // Ωb = 0.07780, Zc = 0.307 (printed to 5 and 3 decimals → atol half a unit in the last place).
    const src = 'Peng & Robinson 1976, eqs. 9–11';
    checkClose({
      what: 'PR Ωa',
      input: 'PR',
      actual: PENG_ROBINSON.omegaA,
      expected: 0.45724,
      atol: 5e-6,
      kind: 'published',
      source: src,
    });
    checkClose({
      what: 'PR Ωb',
      input: 'PR',
      actual: PENG_ROBINSON.omegaB,
      expected: 0.0778,
      atol: 5e-6,
      kind: 'published',
      source: src,
    });
    checkClose({
      what: 'PR Zc',
      input: 'PR',
      actual: PENG_ROBINSON.Zc,
      expected: 0.307,
      atol: 5e-4,
      kind: 'published',
      source: src,
    });
  });

  it('gives the Soave–Redlich–Kwong constants exactly: Ωb = (2^(1/3) − 1)/3, Ωa = 1/(9(2^(1/3) − 1)), Zc = 1/3', () => {
    // Source: Redlich & Kwong (1949), Chem. Rev. 44, 233 (closed forms; Soave 1972 keeps them) — identity to 1e-12.
    const c = Math.cbrt(2) - 1;
    const src = 'Redlich & Kwong 1949 closed forms';
    checkClose({
      what: 'SRK Ωb',
      input: 'SRK',
      actual: SOAVE_REDLICH_KWONG.omegaB,
      expected: c / 3,
      rtol: 1e-12,
      kind: 'identity',
      source: src,
    });
    checkClose({
      what: 'SRK Ωa',
      input: 'SRK',
      actual: SOAVE_REDLICH_KWONG.omegaA,
      expected: 1 / (9 * c),
      rtol: 1e-12,
      kind: 'identity',
      source: src,
    });
    checkClose({
      what: 'SRK Zc',
      input: 'SRK',
      actual: SOAVE_REDLICH_KWONG.Zc,
      expected: 1 / 3,
      rtol: 1e-12,
      kind: 'identity',
      source: src,
    });
  });

  it('satisfies the triple-root condition for any family', () => {
    for (const [d1, d2] of [
      [1 + Math.SQRT2, 1 - Math.SQRT2],
      [1, 0],
      [2, 0.5],
    ] as const) {
      const { omegaA: A, omegaB: B, Zc } = criticalConstants(d1, d2);
      const u = d1 + d2;
      const w = d1 * d2;
      // (Z − Zc)³ must equal the cubic: compare all three coefficients (identity, 1e-12).
      expect(Math.abs(-3 * Zc - ((u - 1) * B - 1))).toBeLessThan(1e-12);
      expect(Math.abs(3 * Zc * Zc - (A + w * B * B - u * B * (B + 1)))).toBeLessThan(1e-12);
      expect(Math.abs(Zc ** 3 - (A * B + w * B * B * (B + 1)))).toBeLessThan(1e-12);
    }
  });
});

describe('cubicRealRoots', () => {
  it('finds roots spread over twelve decades to full relative precision', () => {
    // identity: roots of (x − 1e-12)(x − 3e-10)(x − 1) built from their product
    const r = [1e-12, 3e-10, 1];
    const c2 = -(r[0]! + r[1]! + r[2]!);
    const c1 = r[0]! * r[1]! + r[0]! * r[2]! + r[1]! * r[2]!;
    const c0 = -r[0]! * r[1]! * r[2]!;
    const got = cubicRealRoots(c2, c1, c0);
    expect(got).toHaveLength(3);
    got.forEach((x, i) => expect(Math.abs(x / r[i]! - 1)).toBeLessThan(1e-9));
  });

  it('returns the single real root when the other two are complex', () => {
    // (x − 2)(x² + 1): identity
    const got = cubicRealRoots(-2, 1, -2);
    expect(got).toHaveLength(1);
    expect(Math.abs(got[0]! - 2)).toBeLessThan(1e-12);
  });
});
