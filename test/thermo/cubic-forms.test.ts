/**
 * The cubic core (eos/cubic.ts) against the textbook forms of each family, written out here
 * independently of the generic δ1/δ2 form the code uses:
 * - Peng & Robinson (1976), Ind. Eng. Chem. Fundam. 15, 59–64: eq. 1 (pressure), eq. 5 (the
 *   cubic in Z), eq. 15 (ln φ of a pure fluid);
 * - Soave (1972), Chem. Eng. Sci. 27, 1197–1203: eq. 1/the Redlich–Kwong pressure, eq. 5 (the
 *   cubic in Z), eq. 8 (ln φ of a pure fluid).
 */
import { describe, expect, it } from 'vitest';
import {
  compressibilityRoots,
  cubicRealRoots,
  dPdv,
  lnPhiPure,
  logTerm,
  PENG_ROBINSON,
  pressure,
  SOAVE_REDLICH_KWONG,
} from '../../thermo/eos/cubic.js';
import { checkClose } from '../helpers/check.js';

const PR_SRC = 'Peng & Robinson 1976, Ind. Eng. Chem. Fundam. 15, 59–64';
const SRK_SRC = 'Soave 1972, Chem. Eng. Sci. 27, 1197–1203';
const S2 = Math.SQRT2;

/** PR eq. 5: Z³ − (1 − B)Z² + (A − 3B² − 2B)Z − (AB − B² − B³) = 0. */
const prCubic = (Z: number, A: number, B: number) =>
  Z ** 3 - (1 - B) * Z ** 2 + (A - 3 * B * B - 2 * B) * Z - (A * B - B * B - B ** 3);
/** SRK eq. 5: Z³ − Z² + (A − B − B²)Z − AB = 0. */
const srkCubic = (Z: number, A: number, B: number) => Z ** 3 - Z ** 2 + (A - B - B * B) * Z - A * B;

// (A, B) pairs: a liquid-and-vapour state with three roots, a supercritical one-root state, a
// dense liquid far below its boiling point, a dilute gas near the ideal-gas limit.
const STATES = [
  { A: 0.05, B: 0.005 },
  { A: 0.3, B: 0.05 },
  { A: 2.5, B: 0.08 },
  { A: 12, B: 0.002 },
  { A: 1e-4, B: 1e-5 },
];

describe('compressibilityRoots against the textbook cubics', () => {
  it.each([
    ['PR', PENG_ROBINSON, prCubic, PR_SRC],
    ['SRK', SOAVE_REDLICH_KWONG, srkCubic, SRK_SRC],
  ] as const)('%s: every returned root solves the family’s cubic, above B', (_, fam, poly, src) => {
    for (const { A, B } of STATES) {
      const roots = compressibilityRoots(fam, A, B);
      expect(roots.length === 1 || roots.length === 3, `${A}, ${B}: ${roots}`).toBe(true);
      for (const Z of roots) {
        expect(Z, 'root above the co-volume').toBeGreaterThan(B);
        // The polynomial's terms are of order Z³ and A·B; the residual is relative to them.
        const scale = Math.max(Z ** 3, A * Z, A * B);
        checkClose({
          what: 'residual of the textbook cubic',
          input: { A, B, Z },
          actual: poly(Z, A, B) / scale,
          expected: 0,
          atol: 1e-12,
          kind: 'identity',
          source: src + ' eq. 5',
        });
      }
      const sorted = [...roots].sort((a, b) => a - b);
      expect(roots).toEqual(sorted);
    }
  });

  it('finds three roots where the textbook cubic changes sign three times, one where once', () => {
    // Sign changes of PR eq. 5 on a fine grid of Z > B, counted independently of the solver.
    for (const { A, B } of STATES) {
      let changes = 0;
      let prev = prCubic(B * (1 + 1e-12), A, B);
      for (let Z = B; Z < 3; Z += 1e-5) {
        const f = prCubic(Z, A, B);
        if (f * prev < 0) changes++;
        if (f !== 0) prev = f;
      }
      expect(compressibilityRoots(PENG_ROBINSON, A, B), `A=${A}, B=${B}`).toHaveLength(changes);
    }
  });

  it('drops the roots at or below B (the co-volume): negative or tiny Z never reach the caller', () => {
    // SRK with A = 0 is Z²(Z − 1) − B·Z(1 + B)... roots Z = 0 and the roots of Z² − Z − B − B²
    // = 0, i.e. Z = 1 + B and Z = −B: only Z = 1 + B lies above B (Soave 1972 eq. 5, A = 0).
    const B = 0.01;
    const roots = compressibilityRoots(SOAVE_REDLICH_KWONG, 0, B);
    expect(roots).toHaveLength(1);
    checkClose({
      what: 'SRK hard-sphere root',
      input: { A: 0, B },
      actual: roots[0]!,
      expected: 1 + B,
      rtol: 1e-14,
      kind: 'identity',
      source: SRK_SRC + ' eq. 5 with A = 0, factored by hand',
    });
  });

  it('at zero pressure (B = 0) the root Z = 0 = B is not returned', () => {
    // Z³ − Z² + A·Z = Z(Z² − Z + A) for SRK with B = 0: roots 0 and (1 ± √(1 − 4A))/2.
    const A = 0.1;
    const roots = compressibilityRoots(SOAVE_REDLICH_KWONG, A, 0);
    const s = Math.sqrt(1 - 4 * A);
    expect(roots).toHaveLength(2);
    checkClose({
      what: 'small root',
      input: { A },
      actual: roots[0]!,
      expected: (1 - s) / 2,
      rtol: 1e-14,
      kind: 'identity',
      source: SRK_SRC + ' eq. 5 with B = 0, factored by hand',
    });
    checkClose({
      what: 'large root',
      input: { A },
      actual: roots[1]!,
      expected: (1 + s) / 2,
      rtol: 1e-14,
      kind: 'identity',
      source: SRK_SRC + ' eq. 5 with B = 0, factored by hand',
    });
  });

  it('tends to the ideal gas (Z → 1) as A and B vanish', () => {
    // Ideal-gas limit: Z = 1 + (B − A)·… to first order (second virial coefficient B − A).
    for (const fam of [PENG_ROBINSON, SOAVE_REDLICH_KWONG]) {
      const A = 1e-6;
      const B = 2e-7;
      const roots = compressibilityRoots(fam, A, B);
      checkClose({
        what: 'Z in the dilute limit',
        input: { fam: fam.name, A, B },
        actual: roots.at(-1)!,
        expected: 1 + B - A,
        atol: 1e-11,
        kind: 'identity',
        source: 'virial expansion of the cubic: Z = 1 + (b − a/RT)·p/RT + O(p²)',
      });
    }
  });
});

describe('cubicRealRoots: every branch of the closed form', () => {
  const fromRoots = (r: number[]) => {
    const [a, b, c] = r as [number, number, number];
    return [-(a + b + c), a * b + a * c + b * c, -a * b * c] as const;
  };

  it.each([
    ['three roots, trigonometric branch', [-3, 0.5, 2]],
    ['three roots of mixed size, negative largest', [-50, 0.25, 1]],
    ['a double root', [1, 1, 4]],
    ['three equal roots (p = 0 branch)', [2, 2, 2]],
    ['three equal roots at zero', [0, 0, 0]],
    ['roots with zero among them (c0 = 0)', [-1, 0, 1]],
  ])('%s', (_, r) => {
    const [c2, c1, c0] = fromRoots(r);
    const got = cubicRealRoots(c2, c1, c0);
    const want = [...new Set(r)].sort((a, b) => a - b);
    // Every distinct root appears, each to 1e-7 (a double root is found only to √ε).
    for (const w of want) {
      const near = Math.min(...got.map((g) => Math.abs(g - w)));
      expect(near, `${r}: root ${w} in ${got}`).toBeLessThan(1e-7 * Math.max(1, Math.abs(w)));
    }
    expect(got).toEqual([...got].sort((a, b) => a - b));
  });

  it.each([
    ['q > 0: (x + 2)(x² + 1)', [2, 1, 2], -2],
    ['q < 0: (x − 3)(x² + x + 1)', [-2, -2, -3], 3],
    ['no x² term: x³ + x + 10 = (x + 2)(x² − 2x + 5)', [0, 1, 10], -2],
  ] as const)('one real root (Cardano branch), %s', (_, [c2, c1, c0], root) => {
    const got = cubicRealRoots(c2, c1, c0);
    expect(got).toHaveLength(1);
    checkClose({
      what: 'single real root',
      input: { c2, c1, c0 },
      actual: got[0]!,
      expected: root,
      rtol: 1e-14,
      kind: 'identity',
      source: 'factored by hand',
    });
  });

  it.each([
    ['q > 0', 1, -1],
    ['q < 0', -1, 1],
  ] as const)(
    'one real root with a tiny linear term (%s): Cardano taken on the side without cancellation',
    (_, c0, root) => {
      // x³ + 1e-9·x + c0: the root is −cbrt(c0) − 1e-9/(3·cbrt(c0)²)·… ≈ ∓1 ± 3.3e-10. With
      // the other sign, −q/2 ± √disc cancels to 0 and the closed form returns 0 instead.
      const got = cubicRealRoots(0, 1e-9, c0);
      expect(got).toHaveLength(1);
      checkClose({
        what: 'root of x³ + 1e-9·x ± 1',
        input: { c0 },
        actual: got[0]!,
        expected: root + (root > 0 ? -1 : 1) * (1e-9 / 3),
        atol: 1e-15,
        kind: 'identity',
        source: 'first-order expansion about ∓1, by hand',
      });
    },
  );

  it('keeps a root of −1e-13 next to negative roots of order 1 (the mirror image)', () => {
    const r = [-2.5, -0.4, -1e-13];
    const [c2, c1, c0] = fromRoots(r);
    const got = cubicRealRoots(c2, c1, c0);
    expect(got).toHaveLength(3);
    got.forEach((x, i) => expect(Math.abs(x / r[i]! - 1), `root ${r[i]}`).toBeLessThan(1e-12));
  });

  it('polishes each root to the last digits (Newton on the original cubic)', () => {
    // (x − 0.1)(x − 0.2)(x − 7): roots to 4 ulp, from the factored form.
    const [c2, c1, c0] = fromRoots([0.1, 0.2, 7]);
    const got = cubicRealRoots(c2, c1, c0);
    [0.1, 0.2, 7].forEach((w, i) => expect(Math.abs(got[i]! / w - 1)).toBeLessThan(1e-15));
  });

  it('keeps a root of 1e-13 next to roots of order 1 to full relative precision', () => {
    // A liquid far below its boiling point: the plain closed form loses every digit here.
    const r = [1e-13, 0.4, 2.5];
    const [c2, c1, c0] = fromRoots(r);
    const got = cubicRealRoots(c2, c1, c0);
    expect(got).toHaveLength(3);
    got.forEach((x, i) => expect(Math.abs(x / r[i]! - 1), `root ${r[i]}`).toBeLessThan(1e-12));
  });
});

describe('pressure, dP/dv, ln φ against the textbook forms', () => {
  const R = 8.314462618;
  // Propane-like coefficients at 300 K (a, b of PR from Tc = 369.89 K, pc = 4.2512 MPa, α ≈ 1.2).
  const T = 300;
  const b = (0.0778 * R * 369.89) / 4.2512e6;
  const a = ((0.45724 * (R * 369.89) ** 2) / 4.2512e6) * 1.2;
  const VOLS = [1.2 * b, 2 * b, 10 * b, 1e-3, 0.02];

  it('PR pressure is RT/(v − b) − a/(v² + 2bv − b²) (PR 1976 eq. 1)', () => {
    for (const v of VOLS) {
      checkClose({
        what: 'PR p(T, v)',
        input: { T, v },
        actual: pressure(PENG_ROBINSON, R, T, v, a, b),
        expected: (R * T) / (v - b) - a / (v * v + 2 * b * v - b * b),
        rtol: 1e-12,
        atol: 1e-6,
        kind: 'identity',
        source: PR_SRC + ' eq. 1',
      });
    }
  });

  it('SRK pressure is RT/(v − b) − a/(v(v + b)) (Soave 1972 eq. 1)', () => {
    for (const v of VOLS) {
      checkClose({
        what: 'SRK p(T, v)',
        input: { T, v },
        actual: pressure(SOAVE_REDLICH_KWONG, R, T, v, a, b),
        expected: (R * T) / (v - b) - a / (v * (v + b)),
        rtol: 1e-12,
        atol: 1e-6,
        kind: 'identity',
        source: SRK_SRC + ' eq. 1',
      });
    }
  });

  it.each([
    ['PR', PENG_ROBINSON, (v: number) => (R * T) / (v - b) - a / (v * v + 2 * b * v - b * b)],
    ['SRK', SOAVE_REDLICH_KWONG, (v: number) => (R * T) / (v - b) - a / (v * (v + b))],
  ] as const)('%s ∂p/∂v equals a central difference of the textbook pressure', (_, fam, p) => {
    for (const v of VOLS) {
      const h = v * 1e-6;
      checkClose({
        what: '∂p/∂v',
        input: { fam: fam.name, v },
        actual: dPdv(fam, R, T, v, a, b),
        expected: (p(v + h) - p(v - h)) / (2 * h),
        rtol: 1e-6,
        kind: 'identity',
        source: 'central difference, h = 1e-6·v',
      });
    }
  });

  it('PR ln φ is Z − 1 − ln(Z − B) − A/(2√2·B)·ln((Z + (1 + √2)B)/(Z + (1 − √2)B)) (PR 1976 eq. 15)', () => {
    for (const { A, B } of STATES) {
      for (const Z of compressibilityRoots(PENG_ROBINSON, A, B)) {
        const want =
          Z -
          1 -
          Math.log(Z - B) -
          (A / (2 * S2 * B)) * Math.log((Z + (1 + S2) * B) / (Z + (1 - S2) * B));
        checkClose({
          what: 'PR ln φ',
          input: { A, B, Z },
          actual: lnPhiPure(PENG_ROBINSON, Z, A, B),
          expected: want,
          atol: 1e-12,
          kind: 'identity',
          source: PR_SRC + ' eq. 15',
        });
      }
    }
  });

  it('SRK ln φ is Z − 1 − ln(Z − B) − (A/B)·ln(1 + B/Z) (Soave 1972 eq. 8)', () => {
    for (const { A, B } of STATES) {
      for (const Z of compressibilityRoots(SOAVE_REDLICH_KWONG, A, B)) {
        checkClose({
          what: 'SRK ln φ',
          input: { A, B, Z },
          actual: lnPhiPure(SOAVE_REDLICH_KWONG, Z, A, B),
          expected: Z - 1 - Math.log(Z - B) - (A / B) * Math.log(1 + B / Z),
          atol: 1e-12,
          kind: 'identity',
          source: SRK_SRC + ' eq. 8',
        });
        checkClose({
          what: 'SRK log term',
          input: { A, B, Z },
          actual: logTerm(SOAVE_REDLICH_KWONG, Z, B),
          expected: Math.log(1 + B / Z),
          atol: 1e-14,
          kind: 'identity',
          source: SRK_SRC + ' eq. 8',
        });
      }
    }
  });

  it('ln φ of the vapour root equals ∫₀ᵖ (Z − 1)/p dp along the isotherm (definition of φ)', () => {
    // Independent of lnPhiPure's closed form: integrate the vapour root's Z over pressure at
    // fixed T (A and B scale with p), Simpson's rule on 2000 panels in ln p from 1e-8·p.
    const fam = PENG_ROBINSON;
    const [A1, B1] = [0.3, 0.05]; // at the final pressure
    const n = 2000;
    const lo = Math.log(1e-8);
    let sum = 0;
    for (let k = 0; k <= n; k++) {
      const s = Math.exp(lo + (-lo * k) / n); // p/p_final
      const Z = compressibilityRoots(fam, A1 * s, B1 * s).at(-1)!;
      const wgt = k === 0 || k === n ? 1 : k % 2 ? 4 : 2;
      sum += wgt * (Z - 1); // (Z − 1)/p·dp = (Z − 1)·d ln p
    }
    const integral = (sum * (-lo / n)) / 3;
    const Z = compressibilityRoots(fam, A1, B1).at(-1)!;
    checkClose({
      what: 'ln φ by integration',
      input: { A: A1, B: B1, Z },
      actual: lnPhiPure(fam, Z, A1, B1),
      expected: integral,
      atol: 1e-7,
      kind: 'identity',
      source: 'ln φ = ∫₀ᵖ (Z − 1) d ln p (definition); Simpson, 2000 panels',
    });
  });
});
