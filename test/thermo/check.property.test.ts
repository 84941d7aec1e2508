/**
 * Property test: checkTank driven with random valid and invalid input never returns NaN or
 * Infinity anywhere in its result and never throws anything but InputError.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { checkTank, InputError, listFluids, type TankCheckInput } from '../../thermo/index.js';
import { LPG_PRESETS } from '../../thermo/rules/presets.js';
import { propRuns, propShare } from '../helpers/prop-runs.js';

function nonFinitePaths(x: unknown, path = 'result', out: string[] = []): string[] {
  if (typeof x === 'number') {
    if (!Number.isFinite(x)) out.push(`${path} = ${x}`);
  } else if (Array.isArray(x)) x.forEach((v, i) => nonFinitePaths(v, `${path}[${i}]`, out));
  else if (x && typeof x === 'object')
    for (const [k, v] of Object.entries(x)) nonFinitePaths(v, `${path}.${k}`, out);
  else if (typeof x === 'string' && /NaN|Infinity|undefined/.test(x))
    out.push(`${path} text: ${x}`);
  return out;
}

const tally = { ok: 0, input: 0, fields: new Map<string, number>() };

function run(input: unknown): void {
  let result: unknown;
  try {
    result = checkTank(input as TankCheckInput);
    tally.ok++;
  } catch (e) {
    if (e instanceof InputError) {
      expect(e.field, `message: ${e.message}`).toMatch(/^[A-Za-z]/);
      tally.input++;
      tally.fields.set(e.field, (tally.fields.get(e.field) ?? 0) + 1);
      return;
    }
    throw new Error(
      `input ${JSON.stringify(input)} threw ${(e as Error)?.name}: ${(e as Error)?.message}`,
    );
  }
  const bad = nonFinitePaths(result);
  expect(bad, `input ${JSON.stringify(input)}`).toEqual([]);
}

const ids = listFluids().map((f) => f.id);
const products = fc.oneof(
  { weight: 8, arbitrary: fc.constantFrom(...ids) },
  { weight: 1, arbitrary: fc.constantFrom(...LPG_PRESETS.map((p) => p.product)) },
  {
    weight: 1,
    arbitrary: fc.double({ min: 0, max: 1, noNaN: true }).map((x) => ({
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
        name: fc.constant('X'),
        molarMass: fc.double({ min: 0.02, max: 0.2, noNaN: true }),
        Tc: fc.double({ min: 250, max: 600, noNaN: true }),
        Pc: fc.double({ min: 2e6, max: 1e7, noNaN: true }),
        omega: fc.double({ min: 0, max: 0.5, noNaN: true }),
      })
      .map((custom) => ({ custom })),
  },
);

const temp = fc.double({ min: 180, max: 400, noNaN: true });
const shape = fc.oneof(
  fc.record({
    kind: fc.constant('horizontal-cylinder' as const),
    heads: fc.constantFrom('hemispherical' as const, 'ellipsoidal' as const, 'flat' as const),
    diameter: fc.double({ min: 0.3, max: 4, noNaN: true }),
    shellLength: fc.double({ min: 0.1, max: 20, noNaN: true }),
  }),
  fc.record({
    kind: fc.constant('sphere' as const),
    diameter: fc.double({ min: 1, max: 20, noNaN: true }),
  }),
);
const contents = fc.oneof(
  fc.record({ gaugePercent: fc.double({ min: 0, max: 100, noNaN: true }) }),
  fc.record({ netMass: fc.double({ min: 0, max: 2000, noNaN: true }) }),
  fc.record({ levelHeight: fc.double({ min: 0, max: 4, noNaN: true }) }),
);

const valid = fc.record(
  {
    tank: fc.record(
      {
        waterCapacity: fc.double({ min: 0.01, max: 10, noNaN: true }),
        designPressureGauge: fc.double({ min: 2e5, max: 2e7, noNaN: true }),
        reliefSetPressureGauge: fc.double({ min: 2e5, max: 2e7, noNaN: true }),
        placement: fc.constantFrom('aboveground' as const, 'underground' as const),
        insulated: fc.boolean(),
        containerClass: fc.constantFrom(
          'storage' as const,
          'cylinder' as const,
          'cargo' as const,
          'portable' as const,
        ),
        fixedDipTube: fc.boolean(),
        fillMethod: fc.constantFrom('gauge' as const, 'fixed-gauge' as const, 'weight' as const),
        shape,
        minDesignMetalTemperature: fc.double({ min: 180, max: 370, noNaN: true }),
      },
      { requiredKeys: ['waterCapacity', 'designPressureGauge', 'shape'] },
    ),
    product: products,
    specificGravity: fc.double({ min: 0.3, max: 1.5, noNaN: true }),
    liquidTemperature: temp,
    contents,
    pressureReadingGauge: fc.double({ min: -9e4, max: 1e7, noNaN: true }),
    pressureGauge: fc.record(
      {
        fullScaleGauge: fc.double({ min: 1e5, max: 3e7, noNaN: true }),
        accuracy: fc.double({ min: 0, max: 0.1, noNaN: true }),
      },
      { requiredKeys: [] },
    ),
    elevation: fc.double({ min: -400, max: 5000, noNaN: true }),
    peakTemperature: temp,
  },
  { requiredKeys: ['tank', 'product', 'liquidTemperature', 'contents', 'peakTemperature'] },
);

const junk = fc.oneof(
  fc.constant(Number.NaN),
  fc.constant(Infinity),
  fc.constant(-1),
  fc.constant(0),
  fc.constant(1e30),
  fc.constant('12'),
  fc.constant(null),
  fc.constant(undefined),
  fc.constant({}),
  fc.constant([]),
);

describe('checkTank property', () => {
  it('checkTank on random valid input returns only finite numbers or an InputError', () => {
    fc.assert(
      fc.property(valid, (input) => run(input)),
      { numRuns: propRuns(400), seed: 20261201 },
    );
    // Most random valid inputs must reach a full result, or the property proves little.
    expect(
      tally.ok,
      `results ${tally.ok}, input errors ${tally.input}: ${JSON.stringify([...tally.fields])}`,
    ).toBeGreaterThan(propShare(400, 200));
  });

  it('checkTank names contents.netMass for more product than the model can hold above Tc', () => {
    // Found by this property: R-134a at 400 K (above its critical point) with 2,000 kg in 1.47 m³.
    const input = {
      tank: { waterCapacity: 1.4713, designPressureGauge: 2e7 },
      product: 'r134a',
      liquidTemperature: 400,
      contents: { netMass: 2000 },
      peakTemperature: 322.4,
    };
    expect(() => checkTank(input)).toThrow(/contents\.netMass/);
  });

  it('checkTank names only its own input fields in an InputError', () => {
    const own =
      /^(input|tank|product|specificGravity|liquidTemperature|contents|pressureReadingGauge|pressureGauge|barometricPressureAbs|elevation|peakTemperature)\b/;
    for (const f of tally.fields.keys()) expect(f).toMatch(own);
  });

  it('checkTank on random damaged input throws only InputError', () => {
    const paths = [
      'tank',
      'tank.waterCapacity',
      'tank.designPressureGauge',
      'tank.reliefSetPressureGauge',
      'tank.placement',
      'tank.containerClass',
      'tank.shape',
      'tank.minDesignMetalTemperature',
      'product',
      'liquidTemperature',
      'contents',
      'contents.gaugePercent',
      'pressureReadingGauge',
      'barometricPressureAbs',
      'elevation',
      'peakTemperature',
      'specificGravity',
      'pressureGauge',
    ];
    fc.assert(
      fc.property(valid, fc.constantFrom(...paths), junk, (input, path, value) => {
        const copy = structuredClone(input) as Record<string, unknown>;
        const parts = path.split('.');
        let o = copy;
        for (const p of parts.slice(0, -1)) {
          if (!o[p] || typeof o[p] !== 'object') o[p] = {};
          o = o[p] as Record<string, unknown>;
        }
        o[parts[parts.length - 1]!] = value;
        run(copy);
      }),
      { numRuns: propRuns(300), seed: 7 },
    );
    expect(() => checkTank(undefined as unknown as TankCheckInput)).toThrow(InputError);
  });
});
