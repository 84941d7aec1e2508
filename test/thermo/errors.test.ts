/**
 * InputError's `limits`: the valid range of a refused number as numbers, so the app can show it
 * in the user's units. The SI message stays what scripts read; the limits must say the same
 * range, and they must be the real edge: a value at a limit is accepted, one past it refused.
 * No numeric check here rests on published data (the ranges are our own choices), so every
 * comparison is exact or against a value the same call computes (kind: identity).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  checkTank,
  closedTank,
  InputError,
  liquidDensity,
  listFluids,
  maxDensity,
  saturation,
  type InputLimits,
  type TankCheckInput,
} from '../../thermo/index.js';
import { tankHeight } from '../../thermo/tank/geometry.js';
import { toSI, UNITS } from '../../thermo/units.js';
import { propRuns } from '../helpers/prop-runs.js';

const F = (x: number) => toSI('temperature', x, 'F');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const gal = (x: number) => toSI('volume', x, 'usgal');

function base(over: Partial<TankCheckInput> = {}): TankCheckInput {
  return {
    tank: { waterCapacity: gal(1000), designPressureGauge: psig(250) },
    product: 'propane',
    liquidTemperature: F(80),
    contents: { gaugePercent: 60 },
    peakTemperature: F(80),
    ...over,
  };
}

/** The InputError `fn` throws (fails the test when it throws nothing or something else). */
function inputError(fn: () => unknown): InputError {
  try {
    fn();
  } catch (e) {
    expect(e, String(e)).toBeInstanceOf(InputError);
    return e as InputError;
  }
  throw new Error('expected an InputError, got a result');
}

/** The limits of the InputError `fn` throws, after checking its field. */
function limitsOf(fn: () => unknown, field: string): InputLimits {
  const e = inputError(fn);
  expect(e.field, e.message).toBe(field);
  expect(e.limits, `no limits on: ${e.message}`).toBeDefined();
  return e.limits!;
}

describe('InputError', () => {
  it('InputError keeps its three-argument form: same message, no limits', () => {
    const e = new InputError('liquidTemperature', 'from 150 to 400 K', 100);
    expect(e.message).toBe('liquidTemperature must be from 150 to 400 K (got 100)');
    expect(e.validRange).toBe('from 150 to 400 K');
    expect(e.limits).toBeUndefined();
  });

  it('InputError carries the limits without changing the SI message', () => {
    const limits = { min: 150, max: 400, quantity: 'temperature' } as const;
    const e = new InputError('liquidTemperature', 'from 150 to 400 K', 100, limits);
    expect(e.message).toBe('liquidTemperature must be from 150 to 400 K (got 100)');
    expect(e.limits).toEqual(limits);
  });
});

describe('InputError codes', () => {
  it('checkTank says which kind of refusal: not a number, out of range, or invalid', () => {
    const base: TankCheckInput = {
      tank: { waterCapacity: 1, designPressureGauge: 1.72e6 },
      product: 'propane',
      liquidTemperature: 290,
      contents: { gaugePercent: 50 },
      peakTemperature: 300,
    };
    const codeOf = (patch: Partial<TankCheckInput>) => {
      try {
        checkTank({ ...base, ...patch });
      } catch (e) {
        if (e instanceof InputError) return [e.field, e.code];
        throw e;
      }
      return null;
    };
    expect(codeOf({ liquidTemperature: 1n as unknown as number })).toEqual([
      'liquidTemperature',
      'not-a-number',
    ]);
    expect(codeOf({ liquidTemperature: '290' as unknown as number })).toEqual([
      'liquidTemperature',
      'not-a-number',
    ]);
    expect(codeOf({ liquidTemperature: 1000 })).toEqual(['liquidTemperature', 'out-of-range']);
    expect(codeOf({ product: 'no-such-fluid' })![1]).toBe('invalid');
  });
});

describe('checkTank limits', () => {
  it('checkTank gives the liquid temperature range in K with its quantity, message unchanged', () => {
    const e = inputError(() => checkTank(base({ liquidTemperature: 100 })));
    expect(e.field).toBe('liquidTemperature');
    expect(e.message).toBe('liquidTemperature must be from 150 to 400 K (got 100)');
    expect(e.limits).toEqual({ min: 150, max: 400, quantity: 'temperature' });
  });

  it('checkTank gives a product’s own lower temperature limit (ammonia: above its triple point)', () => {
    // Ammonia's triple point (195.5 K) lies above the check's 150 K, so the product's limit binds.
    const l = limitsOf(
      () => checkTank(base({ product: 'ammonia', liquidTemperature: 190 })),
      'liquidTemperature',
    );
    const Ttriple = listFluids().find((f) => f.id === 'ammonia')!.Ttriple;
    expect(l.quantity).toBe('temperature');
    expect(l.min).toBeGreaterThan(Ttriple);
    expect(l.min).toBeLessThan(Ttriple + 0.1);
    expect(l.max).toBe(400);
    expect(l.note).toBe('for this product');
    // identity: the lower limit itself is accepted
    expect(() => checkTank(base({ product: 'ammonia', liquidTemperature: l.min! }))).not.toThrow();
  });

  // Each field refused with a value outside its range: the quantity its limits measure.
  const cases: [string, Partial<TankCheckInput>, InputLimits['quantity']][] = [
    [
      'tank.waterCapacity',
      { tank: { waterCapacity: 0, designPressureGauge: psig(250) } },
      'volume',
    ],
    [
      'tank.designPressureGauge',
      { tank: { waterCapacity: 1, designPressureGauge: 5 } },
      'gaugePressure',
    ],
    [
      'tank.reliefSetPressureGauge',
      { tank: { waterCapacity: 1, designPressureGauge: psig(250), reliefSetPressureGauge: 2e8 } },
      'gaugePressure',
    ],
    [
      'tank.minDesignMetalTemperature',
      { tank: { waterCapacity: 1, designPressureGauge: psig(250), minDesignMetalTemperature: 10 } },
      'temperature',
    ],
    [
      'tank.shape.diameter',
      {
        tank: {
          waterCapacity: 1,
          designPressureGauge: psig(250),
          shape: { kind: 'sphere', diameter: 80 },
        },
      },
      'length',
    ],
    ['peakTemperature', { peakTemperature: 500 }, 'temperature'],
    ['barometricPressureAbs', { barometricPressureAbs: 5000 }, 'pressure'],
    ['elevation', { elevation: 20_000 }, 'length'],
    ['pressureReadingGauge', { pressureReadingGauge: -2e5 }, 'gaugePressure'],
    ['pressureGauge.fullScaleGauge', { pressureGauge: { fullScaleGauge: 1 } }, 'gaugePressure'],
    ['pressureGauge.accuracy', { pressureGauge: { accuracy: 0.5 } }, 'fraction'],
    ['specificGravity', { specificGravity: 5 }, undefined],
    ['contents.gaugePercent', { contents: { gaugePercent: 140 } }, undefined],
    ['contents.netMass', { contents: { netMass: -1 } }, 'mass'],
  ];
  for (const [field, over, quantity] of cases) {
    it(`checkTank gives limits for ${field} that the refused value lies outside`, () => {
      const input = base(over);
      const l = limitsOf(() => checkTank(input), field);
      expect(l.quantity).toBe(quantity);
      if (quantity !== undefined) expect(UNITS[quantity].length).toBeGreaterThan(0);
      const x = field
        .split('.')
        .reduce<unknown>((o, k) => (o as Record<string, unknown>)[k], input) as number;
      expect(typeof x).toBe('number');
      const below = l.min !== undefined && (l.minExclusive ? x <= l.min : x < l.min);
      const above = l.max !== undefined && x > l.max;
      expect(below || above, `${String(x)} inside ${JSON.stringify(l)}`).toBe(true);
    });
  }

  it('checkTank bounds a full vacuum reading by this site’s barometric pressure', () => {
    const l = limitsOf(
      () => checkTank(base({ barometricPressureAbs: 80_000, pressureReadingGauge: -90_000 })),
      'pressureReadingGauge',
    );
    expect(l).toEqual({ min: -80_000, max: 1e8, quantity: 'gaugePressure' });
  });

  it('checkTank gives this tank’s net-mass cap as the limit, and accepts the cap itself', () => {
    const l = limitsOf(() => checkTank(base({ contents: { netMass: 1e7 } })), 'contents.netMass');
    expect(l.min).toBe(0);
    expect(l.quantity).toBe('mass');
    expect(l.note).toMatch(/^for this tank/);
    // The SI message rounds the cap down to whole kg; the limit is the cap itself.
    const e = inputError(() => checkTank(base({ contents: { netMass: 1e7 } })));
    expect(e.message).toContain(`from 0 to ${Math.floor(l.max!)} kg for this tank`);
    // identity: the edge is real
    expect(() => checkTank(base({ contents: { netMass: l.max! } }))).not.toThrow();
    expect(() => checkTank(base({ contents: { netMass: l.max! * 1.001 } }))).toThrow(InputError);
  });

  it('checkTank gives the inside height of the tank as the level limit', () => {
    const shape = {
      kind: 'horizontal-cylinder',
      heads: 'ellipsoidal',
      diameter: 1,
      shellLength: 3,
    } as const;
    const tank = { waterCapacity: 2.6, designPressureGauge: psig(250), shape };
    const H = tankHeight(shape);
    for (const level of [1.5, -0.1, 5000]) {
      const l = limitsOf(
        () => checkTank(base({ tank, contents: { levelHeight: level } })),
        'contents.levelHeight',
      );
      expect(l.min).toBe(0);
      expect(l.max).toBe(H);
      expect(l.quantity).toBe('length');
    }
    expect(() => checkTank(base({ tank, contents: { levelHeight: H } }))).not.toThrow();
  });

  it('checkTank gives the hottest peak this fill can take, and accepts it', () => {
    // Propane at 97 % and −40 °F: a 250 °F peak is beyond what the model can hold in the tank.
    const fill = { contents: { gaugePercent: 97 }, liquidTemperature: F(-40) };
    const l = limitsOf(
      () => checkTank(base({ ...fill, peakTemperature: F(250) })),
      'peakTemperature',
    );
    expect(l.quantity).toBe('temperature');
    expect(l.min).toBeUndefined();
    expect(l.max).toBeGreaterThan(F(-40));
    expect(l.max).toBeLessThan(F(250));
    expect(() => checkTank(base({ ...fill, peakTemperature: l.max! }))).not.toThrow();
  });

  it('checkTank: every numeric refusal’s limits hold finite bounds that exclude the value', () => {
    const fields = ['liquidTemperature', 'peakTemperature', 'pressureReadingGauge'] as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...fields),
        fc.double({ min: -1e9, max: 1e9, noNaN: true }),
        (field, x) => {
          const input = base({ [field]: x });
          let e: unknown;
          try {
            checkTank(input);
            return;
          } catch (err) {
            e = err;
          }
          expect(e).toBeInstanceOf(InputError);
          const err = e as InputError;
          if (err.field !== field) return; // refused for another reason (e.g. a peak beyond this fill)
          const l = err.limits!;
          expect(l, err.message).toBeDefined();
          for (const b of [l.min, l.max])
            if (b !== undefined) expect(Number.isFinite(b)).toBe(true);
          if (l.min !== undefined && l.max !== undefined) expect(l.min).toBeLessThanOrEqual(l.max);
          expect((l.min !== undefined && x < l.min) || (l.max !== undefined && x > l.max)).toBe(
            true,
          );
        },
      ),
      { numRuns: propRuns(200), seed: 20261201 },
    );
  });
});

describe('core API limits', () => {
  const propane = listFluids().find((f) => f.id === 'propane')!;

  it('saturation gives T limits from the triple point to the API’s top temperature', () => {
    const l = limitsOf(() => saturation('propane', 50), 'T');
    expect(l).toMatchObject({ min: propane.Ttriple, max: 600, quantity: 'temperature' });
  });

  it('saturation gives T limits ending 0.5 K below the critical temperature', () => {
    const l = limitsOf(() => saturation('propane', 369.6), 'T');
    expect(l.min).toBe(propane.Ttriple);
    expect(l.max).toBeCloseTo(propane.Tc - 0.5, 12);
    expect(l.quantity).toBe('temperature');
  });

  it('liquidDensity gives p limits: above 0, then at or above the saturation pressure', () => {
    expect(limitsOf(() => liquidDensity('propane', 300, 0), 'pAbs')).toEqual({
      min: 0,
      minExclusive: true,
      max: 1e9,
      quantity: 'pressure',
    });
    const l = limitsOf(() => liquidDensity('propane', 300, 1e5), 'pAbs');
    expect(l.min).toBe(saturation('propane', 300).pAbs);
    expect(l.quantity).toBe('pressure');
    expect(() => liquidDensity('propane', 300, l.min!)).not.toThrow();
  });

  it('closedTank gives density limits up to the model’s highest density at T', () => {
    const l = limitsOf(() => closedTank('propane', 300, 5000), 'density');
    expect(l).toMatchObject({
      min: 0,
      minExclusive: true,
      max: maxDensity('propane', 300),
      quantity: 'density',
    });
    expect(limitsOf(() => closedTank('propane', 300, 0), 'density').minExclusive).toBe(true);
  });
});
