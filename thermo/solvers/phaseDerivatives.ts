/**
 * Composition and pressure derivatives of ln φ_i for one phase of a mixture (the cubic of
 * mixtureModel.ts), for Newton's method on phase equilibria.
 *
 * Written with the reduced residual Helmholtz energy of the generic cubic (Michelsen & Mollerup,
 * Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed., ch. 3):
 *
 *   F(n, V) = −n·g(V, B) − (D/T)·f(V, B),  B = Σ n_i·b_i,  D = n²·a_mix,
 *   g = ln(1 − B/V),  f = ln((V + δ1·B)/(V + δ2·B)) / (R·B·(δ1 − δ2)),
 *
 * whose derivatives in n_i and V give, at the phase's molar volume (n = 1):
 *
 *   n·∂ln φ_i/∂n_j (T, p) = n·F_ij + 1 + (n/RT)·(∂p/∂n_i)(∂p/∂n_j)/(∂p/∂V),
 *   ∂ln φ_i/∂p (T, n)    = v̄_i/(R·T) − 1/p,   v̄_i = −(∂p/∂n_i)/(∂p/∂V).
 *
 * D's composition derivatives include the asymmetric attraction term where a product has one
 * (eos/asymmetricMixing.ts). The translation term of ln φ (−c_i·p/RT) is left out, as in the
 * equilibrium iterations.
 */
import { R_J_molK } from '../constants.js';
import type { MixtureAtT } from './mixtureModel.js';

const R = R_J_molK;

export interface PhaseDerivatives {
  /**
   * n·∂ln φ_i/∂n_j at fixed T and p, row-major n×n (symmetric; Σ_j x_j·Φ_ij = 0); null when not
   * asked for.
   */
  dlnPhidn: Float64Array | null;
  /** ∂ln φ_i/∂p at fixed T and composition, 1/Pa. */
  dlnPhidp: Float64Array;
}

/**
 * Derivatives of ln φ for composition x (mole fractions) at T = mx.T, pressure p and the cubic's
 * compressibility factor Z of the chosen root; the composition matrix only when `composition`.
 */
export function phaseDerivatives(
  mx: MixtureAtT,
  p: number,
  x: ArrayLike<number>,
  Z: number,
  composition = true,
): PhaseDerivatives {
  const { n, aij, b, T } = mx;
  const fam = mx.product.components[0]!.family;
  const d1 = fam.delta1;
  const d2 = fam.delta2;
  const RT = R * T;
  // D_i = ∂(n²a)/∂n_i and D_ij (symmetric rule), then the asymmetric term's part.
  const Di = new Float64Array(n);
  const Dij = new Float64Array(n * n);
  let D = 0;
  let Bm = 0;
  for (let i = 0; i < n; i++) {
    let si = 0;
    for (let j = 0; j < n; j++) {
      si += x[j]! * aij[i * n + j]!;
      Dij[i * n + j] = 2 * aij[i * n + j]!;
    }
    Di[i] = 2 * si;
    D += x[i]! * si;
    Bm += x[i]! * b[i]!;
  }
  const asym = mx.product.kijAsym;
  if (asym) D -= subtractAsymmetric(aij, asym, x, n, Di, Dij);

  const V = (Z * RT) / p;
  const VB = V - Bm;
  const e1 = V + d1 * Bm;
  const e2 = V + d2 * Bm;
  // g = ln(1 − B/V) and f, with their derivatives.
  const gV = Bm / (V * VB);
  const gB = -1 / VB;
  const gVV = -1 / (VB * VB) + 1 / (V * V);
  const gBV = 1 / (VB * VB);
  const gBB = -1 / (VB * VB);
  const f = Math.log(e1 / e2) / (R * Bm * (d1 - d2));
  const fV = -1 / (R * e1 * e2);
  const fB = -(f + V * fV) / Bm;
  const fVV = (1 / (e1 * e1 * e2) + 1 / (e1 * e2 * e2)) / R;
  const fBV = -(2 * fV + V * fVV) / Bm;
  const fBB = -(2 * fB + V * fBV) / Bm;
  const DT = D / T;
  const F_D = -f / T;
  const F_nV = -gV;
  const F_nB = -gB;
  const F_VV = -gVV - DT * fVV;
  const F_VB = -gBV - DT * fBV;
  const F_BB = -gBB - DT * fBB;
  const F_VD = -fV / T;
  const F_BD = -fB / T;

  const dPdV = -RT * F_VV - RT / (V * V);
  const dPdn = new Float64Array(n);
  const dlnPhidp = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const F_iV = F_nV + F_VB * b[i]! + F_VD * Di[i]!;
    dPdn[i] = -RT * F_iV + RT / V;
    dlnPhidp[i] = -dPdn[i]! / dPdV / RT - 1 / p;
  }
  if (!composition) return { dlnPhidn: null, dlnPhidp };
  const dlnPhidn = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const Fij =
        F_nB * (b[i]! + b[j]!) +
        F_BD * (b[i]! * Di[j]! + b[j]! * Di[i]!) +
        F_BB * b[i]! * b[j]! +
        F_D * Dij[i * n + j]!;
      dlnPhidn[i * n + j] = Fij + 1 + (dPdn[i]! * dPdn[j]!) / dPdV / RT;
    }
  return { dlnPhidn, dlnPhidp };
}

/**
 * The asymmetric term Q = n²·q = 2·C/n, C = Σ_i Σ_j M_ij·n_i²·n_j (M_ij = √(a_i·a_j)·m_ij), at
 * n = 1: subtracts Q_k from Di and Q_kl from Dij, returns Q. With u_k = Σ_j M_kj·x_j and
 * w_k = Σ_i M_ik·x_i²: C_k = 2·x_k·u_k + w_k, C_kl = 2·δ_kl·u_k + 2·x_k·M_kl + 2·M_lk·x_l,
 * Q_k = 2·C_k − 2·C, Q_kl = 2·C_kl − 2·C_k − 2·C_l + 4·C.
 */
function subtractAsymmetric(
  aij: Float64Array,
  m: readonly (readonly number[])[],
  x: ArrayLike<number>,
  n: number,
  Di: Float64Array,
  Dij: Float64Array,
): number {
  const M = new Float64Array(n * n);
  const u = new Float64Array(n);
  const w = new Float64Array(n);
  let C = 0;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const mij = m[i]?.[j] ?? 0;
      if (mij === 0) continue;
      const Mij = Math.sqrt(aij[i * n + i]! * aij[j * n + j]!) * mij;
      M[i * n + j] = Mij;
      C += Mij * x[i]! * x[i]! * x[j]!;
      u[i]! += Mij * x[j]!;
      w[j]! += Mij * x[i]! * x[i]!;
    }
  const Ck = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    Ck[k] = 2 * x[k]! * u[k]! + w[k]!;
    Di[k]! -= 2 * Ck[k]! - 2 * C;
  }
  for (let k = 0; k < n; k++)
    for (let l = 0; l < n; l++) {
      const Ckl = (k === l ? 2 * u[k]! : 0) + 2 * x[k]! * M[k * n + l]! + 2 * M[l * n + k]! * x[l]!;
      Dij[k * n + l]! -= 2 * Ckl - 2 * Ck[k]! - 2 * Ck[l]! + 4 * C;
    }
  return 2 * C;
}
