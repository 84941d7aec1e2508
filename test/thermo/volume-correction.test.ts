/**
 * The volume correction's coefficients (thermo/eos/volumeCorrection.ts): a coefficient array of
 * the wrong length is reported, not padded with zeros; values worked by hand.
 */
import { describe, expect, it } from 'vitest';
import { NO_CORRECTION, correctionAtT } from '../../thermo/eos/volumeCorrection.js';
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
