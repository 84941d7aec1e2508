/**
 * The blends' volume-correction mixing rule (eos/blendVolume.ts): its pure-fluid limit against
 * the pure-fluid path (solvers/pure.ts, a separate implementation of the same correction), and
 * the saturated and compressed liquid of the refrigerant blends against their reference tables
 * (test/reference/blends/: Lemmon & Jacobsen 2004, J. Phys. Chem. Ref. Data 33, 593–620 for
 * R-410A, R-404A, R-407C; Bell 2023, J. Phys. Chem. Ref. Data 52, 013101 for R-454B).
 */
import { describe, it } from 'vitest';
import { resolveProduct, type Product } from '../../thermo/product.js';
import { mixtureAtT, phaseAt, saturationPressure } from '../../thermo/solvers/mixture.js';
import { pureVolume } from '../../thermo/solvers/pure.js';
import { checkClose } from '../helpers/check.js';
import { BLEND_TARGETS, readTable } from '../reference/measure.js';

const SRC = (id: string) =>
  `${id === 'r454b' ? 'Bell 2023' : 'Lemmon & Jacobsen 2004'} mixture model, test/reference/blends/${id}.csv`;

describe('mixtureModelVolume', () => {
  it.each([
    [
      'propane in propane/n-butane',
      {
        components: [
          { id: 'propane', moleFraction: 0.5 },
          { id: 'n-butane', moleFraction: 0.5 },
        ],
      },
      0,
    ],
    [
      'n-butane in propane/n-butane',
      {
        components: [
          { id: 'propane', moleFraction: 0.5 },
          { id: 'n-butane', moleFraction: 0.5 },
        ],
      },
      1,
    ],
    ['R-32 in R-410A (fitted volume excesses)', 'r410a', 0],
    ['R-125 in R-410A', 'r410a', 1],
  ] as [string, Product, number][])(
    'a blend reduced to %s has the pure fluid’s volume, liquid and vapour',
    (_, prod, k) => {
      const r = resolveProduct(prod);
      const m = r.components[k]!;
      const x = r.z.map((_, i) => (i === k ? 1 : 0));
      for (const [T, p, branch] of [
        [250, 3e6, 'liquid'],
        [300, 6e6, 'liquid'],
        [0.97 * m.Tc, 0.95 * m.pc, 'liquid'],
        [300, 2e5, 'vapour'],
        [0.98 * m.Tc, 0.6 * m.pc, 'vapour'],
      ] as const) {
        checkClose({
          what: 'model volume of the pure limit',
          input: { T, p, branch },
          actual: phaseAt(mixtureAtT(r, T), p, x, branch).v,
          expected: pureVolume(m, T, p, branch),
          rtol: 1e-12,
          kind: 'identity',
          source: 'Kay’s rule reduces to the pure fluid; pure path in solvers/pure.ts',
        });
      }
    },
  );

  it.each(['r410a', 'r404a', 'r407c', 'r454b'])(
    '%s: bubble-liquid and compressed-liquid density within the stated targets',
    (id) => {
      const r = resolveProduct(id);
      const sat = readTable(`blends/${id}.csv`);
      const liq = readTable(`blends/${id}-liquid.csv`);
      for (const T of [243.15, 283.15, 318.15, 333.15]) {
        const row = sat.find((x) => Math.abs(+x.T_K! - T) < 0.01)!;
        const mx = mixtureAtT(r, T);
        const b = saturationPressure(mx, r.z, 'bubble');
        const M = r.molarMass;
        checkClose({
          what: 'bubble-liquid density',
          input: { id, T },
          actual: M / b.vBulk,
          expected: +row.rhoL_bubble_kg_m3!,
          rtol: BLEND_TARGETS.rhoL,
          kind: 'published',
          source: SRC(id),
        });
        const lr = liq.find((x) => Math.abs(+x.T_K! - T) < 0.01)!;
        checkClose({
          what: 'compressed-liquid density',
          input: { id, T, p: +lr.p_Pa! },
          actual: M / phaseAt(mx, +lr.p_Pa!, r.z, 'liquid').v,
          expected: +lr.rho_kg_m3!,
          rtol: BLEND_TARGETS.compressed,
          kind: 'published',
          source: SRC(id),
        });
      }
    },
  );
});
