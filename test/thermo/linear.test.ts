/**
 * solvers/linear.ts: Gaussian elimination against systems solved by hand, and the
 * dominant-eigenvalue extrapolation (Crowe & Nishio 1975, AIChE J. 21, 528) against a sequence
 * converging geometrically to a known limit, where it is exact.
 */
import { describe, expect, it } from 'vitest';
import { extrapolate, solveDense } from '../../thermo/solvers/linear.js';
import { checkClose } from '../helpers/check.js';

const close = (got: number[] | null, want: number[], src: string) => {
  expect(got).not.toBeNull();
  want.forEach((w, i) =>
    checkClose({
      what: `x_${i}`,
      input: want,
      actual: got![i]!,
      expected: w,
      atol: 1e-12,
      kind: 'identity',
      source: src,
    }),
  );
};

describe('solveDense', () => {
  it('solves a 3×3 system worked by hand', () => {
    // 2x + y − z = 8, −3x − y + 2z = −11, −2x + y + 2z = −3 → (2, 3, −1) (substitution by hand)
    const A = [
      [2, 1, -1],
      [-3, -1, 2],
      [-2, 1, 2],
    ];
    close(solveDense(A, [8, -11, -3]), [2, 3, -1], 'solved by hand');
  });

  it('pivots past a zero on the diagonal', () => {
    // y = 1, x + y = 3 → (2, 1): the first pivot is 0 and needs a row swap.
    close(
      solveDense(
        [
          [0, 1],
          [1, 1],
        ],
        [1, 3],
      ),
      [2, 1],
      'solved by hand',
    );
  });

  it('picks the largest pivot, not the first non-zero one (accuracy on a tiny pivot)', () => {
    // ε·x + y = 1, x + y = 2 with ε = 1e-17: x = 1/(1 − ε) ≈ 1, y = 1 − ε·x ≈ 1. Without
    // partial pivoting the elimination divides by ε and returns x = 0.
    close(
      solveDense(
        [
          [1e-17, 1],
          [1, 1],
        ],
        [1, 2],
      ),
      [1, 1],
      'solved by hand (the textbook example for partial pivoting)',
    );
  });

  it('picks the largest pivot among the remaining rows of a 3×3 system', () => {
    // rows ordered so that only a search over all rows below finds the best pivot:
    // x = 1, y = −2, z = 3.
    const A = [
      [1e-18, 1, 1],
      [1e-3, 2, -1],
      [1, 1, 1],
    ];
    const x = [1, -2, 3];
    const b = A.map((r) => r[0]! * x[0]! + r[1]! * x[1]! + r[2]! * x[2]!);
    close(solveDense(A, b), x, 'built from the solution');
  });

  it('pivots in a later column too (a zero left on the diagonal after the first step)', () => {
    // 2x + y + z = 7, x + 0.5y + 3z = 11, x + 2y + z = 8 → (1, 2, 3). Eliminating x leaves
    // 0·y + 2.5z = 7.5 and 1.5y + 0.5z = 4.5: the second step must take the third row's pivot.
    close(
      solveDense(
        [
          [2, 1, 1],
          [1, 0.5, 3],
          [1, 2, 1],
        ],
        [7, 11, 8],
      ),
      [1, 2, 3],
      'solved by hand',
    );
  });

  it('returns null for a singular matrix and for a result that is not finite', () => {
    expect(
      solveDense(
        [
          [1, 2],
          [2, 4],
        ],
        [1, 2],
      ),
    ).toBeNull();
    expect(
      solveDense(
        [
          [0, 0],
          [0, 0],
        ],
        [1, 1],
      ),
    ).toBeNull();
    // A pivot of 1e-200 passes the singularity test but 1/1e-200·1e200 overflows.
    expect(
      solveDense(
        [
          [1e-200, 0],
          [0, 1],
        ],
        [1e200, 1],
      ),
    ).toBeNull();
  });

  it('solves a 1×1 and a diagonal 4×4 system', () => {
    close(solveDense([[4]], [2]), [0.5], 'by hand');
    close(
      solveDense(
        [
          [2, 0, 0, 0],
          [0, 4, 0, 0],
          [0, 0, 5, 0],
          [0, 0, 0, 8],
        ],
        [1, 1, 1, 1],
      ),
      [0.5, 0.25, 0.2, 0.125],
      'by hand',
    );
  });
});

describe('extrapolate', () => {
  const seq = (limit: number[], dir: number[], lambda: number, k: number) =>
    Float64Array.from(limit, (l, i) => l + dir[i]! * lambda ** k);

  it.each([0.3, 0.8, 0.94])('jumps to the limit of a geometric sequence (λ = %f)', (lambda) => {
    // u_k = u* + c·λ^k: the extrapolation u2 + λ/(1 − λ)·(u2 − u1) is exactly u*.
    const limit = [1, -2, 0.5];
    const dir = [0.3, 0.1, -0.2];
    const u2 = seq(limit, dir, lambda, 2);
    expect(extrapolate(seq(limit, dir, lambda, 0), seq(limit, dir, lambda, 1), u2)).toBe(true);
    limit.forEach((l, i) =>
      checkClose({
        what: 'extrapolated iterate',
        input: { lambda, i },
        actual: u2[i]!,
        expected: l,
        atol: 1e-12,
        kind: 'identity',
        source: 'sum of the geometric series, Crowe & Nishio 1975',
      }),
    );
  });

  it.each([
    ['oscillating (λ < 0)', -0.5],
    ['too slow to trust (λ = 0.97)', 0.97],
    ['diverging (λ > 1)', 1.2],
  ])('declines and leaves u2 unchanged when %s', (_, lambda) => {
    const limit = [1, 2];
    const dir = [0.3, 0.1];
    const u2 = seq(limit, dir, lambda, 2);
    const before = Float64Array.from(u2);
    expect(extrapolate(seq(limit, dir, lambda, 0), seq(limit, dir, lambda, 1), u2)).toBe(false);
    expect(u2).toEqual(before);
  });

  it('declines at λ = 0.95 exactly and when the last step was zero', () => {
    const u0 = Float64Array.from([0]);
    const u1 = Float64Array.from([1]);
    expect(extrapolate(u0, u1, Float64Array.from([1.95]))).toBe(false);
    // Steps 20 then 19: λ = 361/380, which rounds to the same double as 0.95.
    expect(361 / 380).toBe(0.95);
    expect(
      extrapolate(Float64Array.from([0]), Float64Array.from([20]), Float64Array.from([39])),
    ).toBe(false);
    expect(extrapolate(u0, u1, Float64Array.from([1]))).toBe(false); // λ = 0
    expect(extrapolate(u0, u0, Float64Array.from([1]))).toBe(false); // Δ1 = 0
  });
});
