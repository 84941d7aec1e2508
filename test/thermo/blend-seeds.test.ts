// The blend seeds (thermo/solvers/blendSeeds.ts, data in thermo/data/blend-seeds.ts) start the
// bubble-point solver near the top of each offered blend's curve, to make a blend's first check
// fast. They may change the work, never the answer: each stored top equals the check's own
// bisection run without seeds, and full tank checks give the same figures with and without them
// (kind: identity — the same quantities computed on two paths). Inputs are made-up placeholder
// tanks, not demo data.
import { describe, expect, it, vi } from 'vitest';
import { checkClose } from '../helpers/check.js';
import type { TankCheckInput } from '../../thermo/check/types.js';

type Modules = {
  checkTank: typeof import('../../thermo/check/checkTank.js').checkTank;
  ProductModel: typeof import('../../thermo/check/model.js').ProductModel;
  resolveProduct: typeof import('../../thermo/product.js').resolveProduct;
  seeds: typeof import('../../thermo/solvers/blendSeeds.js');
  presets: typeof import('../../thermo/rules/presets.js').LPG_PRESETS;
};

/** A fresh copy of the engine (no caches shared with another copy), seeds on or off. */
async function engine(seeded: boolean): Promise<Modules> {
  vi.resetModules();
  const seeds = await import('../../thermo/solvers/blendSeeds.js');
  seeds.useBlendSeeds(seeded);
  return {
    checkTank: (await import('../../thermo/check/checkTank.js')).checkTank,
    ProductModel: (await import('../../thermo/check/model.js')).ProductModel,
    resolveProduct: (await import('../../thermo/product.js')).resolveProduct,
    seeds,
    presets: (await import('../../thermo/rules/presets.js')).LPG_PRESETS,
  };
}

const K = 273.15;
const PSI = 6894.757293168;
function input(product: TankCheckInput['product'], tC: number, gauge: number, peakC: number) {
  return {
    tank: {
      waterCapacity: 3.785,
      designPressureGauge: 250 * PSI,
      reliefSetPressureGauge: 220 * PSI,
    },
    product,
    liquidTemperature: tC + K,
    contents: { gaugePercent: gauge },
    peakTemperature: peakC + K,
  } as TankCheckInput;
}

describe('blend seeds', () => {
  it('store, for every offered blend, the top the check finds without them', async () => {
    const e = await engine(false);
    const products = [
      ...e.presets.map((p) => p.product).filter((p) => p.components.length > 1),
      'r410a',
      'r404a',
      'r407c',
      'r507a',
      'r454b',
    ] as const;
    for (const p of products) {
      const stored = e.seeds.useBlendSeeds;
      stored(true);
      const seed = e.seeds.blendSeed(e.resolveProduct(p));
      stored(false);
      expect(seed, JSON.stringify(p)).toBeDefined();
      const top = new e.ProductModel(p).satTop();
      checkClose({
        what: `top of the bubble curve of ${JSON.stringify(p)}`,
        kind: 'identity',
        source: 'ProductModel.satTop bisection without seeds',
        input: p,
        actual: seed!.top,
        expected: top,
        atol: 0, // the same computation: exactly equal, else regenerate the seeds
      });
    }
    // With the seeds on, the check takes each stored top (its bubble point found again from the
    // stored row) rather than falling back to the bisection: the point of the seeds.
    const on = await engine(true);
    for (const p of products) {
      const seed = on.seeds.blendSeed(on.resolveProduct(p))!;
      expect(new on.ProductModel(p).satTop(), `seeded top of ${JSON.stringify(p)}`).toBe(seed.top);
    }
  }, 300_000);

  it('leave the figures of a blend check unchanged', async () => {
    const hd5 = (await engine(false)).presets.find((p) => p.id === 'hd5-limit')!.product;
    const cases = [
      input(hd5, 21, 62, 40),
      input(hd5, -10, 80, 45),
      input(hd5, 35, 88, 50),
      input('r410a', 20, 50, 45),
    ];
    const off = await engine(false);
    const plain = cases.map((c) => off.checkTank(c));
    const on = await engine(true);
    const seeded = cases.map((c) => on.checkTank(c));
    plain.forEach((a, i) => {
      const b = seeded[i]!;
      const pairs: [string, number | null, number | null][] = [
        ['pressure', b.pAbs, a.pAbs],
        ['stop-at gauge percent', b.fillLimit.stopAtGaugePercent, a.fillLimit.stopAtGaugePercent],
        ['peak pressure', b.peak.pAbs, a.peak.pAbs],
        ['liquid-full temperature', b.liquidFullTemperature, a.liquidFullTemperature],
        ['relief temperature', b.reliefTemperature, a.reliefTemperature],
      ];
      for (const [what, actual, expected] of pairs) {
        expect(actual === null, what).toBe(expected === null);
        if (actual === null || expected === null) continue;
        checkClose({
          what: `${what}, case ${i}`,
          kind: 'identity',
          source: 'the same check without seeds',
          input: cases[i],
          actual,
          expected,
          // Solver tolerances: pressures converge to ~1e-9 relative; the temperature searches
          // stop at 0.002–0.005 K (thermo/check/search.ts), from different starting points.
          rtol: what.includes('temperature') ? 2e-5 : 1e-6,
        });
      }
    });
  }, 300_000);
});
