/**
 * The alpha functions against their published forms, worked by hand at chosen points, and their
 * temperature derivatives against central differences of α itself.
 */
import { describe, expect, it } from 'vitest';
import {
  mathiasCopemanAlpha,
  mPengRobinson1976,
  mSoave1972,
  soaveAlpha,
  type AlphaFunction,
} from '../../thermo/eos/alpha.js';
import { checkClose } from '../helpers/check.js';

/** dα/dT by a central difference of α (step 1e-4 K: truncation ~1e-12, rounding ~1e-12). */
function fdSlope(alpha: AlphaFunction, T: number): number {
  const h = 1e-4;
  return (alpha(T + h).alpha - alpha(T - h).alpha) / (2 * h);
}

function expectSlope(alpha: AlphaFunction, T: number, what: string): void {
  checkClose({
    what: `${what} dα/dT`,
    input: T,
    actual: alpha(T).dAlpha_dT,
    expected: fdSlope(alpha, T),
    rtol: 1e-6,
    atol: 1e-10,
    kind: 'identity',
    source: 'central difference of α',
    why: 'difference error far below 1e-6',
  });
}

describe('m(ω) of the textbook models', () => {
  it('Peng–Robinson 1976 eq. 18 at ω = 0 and ω = 0.1521 (worked by hand)', () => {
    const src = 'Peng & Robinson 1976, eq. 18';
    checkClose({
      what: 'm(0)',
      input: 0,
      actual: mPengRobinson1976(0),
      expected: 0.37464,
      rtol: 1e-12,
      kind: 'published',
      source: src,
    });
    // 0.37464 + 1.54226·0.1521 − 0.26992·0.1521² = 0.37464 + 0.234577746 − 0.006244440
    checkClose({
      what: 'm(0.1521)',
      input: 0.1521,
      actual: mPengRobinson1976(0.1521),
      expected: 0.602973306,
      rtol: 1e-9,
      kind: 'published',
      source: src,
      why: 'hand arithmetic to 9 decimals',
    });
  });

  it('Soave 1972 eq. 16 at ω = 0 and ω = 0.1521 (worked by hand)', () => {
    const src = 'Soave 1972, eq. 16';
    checkClose({
      what: 'm(0)',
      input: 0,
      actual: mSoave1972(0),
      expected: 0.48,
      rtol: 1e-12,
      kind: 'published',
      source: src,
    });
    // 0.480 + 1.574·0.1521 − 0.176·0.1521² = 0.48 + 0.2394054 − 0.004071656
    checkClose({
      what: 'm(0.1521)',
      input: 0.1521,
      actual: mSoave1972(0.1521),
      expected: 0.715333744,
      rtol: 1e-9,
      kind: 'published',
      source: src,
      why: 'hand arithmetic to 9 decimals',
    });
  });
});

describe('soaveAlpha', () => {
  const Tc = 400;
  const m = 0.6;
  const alpha = soaveAlpha(Tc, m);

  it('is 1 at Tc with slope −m/Tc', () => {
    expect(alpha(Tc).alpha).toBe(1);
    checkClose({
      what: 'dα/dT at Tc',
      input: Tc,
      actual: alpha(Tc).dAlpha_dT,
      expected: -m / Tc,
      rtol: 1e-14,
      kind: 'identity',
      source: 'Soave form, f = 1 and √Tr = 1 at Tc',
      why: 'floating point',
    });
  });

  it('gives [1 + m(1 − 0.7)]² = 1.18²  at Tr = 0.49 (worked by hand)', () => {
    checkClose({
      what: 'α(Tr = 0.49)',
      input: 0.49 * Tc,
      actual: alpha(0.49 * Tc).alpha,
      expected: 1.3924,
      rtol: 1e-12,
      kind: 'published',
      source: 'Soave 1972 form',
      why: 'floating point',
    });
  });

  it('has the slope of its own values below and above Tc', () => {
    for (const T of [150, 300, 399, 500, 800]) expectSlope(alpha, T, 'Soave');
  });
});

describe('mathiasCopemanAlpha', () => {
  const Tc = 350;
  const [c1, c2, c3] = [0.7, -0.3, 0.5];
  const alpha = mathiasCopemanAlpha(Tc, c1, c2, c3);

  it('gives [1 + c1·x + c2·x² + c3·x³]² at x = 0.3 (Tr = 0.49), worked by hand', () => {
    // 1 + 0.21 − 0.027 + 0.0135 = 1.1965; squared 1.43161225.
    checkClose({
      what: 'α(Tr = 0.49)',
      input: 0.49 * Tc,
      actual: alpha(0.49 * Tc).alpha,
      expected: 1.43161225,
      rtol: 1e-12,
      kind: 'published',
      source: 'Mathias & Copeman 1983',
      why: 'floating point',
    });
  });

  it('uses [1 + c1·x]² above Tc: x = 1 − √1.44 = −0.2 gives 0.86² (worked by hand)', () => {
    checkClose({
      what: 'α(Tr = 1.44)',
      input: 1.44 * Tc,
      actual: alpha(1.44 * Tc).alpha,
      expected: 0.7396,
      rtol: 1e-12,
      kind: 'published',
      source: 'Mathias & Copeman 1983, supercritical branch',
      why: 'floating point',
    });
  });

  it('is the Soave form with m = c1 when c2 = c3 = 0', () => {
    const mc = mathiasCopemanAlpha(Tc, c1, 0, 0);
    const soave = soaveAlpha(Tc, c1);
    for (const T of [120, 300, 500]) {
      checkClose({
        what: 'α',
        input: T,
        actual: mc(T).alpha,
        expected: soave(T).alpha,
        rtol: 1e-14,
        kind: 'identity',
        source: 'Mathias & Copeman 1983 reduce to Soave',
        why: 'floating point',
      });
    }
  });

  it('has the slope of its own values on both branches and is smooth through Tc', () => {
    for (const T of [120, 250, 349, 351, 600]) expectSlope(alpha, T, 'Mathias–Copeman');
    checkClose({
      what: 'slope at Tc',
      input: Tc,
      actual: alpha(Tc).dAlpha_dT,
      expected: -c1 / Tc,
      rtol: 1e-14,
      kind: 'identity',
      source: 'both branches: f = 1, df/dx = c1 at x = 0',
      why: 'floating point',
    });
    checkClose({
      what: 'slope just below Tc',
      input: Tc - 1e-9,
      actual: alpha(Tc - 1e-9).dAlpha_dT,
      expected: -c1 / Tc,
      rtol: 1e-8,
      kind: 'identity',
      source: 'continuity of the slope at Tc',
      why: 'a nanokelvin from Tc',
    });
  });
});
