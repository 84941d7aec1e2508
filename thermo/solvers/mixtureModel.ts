/**
 * Mixtures with the van der Waals one-fluid rule:
 *   a = Σ_i Σ_j x_i·x_j·√(a_i·a_j)·(1 − k_ij(T)),  k_ij(T) = k_ij + k'_ij·t + k''_ij·t²,
 *   t = T/T_REF − 1 (data/kij.ts),  b = Σ x_i·b_i,  c = Σ x_i·c_i (translation).
 * Fugacity coefficients of the generic cubic:
 *   ln φ_i = (b_i/b)(Z − 1) − ln(Z − B) − (A/B)·(2·Σ_j x_j·a_ij/a − b_i/b)·L − c_i·p/(R·T),
 * with L = ln((Z + δ1·B)/(Z + δ2·B))/(δ1 − δ2). The translation term is the same in every
 * phase, so it is left out of the equilibrium iterations.
 */
import { R_J_molK } from '../constants.js';
import { ConvergenceError } from '../errors.js';
import { compressibilityRoots, dPdv, logTerm } from '../eos/cubic.js';
import { T_REF_KIJ } from '../data/kij.js';
import { correctedVolume, correctionAtT } from '../eos/volumeCorrection.js';
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

/**
 * The model's molar volume from the cubic's vCub for composition x (a_mix, b_mix given).
 * The correction terms mix linearly in mole fraction, each component's taken at the phase's
 * reduced temperature T/Tpc (Kay's rule, Tpc = Σ x_i·Tc_i) rather than at T itself: the steep
 * near-critical shape of c_i(T) then follows the blend's own critical region instead of
 * switching on at each component's Tc (a propane-rich liquid at 370 K is far from critical even
 * though propane alone would be). For a pure fluid this is exactly the pure-fluid correction.
 * Where a product carries fitted binary volume parameters (the refrigerant blends,
 * data/kij-fitted.ts), the pseudo-critical temperature gets a quadratic excess,
 * Tpc = Σ x_i·Tc_i + Σ_i Σ_j x_i·x_j·ξ_ij (the form of the reducing temperature of the
 * multi-fluid mixture models), and the translation an excess volume Σ_i Σ_j x_i·x_j·v^E_ij(T),
 * v^E_ij(T) = v^E_ij + v^E′_ij·(T/T_REF − 1);
 * both act after equilibrium, like the rest of the correction.
 */
export function mixtureModelVolume(
  mx: MixtureAtT,
  x: ArrayLike<number>,
  vCub: number,
  am: number,
  bm: number,
): number {
  let Tpc = 0;
  for (let i = 0; i < mx.n; i++) Tpc += x[i]! * mx.Tc[i]!;
  let c = 0;
  const vm = mx.product.volumeMixing;
  const tRef = mx.T / T_REF_KIJ - 1;
  if (vm)
    for (let i = 0; i < mx.n; i++)
      for (let j = 0; j < mx.n; j++) {
        const xx = x[i]! * x[j]!;
        Tpc += xx * (vm.xi[i]?.[j] ?? 0);
        c += xx * ((vm.vE[i]?.[j] ?? 0) + tRef * (vm.vESlope?.[i]?.[j] ?? 0));
      }
  let delta = 0;
  let eps = 0;
  let vc = 0;
  const comps = mx.product.components;
  for (let i = 0; i < mx.n; i++) {
    const xi = x[i]!;
    if (xi === 0) continue;
    const m = comps[i]!;
    const k = correctionAtT(m.correction, m.Tc, m.vcCub, (mx.T * m.Tc) / Tpc);
    c += xi * k.c;
    delta += xi * k.delta;
    eps += xi * k.eps;
    vc += xi * m.vcCub;
  }
  const T = mx.T;
  const d = -((vCub * vCub) / (R * T)) * dPdv(family(mx), R, T, vCub, am, bm);
  return correctedVolume({ c, delta, eps, vcCub: vc }, vCub, d);
}
