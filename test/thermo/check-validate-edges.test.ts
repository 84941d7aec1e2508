/**
 * The check's input ranges at their edges (thermo/check/validate.ts): a value at an edge is
 * taken, the next value past it is refused with an InputError that names the field and says the
 * range in words and as numbers — the product rule "bad input always gets a clear message naming
 * the field and the valid range". The ranges are the check's own documented choices (the range
 * words of each field, TankCheckInput's comments in thermo/check/types.ts); no figure here rests
 * on published data except the standard atmosphere (named where used).
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../thermo/errors.js';
import { validateInput } from '../../thermo/check/validate.js';
import type { TankCheckInput } from '../../thermo/check/types.js';
import { expectRel } from './check-helpers.js';

type Patch = (x: unknown) => Partial<TankCheckInput>;

function base(over: Partial<TankCheckInput> = {}): TankCheckInput {
  return {
    tank: { waterCapacity: 3.785, designPressureGauge: 1.72e6 },
    product: 'propane',
    liquidTemperature: 290,
    contents: { gaugePercent: 50 },
    peakTemperature: 300,
    ...over,
  };
}
const tank = (t: Record<string, unknown>): Partial<TankCheckInput> => ({
  tank: { waterCapacity: 3.785, designPressureGauge: 1.72e6, ...t } as TankCheckInput['tank'],
});

function refusal(input: unknown): InputError {
  try {
    validateInput(input as TankCheckInput);
  } catch (e) {
    expect(e, String(e)).toBeInstanceOf(InputError);
    return e as InputError;
  }
  throw new Error(`expected an InputError for ${JSON.stringify(input)}`);
}

// [field, patch, lowest, highest, range words, quantity]
const RANGES: [string, Patch, number, number, string, string | undefined][] = [
  [
    'tank.waterCapacity',
    (x) => ({ tank: { waterCapacity: x as number, designPressureGauge: 1.72e6 } }),
    1e-4,
    1e5,
    'from 0.0001 to 100 000 m³',
    'volume',
  ],
  [
    'tank.designPressureGauge',
    (x) => ({ tank: { waterCapacity: 3.785, designPressureGauge: x as number } }),
    1e4,
    1e8,
    'from 10 000 to 100 000 000 Pa gauge',
    'gaugePressure',
  ],
  [
    'tank.reliefSetPressureGauge',
    (x) => tank({ reliefSetPressureGauge: x }),
    1e4,
    1e8,
    'from 10 000 to 100 000 000 Pa gauge',
    'gaugePressure',
  ],
  [
    'tank.minDesignMetalTemperature',
    (x) => tank({ minDesignMetalTemperature: x }),
    73.15,
    373.15,
    'from 73.15 to 373.15 K',
    'temperature',
  ],
  [
    'liquidTemperature',
    (x) => ({ liquidTemperature: x as number }),
    150,
    400,
    'from 150 to 400 K',
    'temperature',
  ],
  [
    'peakTemperature',
    (x) => ({ peakTemperature: x as number }),
    150,
    400,
    'from 150 to 400 K',
    'temperature',
  ],
  [
    'barometricPressureAbs',
    (x) => ({ barometricPressureAbs: x as number }),
    20_000,
    120_000,
    'from 20 000 to 120 000 Pa absolute',
    'pressure',
  ],
  [
    'elevation',
    (x) => ({ elevation: x as number }),
    -500,
    11_000,
    'from −500 to 11 000 m',
    'length',
  ],
  [
    'pressureGauge.fullScaleGauge',
    (x) => ({ pressureGauge: { fullScaleGauge: x as number } }),
    1e4,
    1e8,
    'from 10 000 to 100 000 000 Pa gauge',
    'gaugePressure',
  ],
  [
    'pressureGauge.accuracy',
    (x) => ({ pressureGauge: { accuracy: x as number } }),
    0,
    0.2,
    'a fraction of full scale from 0 to 0.2',
    'fraction',
  ],
  [
    'specificGravity',
    (x) => ({ specificGravity: x as number }),
    0.2,
    2,
    'from 0.2 to 2 (liquid, 60/60 °F)',
    undefined,
  ],
  [
    'contents.gaugePercent',
    (x) => ({ contents: { gaugePercent: x as number } }),
    0,
    100,
    'a percent from 0 to 100',
    undefined,
  ],
  [
    'contents.netMass',
    (x) => ({ contents: { netMass: x as number } }),
    0,
    1e8,
    'from 0 to 100 000 000 kg',
    'mass',
  ],
];

/** The next double past x, away from the range. */
const below = (x: number) => (x === 0 ? -Number.MIN_VALUE : x - Math.abs(x) * 2 ** -52);
const above = (x: number) => x + Math.abs(x) * 2 ** -52;

describe('validateInput: every numeric field at and just past its edges', () => {
  for (const [field, patch, lo, hi, words, quantity] of RANGES) {
    it(`${field}: ${words}`, () => {
      for (const x of [lo, hi]) expect(() => validateInput(base(patch(x)))).not.toThrow();
      for (const x of [below(lo), above(hi)]) {
        const e = refusal(base(patch(x)));
        expect(e.field).toBe(field);
        expect(e.validRange).toBe(words);
        expect(e.message).toContain(field);
        expect(e.message).toContain(words);
        expect(e.code).toBe('out-of-range');
        expect(e.limits).toEqual({ min: lo, max: hi, ...(quantity ? { quantity } : {}) });
      }
      for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, String(lo), null]) {
        const e = refusal(base(patch(bad)));
        expect(e.field).toBe(field);
        expect(e.validRange).toBe(words);
      }
    });
  }

  it('a gauge reading is bounded below by a full vacuum at this site’s barometric pressure', () => {
    const baro = 90_000;
    expect(
      validateInput(base({ barometricPressureAbs: baro, pressureReadingGauge: -baro }))
        .pressureReadingGauge,
    ).toBe(-baro);
    expect(validateInput(base({ pressureReadingGauge: 1e8 })).pressureReadingGauge).toBe(1e8);
    const e = refusal(base({ barometricPressureAbs: baro, pressureReadingGauge: below(-baro) }));
    expect(e.field).toBe('pressureReadingGauge');
    expect(e.validRange).toBe(
      'from −90000 Pa (full vacuum at this barometric pressure) to 100 000 000 Pa gauge',
    );
    expect(e.limits).toEqual({ min: -baro, max: 1e8, quantity: 'gaugePressure' });
    expect(refusal(base({ pressureReadingGauge: above(1e8) })).field).toBe('pressureReadingGauge');
    expect(refusal(base({ pressureReadingGauge: Number.NaN })).field).toBe('pressureReadingGauge');
  });
});

describe('validateInput: defaults as TankCheckInput documents them (thermo/check/types.ts)', () => {
  it('a bare nameplate: aboveground storage, not insulated, filled by gauge, relief = design', () => {
    const c = validateInput(base());
    expect(c.placement).toBe('aboveground');
    expect(c.containerClass).toBe('storage');
    expect(c.insulated).toBe(false);
    expect(c.fixedDipTube).toBe(false);
    expect(c.fillMethod).toBe('gauge');
    expect(c.reliefGiven).toBe(false);
    expect(c.reliefSetPressureGauge).toBe(1.72e6);
    expect(c.mdmt).toBeNull();
    expect(c.pressureReadingGauge).toBeNull();
    expect(c.specificGravity).toBeNull();
    expect(c.T).toBe(290);
    expect(c.Tpeak).toBe(300);
  });

  it('the pressure gauge defaults to ±2 % of a full scale at the design pressure', () => {
    const c = validateInput(base());
    expect(c.accuracy).toBe(0.02);
    expect(c.fullScaleGauge).toBe(1.72e6);
    const g = validateInput(base({ pressureGauge: { fullScaleGauge: 2e6, accuracy: 0.01 } }));
    expect([g.fullScaleGauge, g.accuracy]).toEqual([2e6, 0.01]);
    expect(validateInput(base({ pressureGauge: {} })).accuracy).toBe(0.02);
  });

  it('the barometric pressure: as given, else from the elevation, else one standard atmosphere', () => {
    // 1 atm = 101 325 Pa (definition; NIST SP 811, Appendix B).
    expect(validateInput(base()).baro).toBe(101_325);
    expect(validateInput(base({ barometricPressureAbs: 95_000, elevation: 3000 })).baro).toBe(
      95_000,
    );
    // U.S. Standard Atmosphere 1976, Table I: 89 875 Pa at 1 000 m geopotential altitude.
    expectRel(validateInput(base({ elevation: 1000 })).baro, 89_875, 1e-3, {
      input: 'elevation 1000 m',
      source: 'U.S. Standard Atmosphere 1976, Table I (1 000 m: 8.9875E+4 Pa)',
      kind: 'published',
      why: 'table printed to 5 figures; geometric vs geopotential altitude differ by 0.016 % here',
    });
  });

  it('the fill method: as given, else fixed-gauge for an older record’s dip tube, else gauge', () => {
    expect(validateInput(base(tank({ fixedDipTube: true }))).fillMethod).toBe('fixed-gauge');
    expect(validateInput(base(tank({ fixedDipTube: true, fillMethod: 'weight' }))).fillMethod).toBe(
      'weight',
    );
    expect(validateInput(base(tank({ fillMethod: 'fixed-gauge' }))).fillMethod).toBe('fixed-gauge');
  });

  it('given choices are kept', () => {
    const c = validateInput(
      base(
        tank({
          placement: 'underground',
          containerClass: 'cargo',
          insulated: true,
          reliefSetPressureGauge: 1.5e6,
          minDesignMetalTemperature: 244,
        }),
      ),
    );
    expect([c.placement, c.containerClass, c.insulated, c.reliefGiven]).toEqual([
      'underground',
      'cargo',
      true,
      true,
    ]);
    expect([c.reliefSetPressureGauge, c.mdmt]).toEqual([1.5e6, 244]);
    for (const k of ['storage', 'cylinder', 'cargo', 'portable'])
      expect(validateInput(base(tank({ containerClass: k }))).containerClass).toBe(k);
  });
});

describe('validateInput: choices and shapes refused with the field and what is allowed', () => {
  const cases: [string, Partial<TankCheckInput>, string][] = [
    ['tank.placement', tank({ placement: 'buried' }), "'aboveground' or 'underground'"],
    [
      'tank.containerClass',
      tank({ containerClass: 'drum' }),
      "'storage', 'cylinder', 'cargo' or 'portable'",
    ],
    ['tank.insulated', tank({ insulated: 'yes' }), 'true or false'],
    ['tank.fixedDipTube', tank({ fixedDipTube: 1 }), 'true or false'],
    ['tank.fillMethod', tank({ fillMethod: 'pump' }), "'gauge', 'fixed-gauge' or 'weight'"],
    [
      'pressureGauge',
      { pressureGauge: null as unknown as TankCheckInput['pressureGauge'] },
      'an object { fullScaleGauge?, accuracy? }',
    ],
    [
      'pressureGauge',
      { pressureGauge: 5 as unknown as TankCheckInput['pressureGauge'] },
      'an object { fullScaleGauge?, accuracy? }',
    ],
    [
      'contents',
      { contents: null as unknown as TankCheckInput['contents'] },
      'one of { gaugePercent }, { netMass }, { levelHeight }',
    ],
    [
      'contents',
      { contents: 'half' as unknown as TankCheckInput['contents'] },
      'one of { gaugePercent }, { netMass }, { levelHeight }',
    ],
    [
      'contents',
      { contents: {} as TankCheckInput['contents'] },
      'exactly one of { gaugePercent }, { netMass }, { levelHeight }',
    ],
    [
      'contents',
      { contents: { gaugePercent: 5, netMass: 5 } as unknown as TankCheckInput['contents'] },
      'exactly one of { gaugePercent }, { netMass }, { levelHeight }',
    ],
    [
      'tank.shape',
      { contents: { levelHeight: 0.5 } },
      'given when contents.levelHeight is used (the level needs the tank shape)',
    ],
  ];
  for (const [field, over, words] of cases)
    it(`${field}: ${words}`, () => {
      const e = refusal(base(over));
      expect(e.field).toBe(field);
      expect(e.validRange).toBe(words);
      expect(e.message).toContain(`${field} must be ${words}`);
    });

  it('no input object, or no tank object', () => {
    for (const bad of [null, undefined, 7, 'tank']) {
      const e = refusal(bad);
      expect(e.field).toBe('input');
      expect(e.validRange).toBe(
        'an object { tank, product, liquidTemperature, contents, peakTemperature }',
      );
    }
    for (const bad of [null, 7]) {
      const e = refusal(base({ tank: bad as unknown as TankCheckInput['tank'] }));
      expect(e.field).toBe('tank');
      expect(e.validRange).toBe('an object { waterCapacity, designPressureGauge, … }');
    }
  });

  it('a level height: from 0 m to the tank’s inside height, with that height as the limit', () => {
    const shape = { kind: 'sphere', diameter: 2 } as const;
    const withShape = (h: unknown) =>
      base({
        ...tank({ shape }),
        contents: { levelHeight: h as number },
      });
    for (const h of [0, 1e3]) expect(() => validateInput(withShape(h))).not.toThrow();
    for (const h of [below(0), above(1e3), Number.NaN, '1']) {
      const e = refusal(withShape(h));
      expect(e.field).toBe('contents.levelHeight');
      expect(e.validRange).toBe('from 0 m to the inside height of the tank');
      // a sphere's inside height is its diameter (geometry, no source needed)
      expect(e.limits).toEqual({ min: 0, max: 2, quantity: 'length' });
    }
  });

  it('a bad tank shape is refused under tank.shape', () => {
    const e = refusal(base(tank({ shape: { kind: 'sphere', diameter: -1 } })));
    expect(e.field.startsWith('tank.shape')).toBe(true);
  });
});
