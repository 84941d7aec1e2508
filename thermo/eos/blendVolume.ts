/**
 * The volume-correction mixing rule of blends: the model's molar volume of a phase of
 * composition x from the cubic's vCub (volumeCorrection.ts gives the pure-fluid form).
 *
 * The correction terms mix linearly in mole fraction, each component's taken at the phase's
 * reduced temperature T/Tpc (Kay's rule, Tpc = Σ x_i·Tc_i) rather than at T itself: the steep
 * near-critical shape of c_i(T) then follows the blend's own critical region instead of
 * switching on at each component's Tc (a propane-rich liquid at 370 K is far from critical even
 * though propane alone would be). For a pure fluid this is exactly the pure-fluid correction.
 *
 * Where a product carries fitted binary volume parameters (the refrigerant blends,
 * data/kij-fitted.ts, written by scripts/fit-blends.ts), three quadratic excesses
 * Σ_i Σ_j x_i·x_j·(…)_ij are added, the form of the reducing functions of the multi-fluid
 * mixture models:
 * - ξ_ij to the pseudo-critical temperature Tpc, K;
 * - v^E_ij(T) = v^E_ij + v^E′_ij·t (t = T/T_REF − 1) to the translation c, m³/mol;
 * - δ^E_ij to the amplitude δ of the distance-function term, m³/mol. That term is largest at
 *   the critical point and fades in the compressed liquid (volumeCorrection.ts), so its excess
 *   acts where the blend's liquid nears its critical region (the last 20 K below it), which a
 *   temperature polynomial in v^E would follow only by bending the whole range.
 * All act after equilibrium, like the rest of the correction.
 */
import { R_J_molK } from '../constants.js';
import { T_REF_KIJ } from '../data/kij.js';
import type { MixtureAtT } from '../solvers/mixtureModel.js';
import { dPdv } from './cubic.js';
import { correctedVolume, correctionAtT } from './volumeCorrection.js';

/** Σ_i Σ_j x_i·x_j·m_ij of a symmetric matrix (0 where absent). */
function quadratic(m: readonly (readonly number[])[] | undefined, x: ArrayLike<number>, n: number) {
  if (!m) return 0;
  let s = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) s += x[i]! * x[j]! * (m[i]?.[j] ?? 0);
  return s;
}

export function mixtureModelVolume(
  mx: MixtureAtT,
  x: ArrayLike<number>,
  vCub: number,
  am: number,
  bm: number,
): number {
  const { n, T } = mx;
  const vm = mx.product.volumeMixing;
  let Tpc = quadratic(vm?.xi, x, n);
  for (let i = 0; i < n; i++) Tpc += x[i]! * mx.Tc[i]!;
  let c = quadratic(vm?.vE, x, n) + (T / T_REF_KIJ - 1) * quadratic(vm?.vESlope, x, n);
  let delta = quadratic(vm?.deltaE, x, n);
  let eps = 0;
  let vc = 0;
  const comps = mx.product.components;
  for (let i = 0; i < n; i++) {
    const xi = x[i]!;
    if (xi === 0) continue;
    const m = comps[i]!;
    const k = correctionAtT(m.correction, m.Tc, m.vcCub, (T * m.Tc) / Tpc);
    c += xi * k.c;
    delta += xi * k.delta;
    eps += xi * k.eps;
    vc += xi * m.vcCub;
  }
  const fam = comps[0]!.family;
  const d = -((vCub * vCub) / (R_J_molK * T)) * dPdv(fam, R_J_molK, T, vCub, am, bm);
  return correctedVolume({ c, delta, eps, vcCub: vc }, vCub, d);
}
