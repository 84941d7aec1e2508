/**
 * The asymmetric attraction term of R-32/R-1234yf (thermo/eos/asymmetricMixing.ts) against
 * thermodynamic identities, computed here independently of the solver's derivative algebra:
 * ln φ_i = ∂(n·g_res)/∂n_i at constant T and p, where g_res = G_res/(n·R·T) of the generic cubic,
 * g_res = Z − 1 − ln(Z − B) − (A/B)·ln((Z + δ1·B)/(Z + δ2·B))/(δ1 − δ2), is evaluated from a
 * mixture a written out term by term, a = Σ_i Σ_j x_i·x_j·√(a_i·a_j)·(1 − k_ij − m_ij·(x_i − x_j))
 * (Adachi & Sugie 1986, Fluid Phase Equilib. 28, 103–118), and differentiated by central
 * differences in the mole numbers.
 */
import { describe, it } from 'vitest';
import { compressibilityRoots, logTerm } from '../../thermo/eos/cubic.js';
import { resolveProduct } from '../../thermo/product.js';
import { mixtureAtT, phaseAt } from '../../thermo/solvers/mixture.js';
import { R_J_molK as R } from '../../thermo/constants.js';
import { checkClose } from '../helpers/check.js';

const product = resolveProduct('r454b', { model: 'tuned' });

/** g_res at (T, p) for mole numbers nv, on the liquid (first) or vapour (last) root. */
function gRes(T: number, p: number, nv: number[], root: 'liquid' | 'vapour'): number {
  const mx = mixtureAtT(product, T);
  const n = mx.n;
  const sum = nv.reduce((s, v) => s + v, 0);
  const x = nv.map((v) => v / sum);
  const m = product.kijAsym!;
  let a = 0;
  let b = 0;
  for (let i = 0; i < n; i++) {
    b += x[i]! * mx.b[i]!;
    for (let j = 0; j < n; j++) {
      const sym = mx.aij[i * n + j]!; // √(a_i·a_j)·(1 − k_ij(T))
      const root_ij = Math.sqrt(mx.aij[i * n + i]! * mx.aij[j * n + j]!);
      a += x[i]! * x[j]! * (sym - root_ij * m[i]![j]! * (x[i]! - x[j]!));
    }
  }
  const A = (a * p) / (R * R * T * T);
  const B = (b * p) / (R * T);
  const fam = product.components[0]!.family;
  const roots = compressibilityRoots(fam, A, B);
  const Z = root === 'liquid' ? roots[0]! : roots.at(-1)!;
  return Z - 1 - Math.log(Z - B) - (A / B) * logTerm(fam, Z, B);
}

describe('asymmetric attraction term (R-454B: R-32/R-1234yf)', () => {
  it('is present in the resolved product and antisymmetric', () => {
    const m = product.kijAsym!;
    checkClose({
      what: 'm_12 + m_21',
      input: { m12: m[0]![1], m21: m[1]![0] },
      actual: m[0]![1]! + m[1]![0]!,
      expected: 0,
      atol: 0,
      kind: 'identity',
      source: 'definition m_ji = −m_ij (Adachi & Sugie 1986)',
    });
  });

  it.each([
    [250, 1.5e6, 'liquid', [0.83, 0.17]],
    [250, 1.5e6, 'liquid', [0.3, 0.7]],
    [320, 0.8e6, 'vapour', [0.83, 0.17]],
    [320, 0.8e6, 'vapour', [0.5, 0.5]],
  ] as const)('ln φ_i = ∂(n·g_res)/∂n_i at T = %f K, p = %f Pa (%s, x = %j)', (T, p, root, x) => {
    const ph = phaseAt(mixtureAtT(product, T), p, x, root, false);
    for (let i = 0; i < 2; i++) {
      const h = 1e-5;
      const up = x.map((v, k) => (k === i ? v + h : v));
      const dn = x.map((v, k) => (k === i ? v - h : v));
      const nUp = up.reduce((s, v) => s + v, 0);
      const nDn = dn.reduce((s, v) => s + v, 0);
      const fd = (nUp * gRes(T, p, up, root) - nDn * gRes(T, p, dn, root)) / (2 * h);
      checkClose({
        what: `ln φ_${i + 1}`,
        input: { T, p, root, x: x.join('/') },
        actual: ph.lnPhi[i]!,
        expected: fd,
        atol: 1e-7,
        kind: 'identity',
        source: 'ln φ_i = ∂(n·G_res/RT)/∂n_i at constant T, p; central difference h = 1e-5 mol',
      });
    }
  });
});
