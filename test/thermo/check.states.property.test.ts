/**
 * Properties of the states and refusals of the check, over every LP-gas preset, random
 * propane/n-butane blends and every fluid: a blend at 100 % on the float gauge is liquid-full
 * (the gauge reads the liquid filling the tank: definition of the reading); a blend's pressure
 * never falls as a closed tank warms (physics of a closed vessel); any non-number in a numeric
 * field — a BigInt, a string, an object — gives InputError naming that field; `maxDensity`
 * refuses a bad temperature like the rest of the API.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  checkTank,
  InputError,
  listFluids,
  maxDensity,
  type Product,
  type TankCheckInput,
} from '../../thermo/index.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { propRuns } from '../helpers/prop-runs.js';

const blends = fc.oneof(
  fc.constantFrom(...LPG_PRESETS.map((p) => p.product as Product)),
  fc.integer({ min: 5, max: 95 }).map((x): Product => ({
    components: [
      { id: 'propane', moleFraction: x / 100 },
      { id: 'n-butane', moleFraction: 1 - x / 100 },
    ],
  })),
);

describe('checkTank states and refusals (fast-check)', () => {
  it('a blend at 100 % gauge is liquid-full now, with a danger', () => {
    fc.assert(
      fc.property(blends, fc.integer({ min: 250, max: 310 }), (product, T) => {
        const r = checkTank({
          tank: { waterCapacity: 1, designPressureGauge: 1.72e6 },
          product,
          liquidTemperature: T,
          contents: { gaugePercent: 100 },
          peakTemperature: T,
        });
        expect(r.phase, JSON.stringify(product)).toBe('liquid-full');
        expect(r.cautions[0]!.level).toBe('danger');
      }),
      { numRuns: propRuns(25), seed: 5 },
    );
  });

  it('a blend’s pressure never falls along a heating path, nearly empty to nearly full', () => {
    fc.assert(
      fc.property(
        blends,
        fc.constantFrom(0.01, 0.031, 0.5, 5, 50, 95, 99.9),
        fc.integer({ min: 250, max: 300 }),
        (product, gauge, T) => {
          const at = (peak: number) =>
            checkTank({
              tank: { waterCapacity: 5.116, designPressureGauge: 1e7 },
              product,
              liquidTemperature: T,
              contents: { gaugePercent: gauge },
              peakTemperature: peak,
            }).peak.pGauge;
          let last = -Infinity;
          for (let peak = T; peak <= T + 40; peak += 5) {
            let p: number;
            try {
              p = at(peak);
            } catch (e) {
              // Past what the model can hold (liquid-full long before): the path ends there.
              if (e instanceof InputError && e.field === 'peakTemperature') break;
              throw e;
            }
            expect(
              p,
              `${JSON.stringify(product)} ${gauge} % from ${T} K at ${peak} K`,
            ).toBeGreaterThanOrEqual(last);
            last = p;
          }
        },
      ),
      { numRuns: propRuns(25), seed: 9 },
    );
  });

  it('a BigInt, string or object in any numeric field gives InputError naming that field', () => {
    const base: TankCheckInput = {
      tank: { waterCapacity: 1, designPressureGauge: 1.72e6, reliefSetPressureGauge: 1.5e6 },
      product: 'propane',
      liquidTemperature: 290,
      contents: { gaugePercent: 50 },
      pressureReadingGauge: 7e5,
      peakTemperature: 300,
    };
    const fields = [
      'tank.waterCapacity',
      'tank.designPressureGauge',
      'tank.reliefSetPressureGauge',
      'liquidTemperature',
      'contents.gaugePercent',
      'pressureReadingGauge',
      'peakTemperature',
    ];
    const junk = fc.oneof(
      fc.bigInt(),
      fc.string(),
      fc.constant({ valueOf: () => 300 }),
      fc.constant([300]),
    );
    fc.assert(
      fc.property(fc.constantFrom(...fields), junk, (field, value) => {
        const copy = structuredClone(base) as unknown as Record<string, Record<string, unknown>>;
        const [a, b] = field.split('.');
        if (b) copy[a!]![b] = value;
        else (copy as Record<string, unknown>)[a!] = value;
        let err: unknown;
        try {
          checkTank(copy as unknown as TankCheckInput);
        } catch (e) {
          err = e;
        }
        expect(err, `${field} = ${String(value)}`).toBeInstanceOf(InputError);
        expect((err as InputError).field).toBe(field);
      }),
      { numRuns: propRuns(100), seed: 3 },
    );
  });

  it('maxDensity refuses a bad temperature with InputError naming T, for every fluid', () => {
    const ids = listFluids().map((f) => f.id);
    fc.assert(
      fc.property(
        fc.constantFrom(...ids),
        fc.oneof(
          fc.bigInt(),
          fc.string(),
          fc.constant(Number.NaN),
          fc.constant(-1),
          fc.constant(1e9),
        ),
        (id, T) => {
          expect(() => maxDensity(id, T as unknown as number)).toThrow(InputError);
        },
      ),
      { numRuns: propRuns(60), seed: 4 },
    );
  });
});
