/**
 * solvers/phaseDerivatives.ts (the analytic derivatives of ln φ_i that Newton's method on a
 * bubble or dew point uses) against central differences of the fugacity function itself
 * (`phaseAt`), which is written in the compressibility form and shares no derivative code:
 *   n·∂ln φ_i/∂n_j from ln φ_i((x + h·e_j)/(1 + h)) (ln φ is homogeneous of degree 0 in the
 *   mole numbers), ∂ln φ_i/∂p from ln φ_i at p(1 ± h).
 * Also the Gibbs–Duhem identity Σ_j x_j·n·∂ln φ_i/∂n_j = 0 and the symmetry of that matrix
 * (Michelsen & Mollerup, Thermodynamic Models: Fundamentals and Computational Aspects, 2nd
 * ed., ch. 2). Cases cover both roots, the one-root region near a blend's critical point, a
 * three-component refrigerant blend and R-454B, whose pair uses the asymmetric mixing term.
 */
import { describe, expect, it } from 'vitest';
import { resolveProduct, type Product } from '../../thermo/product.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { mixtureAtT, phaseAt } from '../../thermo/solvers/mixtureModel.js';
import { phaseDerivatives } from '../../thermo/solvers/phaseDerivatives.js';

const HD5 = LPG_PRESETS.find((p) => p.id === 'hd5-limit')!.product;

const CASES: { what: string; product: Product; T: number; p: number; root: 'liquid' | 'vapour' }[] =
  [
    { what: 'LP-gas blend, liquid root', product: HD5, T: 300, p: 1.2e6, root: 'liquid' },
    { what: 'LP-gas blend, vapour root', product: HD5, T: 300, p: 0.8e6, root: 'vapour' },
    {
      what: 'LP-gas blend, one root near its critical point',
      product: HD5,
      T: 366,
      p: 3.9e6,
      root: 'vapour',
    },
    { what: 'R-407C, liquid', product: 'r407c', T: 290, p: 1.5e6, root: 'liquid' },
    {
      what: 'R-454B (asymmetric term), liquid',
      product: 'r454b',
      T: 300,
      p: 1.5e6,
      root: 'liquid',
    },
    {
      what: 'R-454B (asymmetric term), vapour',
      product: 'r454b',
      T: 300,
      p: 1.0e6,
      root: 'vapour',
    },
  ];

describe('phaseDerivatives against central differences of phaseAt', () => {
  for (const c of CASES) {
    it(c.what, () => {
      const r = resolveProduct(c.product);
      const mx = mixtureAtT(r, c.T);
      const x = Array.from(r.z);
      const n = mx.n;
      const ph = phaseAt(mx, c.p, x, c.root, false);
      const d = phaseDerivatives(mx, c.p, x, ph.Z);
      const Phi = d.dlnPhidn!;
      // Asked without the composition matrix: the same pressure derivatives.
      expect(Array.from(phaseDerivatives(mx, c.p, x, ph.Z, false).dlnPhidp)).toEqual(
        Array.from(d.dlnPhidp),
      );
      // Composition: one column per component.
      const h = 1e-6;
      let scale = 0;
      for (let j = 0; j < n; j++) {
        const up = phaseAt(
          mx,
          c.p,
          x.map((v, k) => (v + (k === j ? h : 0)) / (1 + h)),
          c.root,
          false,
        );
        const dn = phaseAt(
          mx,
          c.p,
          x.map((v, k) => (v - (k === j ? h : 0)) / (1 - h)),
          c.root,
          false,
        );
        expect(up.nRoots, 'same root count either side').toBe(ph.nRoots);
        for (let i = 0; i < n; i++) {
          const fd = (up.lnPhi[i]! - dn.lnPhi[i]!) / (2 * h);
          scale = Math.max(scale, Math.abs(fd));
          // Central difference truncation with h = 1e-6: measured at most 1.4e-9.
          expect(Math.abs(Phi[i * n + j]! - fd), `Φ[${i}][${j}]`).toBeLessThan(1e-7);
        }
      }
      expect(scale, 'a composition dependence worth testing').toBeGreaterThan(1e-2);
      // Pressure.
      const hp = c.p * 1e-6;
      const pu = phaseAt(mx, c.p + hp, x, c.root, false);
      const pd = phaseAt(mx, c.p - hp, x, c.root, false);
      for (let i = 0; i < n; i++) {
        const fd = (pu.lnPhi[i]! - pd.lnPhi[i]!) / (2 * hp);
        expect(Math.abs(d.dlnPhidp[i]! / fd - 1), `∂ln φ_${i}/∂p`).toBeLessThan(1e-6);
      }
      // Gibbs–Duhem and symmetry.
      for (let i = 0; i < n; i++) {
        let gd = 0;
        for (let j = 0; j < n; j++) {
          gd += x[j]! * Phi[i * n + j]!;
          expect(Math.abs(Phi[i * n + j]! - Phi[j * n + i]!)).toBeLessThan(1e-12);
        }
        expect(Math.abs(gd), `Σ_j x_j Φ[${i}][j]`).toBeLessThan(1e-12);
      }
    });
  }
});
