/**
 * Never milder when hotter. A closed tank heated from one forecast peak to a hotter one keeps
 * its contents, so (physics of a closed vessel, any textbook of thermodynamics; common practice
 * for the limits): its pressure never falls, the not-full limit at the hotter peak is never
 * higher, the worst caution is never milder, and a tank full (liquid, or dense fluid above the
 * critical temperature) at or below the peak always carries a danger. Driven by fast-check over
 * every fluid, every LP-gas preset, random propane/n-butane blends and custom fluids, with the
 * peaks drawn across each product's critical temperature.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  checkTank,
  criticalTemperature,
  describeProduct,
  InputError,
  listFluids,
  type Product,
  type TankCheckInput,
  type TankCheckResult,
} from '../../thermo/index.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { propRuns, propShare } from '../helpers/prop-runs.js';

const RANK = { danger: 0, warning: 1, caution: 2, notice: 3 } as const;
const worst = (r: TankCheckResult) =>
  Math.min(...r.cautions.filter((c) => c.code !== 'standing').map((c) => RANK[c.level]), 4);

const fluids: Product[] = listFluids().map((f) => f.id);
const presets: Product[] = LPG_PRESETS.map((p) => p.product);
const product = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...fluids) },
  { weight: 2, arbitrary: fc.constantFrom(...presets) },
  {
    weight: 1,
    arbitrary: fc.double({ min: 0.05, max: 0.95, noNaN: true }).map((x): Product => ({
      components: [
        { id: 'propane', moleFraction: x },
        { id: 'n-butane', moleFraction: 1 - x },
      ],
    })),
  },
  {
    weight: 1,
    arbitrary: fc
      .record({
        molarMass: fc.double({ min: 0.03, max: 0.12, noNaN: true }),
        Tc: fc.double({ min: 290, max: 390, noNaN: true }),
        Pc: fc.double({ min: 3e6, max: 8e6, noNaN: true }),
        omega: fc.double({ min: 0.05, max: 0.35, noNaN: true }),
      })
      .map((c): Product => ({ custom: { name: 'Test fluid', ...c } })),
  },
);

/** A scenario: product, liquid now, contents as a multiple of the critical density, two peaks across Tc. */
const scenario = fc
  .record({
    product,
    below: fc.integer({ min: 2, max: 40 }),
    fillOfCritical: fc.double({ min: 0.3, max: 1.9, noNaN: true }),
    // Offsets from Tc in hundredths of a kelvin (integers spread evenly; doubles bunch near 0).
    a: fc.integer({ min: -1200, max: 1200 }).map((x) => x / 100),
    b: fc.integer({ min: -1200, max: 1200 }).map((x) => x / 100),
    designPressureGauge: fc.double({ min: 1e6, max: 3e7, noNaN: true }),
  })
  .map((s) => {
    const Tc = criticalTemperature(s.product);
    const rhoc = describeProduct(s.product).rhoc;
    const T = Math.max(200, Math.min(Tc - s.below, 330));
    const clamp = (x: number) => Math.min(400, Math.max(T, Tc + x));
    const [p1, p2] = [clamp(Math.min(s.a, s.b)), clamp(Math.max(s.a, s.b))];
    const input = (peak: number): TankCheckInput => ({
      tank: { waterCapacity: 1, designPressureGauge: s.designPressureGauge },
      product: s.product,
      liquidTemperature: T,
      contents: { netMass: s.fillOfCritical * rhoc },
      peakTemperature: peak,
    });
    return { Tc, rhoc, T, p1, p2, input };
  });

function tryCheck(i: TankCheckInput): TankCheckResult | null {
  try {
    return checkTank(i);
  } catch (e) {
    // More than the tank can hold at this temperature, or a peak beyond what the model can
    // hold: a refusal naming an input field is allowed, nothing else.
    if (e instanceof InputError && /^(contents\.netMass|peakTemperature)$/.test(e.field))
      return null;
    throw e;
  }
}

/** The invariants between a check at one peak (r1) and at a hotter one (r2), same tank and contents. */
function neverMilder(r1: TankCheckResult, r2: TankCheckResult, what: string): void {
  expect(r2.fillLimit.maxMass, `limit: ${what}`).toBeLessThanOrEqual(r1.fillLimit.maxMass);
  // Pressures are rounded up to 100 Pa: equal states may differ by one step.
  expect(r2.peak.pGauge, `peak pressure: ${what}`).toBeGreaterThanOrEqual(r1.peak.pGauge - 100);
  expect(r2.peak.headroomToRelief, `headroom: ${what}`).toBeLessThanOrEqual(
    r1.peak.headroomToRelief + 100,
  );
  expect(worst(r2), `worst caution: ${what}`).toBeLessThanOrEqual(worst(r1));
  for (const r of [r1, r2]) {
    const Tf = r.liquidFullTemperature;
    if (Tf !== null && Tf <= r.peak.temperature)
      expect(
        r.cautions.some((c) => c.level === 'danger'),
        `full at ${Tf} ≤ peak ${r.peak.temperature}: ${what}`,
      ).toBe(true);
    if (r.peak.full !== null)
      expect(r.cautions[0]!.level, `full at the peak: ${what}`).toBe('danger');
  }
}

const tally = { pairs: 0, crossing: 0, dense: 0 };

describe('checkTank is never milder when hotter (fast-check, peaks across Tc)', () => {
  it('a hotter peak never raises the limit, lowers the pressure or softens the worst caution', () => {
    fc.assert(
      fc.property(scenario, ({ Tc, T, p1, p2, input }) => {
        const r1 = tryCheck(input(p1));
        const r2 = tryCheck(input(p2));
        if (!r1 || !r2) return;
        tally.pairs++;
        if (p1 < Tc && p2 > Tc) tally.crossing++;
        if (r2.peak.full === 'dense-fluid') tally.dense++;
        const what = JSON.stringify(input(p2).product) + ` T ${T} peaks ${p1} → ${p2}`;
        neverMilder(r1, r2, what);
      }),
      { numRuns: propRuns(160), seed: 20261202 },
    );
    // The property must have crossed the critical temperature often, and seen dense fluid.
    expect(tally.pairs, JSON.stringify(tally)).toBeGreaterThan(propShare(160, 100));
    expect(tally.crossing, JSON.stringify(tally)).toBeGreaterThan(propShare(160, 20));
    expect(tally.dense, JSON.stringify(tally)).toBeGreaterThan(propShare(160, 5));
  });

  it('every fluid and preset, peaks stepped across Tc, at fills either side of ρc', () => {
    let steps = 0;
    for (const product of [...fluids, ...presets]) {
      const Tc = criticalTemperature(product);
      const rhoc = describeProduct(product).rhoc;
      const T = Math.max(200, Math.min(Tc - 10, 330));
      const peaks = [-4, -1, -0.3, 0.3, 1, 4]
        .map((d) => Math.min(400, Math.max(T, Tc + d)))
        .filter((p, i, a) => a.indexOf(p) === i);
      for (const fill of [0.7, 1.15, 1.6]) {
        const input = (peak: number): TankCheckInput => ({
          tank: { waterCapacity: 1, designPressureGauge: 1e7 },
          product,
          liquidTemperature: T,
          contents: { netMass: fill * rhoc },
          peakTemperature: peak,
        });
        let last: TankCheckResult | null = null;
        for (const peak of peaks) {
          const r = tryCheck(input(peak));
          if (!r) break; // past what the model can hold: the path ends
          if (last)
            neverMilder(
              last,
              r,
              `${JSON.stringify(product)} fill ${fill}ρc, ${last.peak.temperature} → ${peak}`,
            );
          last = r;
          steps++;
        }
      }
    }
    expect(steps).toBeGreaterThan(propShare(80, 200));
  });

  it('the relief temperature agrees with the headroom to relief', () => {
    fc.assert(
      fc.property(scenario, ({ T, p2, input }) => {
        const r = tryCheck(input(p2));
        if (!r) return;
        const Tr = r.reliefTemperature;
        const what = `${JSON.stringify(input(p2))} T ${T} peak ${p2} relief at ${Tr} headroom ${r.peak.headroomToRelief}`;
        // Headroom < 0 ⇔ the relief setting is reached at or below the peak (same allowance).
        // Rounding of the headroom to 100 Pa leaves a band of a few hundredths of a kelvin.
        if (r.peak.headroomToRelief < -1000)
          expect(Tr !== null && Tr <= r.peak.temperature + 0.05, what).toBe(true);
        if (r.peak.headroomToRelief > 1000 && Tr !== null)
          expect(Tr, what).toBeGreaterThan(r.peak.temperature - 0.05);
        if (Tr !== null) expect(Tr, what).toBeGreaterThanOrEqual(T);
      }),
      { numRuns: propRuns(80), seed: 11 },
    );
  });
});
