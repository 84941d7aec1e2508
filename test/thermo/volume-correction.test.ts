/**
 * The volume correction's coefficients (thermo/eos/volumeCorrection.ts): a coefficient array of
 * the wrong length is reported, not padded with zeros; values worked by hand.
 */
import { describe, expect, it } from 'vitest';
import {
  NO_CORRECTION,
  correctedVolume,
  correctionAtT,
  vapourBump,
} from '../../thermo/eos/volumeCorrection.js';
import { checkClose } from '../helpers/check.js';

const params = { cc: 1e-5, d: [1e-5, 0, 0, 0, 2e-5], delta: 3e-6, eps: [0.1, 0.2, 0.3] };

describe('correctionAtT', () => {
  it('evaluates c(T) = c_c + Σ d_k·τ^e_k and ε(T) = e0 + e1·τ + e2·τ² (worked by hand)', () => {
    // Tc = 400 K, T = 300 K: τ = 0.25; τ^0.35 = exp(0.35·ln 0.25) = 0.615572..., τ² = 0.0625.
    const k = correctionAtT(params, 400, 2e-4, 300);
    const tau035 = 0.6155722066724582;
    checkClose({
      what: 'c(T)',
      input: { T: 300, Tc: 400 },
      actual: k.c,
      expected: 1e-5 + 1e-5 * tau035 + 2e-5 * 0.0625,
      rtol: 1e-12,
      kind: 'identity',
      source: 'worked by hand from the formula in the module header',
    });
    // ε = 0.1 + 0.2·0.25 + 0.3·0.0625 = 0.16875
    checkClose({
      what: 'ε(T)',
      input: { T: 300, Tc: 400 },
      actual: k.eps,
      expected: 0.16875,
      rtol: 1e-12,
      kind: 'identity',
      source: 'worked by hand',
    });
  });

  it('takes c = c_c and ε = e0 at and above Tc', () => {
    const k = correctionAtT(params, 400, 2e-4, 410);
    expect(k.c).toBe(1e-5);
    expect(k.eps).toBe(0.1);
  });

  it('gives no correction for empty arrays', () => {
    const k = correctionAtT(NO_CORRECTION, 400, 2e-4, 300);
    expect([k.c, k.delta, k.eps]).toEqual([0, 0, 0]);
  });

  it('reports shift or ε coefficients of the wrong length instead of padding them', () => {
    expect(() => correctionAtT({ ...params, d: [1e-5, 2e-5] }, 400, 2e-4, 300)).toThrow(
      /5 shift coefficients and 3 ε coefficients \(or none\), got 2 and 3/,
    );
    expect(() => correctionAtT({ ...params, eps: [0.1] }, 400, 2e-4, 300)).toThrow(/got 5 and 1/);
  });
});

describe('vapourBump', () => {
  it('is r(1 − r)² below 1 and 0 from 1 up (worked by hand)', () => {
    const cases: [number, number][] = [
      [0, 0],
      [0.25, 0.140625], // 0.25 · 0.75²
      [1 / 3, 4 / 27], // its maximum
      [0.5, 0.125],
      [1, 0],
      [2, 0],
    ];
    for (const [r, s] of cases) {
      checkClose({
        what: 's(r)',
        input: r,
        actual: vapourBump(r),
        expected: s,
        atol: 1e-15,
        kind: 'identity',
        source: 's(r) = r(1 − r)², worked by hand',
        why: 'floating point',
      });
    }
  });
});

describe('correctedVolume', () => {
  // v = vCub − c − δ·κ/(κ + max(d, 0)) − vCub·s(vcCub/vCub)·ε, κ = 0.35; values worked by hand.
  const k = { c: 1e-6, delta: 2e-6, eps: 0.1, vcCub: 2e-4 };
  const cases: [string, number, number, number][] = [
    // vapour side: r = 0.5, s = 0.125; d = κ → g = 1/2: 4e-4 − 1e-6 − 1e-6 − 5e-6
    ['vapour, d = κ', 4e-4, 0.35, 3.93e-4],
    // a negative distance counts as 0 → g = 1: 4e-4 − 1e-6 − 2e-6 − 5e-6
    ['vapour, d < 0', 4e-4, -1, 3.92e-4],
    // liquid side: r = 2, no bump; d = 3·κ → g = 1/4: 1e-4 − 1e-6 − 0.5e-6
    ['liquid, d = 3κ', 1e-4, 1.05, 0.985e-4],
  ];
  for (const [what, vCub, d, v] of cases) {
    it(`subtracts the shift, the distance term and the vapour bump (${what})`, () => {
      checkClose({
        what: `v (${what})`,
        input: { vCub, d },
        actual: correctedVolume(k, vCub, d),
        expected: v,
        rtol: 1e-12,
        kind: 'identity',
        source: 'the correction as written in volumeCorrection.ts, worked by hand',
        why: 'floating point',
      });
    });
  }
});
