/**
 * Properties of the fill reconciliation over random tanks, products (pure and LP-gas blends),
 * temperatures and deliveries (fast-check):
 * - delivering exactly the room left (as a meter compensated to 60 °F reads it) at the same
 *   temperature reconciles to the stop-at percent: the expected level is the stop-at percent
 *   (within its 0.1-point rounding) and a gauge reading the stop-at is consistent, not over;
 * - a reading below the expected band is always flagged "reads low";
 * - random input gives finite numbers or an InputError naming a field, never anything else.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  InputError,
  reconcileFill,
  startFill,
  type FillStart,
  type TankCheckInput,
} from '../../thermo/index.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { checkClose } from '../helpers/check.js';
import { propRuns, propShare } from '../helpers/prop-runs.js';

const products = fc.oneof(
  {
    weight: 8,
    arbitrary: fc.constantFrom('propane', 'n-butane', 'isobutane', 'ammonia', 'propylene'),
  },
  // A commercial LP-gas blend now and then (slower: bubble points).
  { weight: 1, arbitrary: fc.constantFrom(...LPG_PRESETS.map((p) => p.product)) },
);

/** A random tank and a before-check that the check accepts (two-phase, below the limit). */
const starts = fc
  .record({
    product: products,
    waterCapacity: fc.double({ min: 0.1, max: 100, noNaN: true }),
    T: fc.double({ min: 255, max: 310, noNaN: true }),
    gauge: fc.double({ min: 2, max: 60, noNaN: true }),
    peakRise: fc.double({ min: 0, max: 15, noNaN: true }),
    placement: fc.constantFrom('aboveground' as const, 'underground' as const),
  })
  .map((r): FillStart | null => {
    const input: TankCheckInput = {
      tank: { waterCapacity: r.waterCapacity, designPressureGauge: 2.5e6, placement: r.placement },
      product: r.product,
      liquidTemperature: r.T,
      contents: { gaugePercent: r.gauge },
      peakTemperature: r.T + r.peakRise,
    };
    try {
      const s = startFill(input, undefined, new Date('2026-03-01T09:00:00Z'));
      return s.before.roomLeftMass > 1 ? s : null;
    } catch (e) {
      if (e instanceof InputError) return null;
      throw e;
    }
  });

describe('reconcileFill properties', () => {
  it('delivering exactly the room left reconciles to the stop-at percent', () => {
    fc.assert(
      fc.property(starts, (s) => {
        if (!s) return;
        const b = s.before;
        const r = reconcileFill({
          start: s,
          delivered: { volume: b.roomLeftVolumeAt60F, basis: 'compensated-60F' },
          after: { gaugePercent: b.stopAtGaugePercent },
        });
        // The stop-at is rounded down to 0.1 point: the level expected lies within 0.1 point
        // above it, less the check's other roundings (limit and room left down to 0.01 kg
        // each, room left at 60 °F down to 1e-6 m³ of liquid ≤ 650 kg/m³), taken over one
        // gauge scale's mass V·(ρL − ρV) ≥ V·400 kg/m³ for these products at 255–310 K
        // (saturation_properties.csv: propane at 100 °F, 471.4 − 28.5 kg/m³, is the least).
        const slack = ((0.02 + 650e-6) / (s.check.tank.waterCapacity * 400)) * 100 + 1e-6;
        checkClose({
          what: 'expected level − stop-at',
          input: { product: s.check.product, T: b.liquidTemperature, gauge: b.gaugePercent },
          actual: r.expectedGaugePercent - b.stopAtGaugePercent,
          expected: 0.05 - slack / 2,
          atol: 0.05 + slack / 2,
          kind: 'identity',
          source: 'definition of the stop-at percent (checkTank fill limit)',
          why: 'stop-at rounded down to 0.1 point',
        });
        expect(r.verdict).toBe('consistent');
        expect(r.overMass).toBe(0);
      }),
      { numRuns: propRuns(25), seed: 11 },
    );
  });

  it('a gauge reading below the expected band is always flagged "reads low"', () => {
    const cases = fc.record({
      start: starts,
      share: fc.double({ min: 0.2, max: 1, noNaN: true }),
      u: fc.double({ min: 0, max: 0.999, noNaN: true }),
      dT: fc.double({ min: -10, max: 10, noNaN: true }),
    });
    let tested = 0;
    fc.assert(
      fc.property(cases, ({ start: s, share, u, dT }) => {
        if (!s) return;
        const Tafter = s.before.liquidTemperature + dT;
        const delivered = { volume: share * s.before.roomLeftVolumeAt60F };
        const run = (gaugePercent: number) =>
          reconcileFill({
            start: s,
            delivered,
            after: { gaugePercent, liquidTemperature: Tafter },
          });
        // The expected level and band, from a neutral reading.
        const probe = run(100);
        // The lowest reading accepted: what the contents before alone read at the after
        // temperature (a delivery cannot lower the level); a reading of 0 is refused with it.
        let floor = 0;
        try {
          run(0);
        } catch (e) {
          if (!(e instanceof InputError) || e.field !== 'after.gaugePercent') throw e;
          floor = e.limits?.min ?? 0;
        }
        const top = probe.expectedGaugePercent - probe.band.halfWidth;
        if (top <= floor) return;
        const reading = floor + (top - floor) * u;
        const r = run(reading);
        tested++;
        expect(r.findings.map((f) => f.code)).toContain('fill-gauge-low');
        expect(['gauge-low', 'over-limit']).toContain(r.verdict);
      }),
      { numRuns: propRuns(30), seed: 7 },
    );
    // The property must have been exercised, not skipped.
    expect(tested).toBeGreaterThan(propShare(30, 10));
  });

  it('random input gives finite figures or an InputError', () => {
    const junk = fc.oneof(
      fc.double(),
      fc.constant(undefined),
      fc.constant(null),
      fc.string(),
      fc.integer({ min: -5, max: 500 }),
    );
    fc.assert(
      fc.property(starts, junk, junk, junk, (s, v, g, T) => {
        if (!s) return;
        try {
          const r = reconcileFill({
            start: s,
            delivered: { volume: v as number },
            after: { gaugePercent: g as number, liquidTemperature: T as number },
          });
          const text = JSON.stringify(r);
          expect(text).not.toMatch(/NaN|Infinity|null,"quantity"/);
          expect(Number.isFinite(r.expectedGaugePercent)).toBe(true);
        } catch (e) {
          expect(e, String(e)).toBeInstanceOf(InputError);
          expect((e as InputError).field).toMatch(/^(delivered|after|start)\./);
        }
      }),
      { numRuns: propRuns(40), seed: 3 },
    );
  });
});
