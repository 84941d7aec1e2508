/**
 * Mixtures with the van der Waals one-fluid rule:
 *   a = Σ_i Σ_j x_i·x_j·√(a_i·a_j)·(1 − k_ij(T)),  k_ij(T) = k_ij + k'_ij·t + k''_ij·t²,
 *   plus an asymmetric term where a pair has one (eos/asymmetricMixing.ts),
 *   t = T/T_REF − 1 (data/kij.ts),  b = Σ x_i·b_i,  c = Σ x_i·c_i (translation).
 * Fugacity coefficients of the generic cubic:
 *   ln φ_i = (b_i/b)(Z − 1) − ln(Z − B) − (A/B)·(2·Σ_j x_j·a_ij/a − b_i/b)·L − c_i·p/(R·T),
 * with L = ln((Z + δ1·B)/(Z + δ2·B))/(δ1 − δ2). The translation term is the same in every
 * phase, so it is left out of the equilibrium iterations.
 */
import { R_J_molK } from '../constants.js';
import { ConvergenceError } from '../errors.js';
import { compressibilityRoots, logTerm } from '../eos/cubic.js';
import { T_REF_KIJ } from '../data/kij.js';
import { mixtureModelVolume } from '../eos/blendVolume.js';
import { addAsymmetricAttraction } from '../eos/asymmetricMixing.js';
import type { ResolvedProduct } from '../product.js';
import type { RootChoice } from './pure.js';

const R = R_J_molK;

/** Temperature-dependent pure-component coefficients of a mixture, computed once per T. */
export interface MixtureAtT {
  readonly T: number;
  readonly n: number;
  /** a_ij = √(a_i a_j)(1 − k_ij), row-major n×n. */
  readonly aij: Float64Array;
  readonly b: Float64Array;
  /** Critical temperatures and cubic critical volumes of the components (for the volume correction). */
  readonly Tc: Float64Array;
  readonly vcCub: Float64Array;
  readonly M: Float64Array;
  readonly product: ResolvedProduct;
}

export function mixtureAtT(product: ResolvedProduct, T: number): MixtureAtT {
  const n = product.components.length;
  const a = new Float64Array(n);
  const b = new Float64Array(n);
  const Tc = new Float64Array(n);
  const vcCub = new Float64Array(n);
  const M = new Float64Array(n);
  product.components.forEach((m, i) => {
    a[i] = m.ac * m.alpha(T).alpha;
    b[i] = m.b;
    Tc[i] = m.Tc;
    vcCub[i] = m.vcCub;
    M[i] = m.molarMass;
  });
  const aij = new Float64Array(n * n);
  const t = T / T_REF_KIJ - 1;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const k =
        (product.kij[i]?.[j] ?? 0) +
        t * ((product.kijSlope?.[i]?.[j] ?? 0) + t * (product.kijCurve?.[i]?.[j] ?? 0));
      aij[i * n + j] = Math.sqrt(a[i]! * a[j]!) * (1 - k);
    }
  return { T, n, aij, b, Tc, vcCub, M, product };
}

export interface PhaseState {
  Z: number;
  /** ln φ_i without the translation term. */
  lnPhi: Float64Array;
  /** The model's molar volume, m³/mol. */
  v: number;
  /** The cubic's molar volume, m³/mol. */
  vCub: number;
  /** Number of real roots the cubic had (1 or 3). */
  nRoots: number;
}

const family = (mx: MixtureAtT) => mx.product.components[0]!.family;

/**
 * Phase properties at (T, p) for composition x on the chosen root. Iterations that need only
 * ln φ pass `withVolume = false` (then `v` is NaN) and skip the volume correction.
 */
export function phaseAt(
  mx: MixtureAtT,
  p: number,
  x: ArrayLike<number>,
  choice: RootChoice,
  withVolume = true,
): PhaseState {
  const { n, aij, b, T } = mx;
  const fam = family(mx);
  let am = 0;
  let bm = 0;
  const s = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let si = 0;
    for (let j = 0; j < n; j++) si += x[j]! * aij[i * n + j]!;
    s[i] = si;
    am += x[i]! * si;
    bm += x[i]! * b[i]!;
  }
  const asym = mx.product.kijAsym;
  if (asym) am -= addAsymmetricAttraction(aij, asym, x, n, s);
  const A = (am * p) / (R * R * T * T);
  const B = (bm * p) / (R * T);
  const roots = compressibilityRoots(fam, A, B);
  if (roots.length === 0)
    throw new ConvergenceError('cubic roots', 'no root above the co-volume', 0, NaN);
  const zL = roots[0]!;
  const zV = roots[roots.length - 1]!;
  const lnPhiFor = (Z: number) => {
    const L = logTerm(fam, Z, B);
    const base = -Math.log(Z - B);
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const bi = b[i]! / bm;
      out[i] = bi * (Z - 1) + base - (A / B) * ((2 * s[i]!) / am - bi) * L;
    }
    return out;
  };
  let Z: number;
  let lnPhi: Float64Array;
  if (roots.length === 1 || choice === 'liquid') {
    Z = zL;
    lnPhi = lnPhiFor(zL);
  } else if (choice === 'vapour') {
    Z = zV;
    lnPhi = lnPhiFor(zV);
  } else {
    const fL = lnPhiFor(zL);
    const fV = lnPhiFor(zV);
    let gL = 0;
    let gV = 0;
    for (let i = 0; i < n; i++) {
      gL += x[i]! * fL[i]!;
      gV += x[i]! * fV[i]!;
    }
    [Z, lnPhi] = gL <= gV ? [zL, fL] : [zV, fV];
  }
  const vCub = (Z * R * T) / p;
  return {
    Z,
    lnPhi,
    v: withVolume ? mixtureModelVolume(mx, x, vCub, am, bm) : NaN,
    vCub,
    nRoots: roots.length,
  };
}

/** The volume-correction mixing rule of blends lives in eos/blendVolume.ts. */
export { mixtureModelVolume } from '../eos/blendVolume.js';
