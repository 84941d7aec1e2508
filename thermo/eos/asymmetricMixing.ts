/**
 * An asymmetric (composition-dependent) attraction term for the van der Waals one-fluid rule:
 *
 *   a = Σ_i Σ_j x_i·x_j·√(a_i·a_j)·(1 − k_ij − m_ij·(x_i − x_j)),   m_ji = −m_ij,
 *
 * the two-parameter form of Adachi & Sugie (1986, Fluid Phase Equilib. 28, 103–118). With the
 * symmetric k_ij alone a binary's bubble and dew pressure at one temperature depend on one
 * number, so its glide is fixed by the rule; m_ij tilts the attraction toward one side of the
 * composition range and lets both curves be matched (R-32/R-1234yf in R-454B,
 * scripts/fit-blends.ts). In a mixture of three or more components this form is not invariant
 * when a component is split into two identical ones (Michelsen & Kistenmacher 1990, Fluid
 * Phase Equilib. 58, 229–230), so the fit uses it only for a pair that forms a blend on its
 * own (data/kij-fitted.ts).
 *
 * With M_ij = √(a_i·a_j)·m_ij the extra term is −q, q = 2·Σ_i Σ_j M_ij·x_i²·x_j, and the
 * composition derivative (1/n)·∂(n²·a)/∂n_k changes by −4·x_k·Σ_j M_kj·x_j − 2·Σ_i M_ik·x_i² + q
 * (so that Σ_k x_k·(1/n)·∂(n²·a)/∂n_k = 2·a still holds).
 */

/**
 * Adds the asymmetric term for composition x: `s` holds Σ_j x_j·a_ij on entry (half the
 * symmetric rule's (1/n)·∂(n²·a)/∂n_k) and half the full derivative on return. Returns q, to
 * be subtracted from the symmetric a_mix. `aij` is row-major n×n; its diagonal is a_i.
 */
export function addAsymmetricAttraction(
  aij: Float64Array,
  m: readonly (readonly number[])[],
  x: ArrayLike<number>,
  n: number,
  s: Float64Array,
): number {
  let q = 0;
  const u = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const mij = m[i]?.[j] ?? 0;
      if (mij === 0) continue;
      const M = Math.sqrt(aij[i * n + i]! * aij[j * n + j]!) * mij;
      q += 2 * M * x[i]! * x[i]! * x[j]!;
      u[i]! += M * x[j]!;
      w[j]! += M * x[i]! * x[i]!;
    }
  for (let k = 0; k < n; k++) s[k]! += 0.5 * (q - 4 * x[k]! * u[k]! - 2 * w[k]!);
  return q;
}
