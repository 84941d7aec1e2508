/**
 * The public API's contract: bad input gets an InputError naming the argument and its valid
 * range; valid input never yields NaN, Infinity or any other exception (property-based, fast-check).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  closedTank,
  describeProduct,
  InputError,
  liquidDensity,
  listFluids,
  maxDensity,
  saturation,
  type Product,
} from '../../thermo/index.js';
import { propRuns } from '../helpers/prop-runs.js';

const FLUIDS = listFluids();
const ids = FLUIDS.map((f) => f.id);

function expectInputError(fn: () => unknown, field: string): void {
  try {
    fn();
  } catch (e) {
    expect(e, String(e)).toBeInstanceOf(InputError);
    expect((e as InputError).field).toBe(field);
    expect((e as Error).message).toMatch(
      new RegExp(`^${field.replace(/[[\].]/g, '\\$&')} must be`),
    );
    expect((e as Error).message).not.toMatch(/NaN/);
    return;
  }
  throw new Error(`expected an InputError for ${field}`);
}

describe('listFluids', () => {
  it('lists every required fluid with SI constants', () => {
    const required = [
      'propane',
      'n-butane',
      'isobutane',
      'propylene',
      'ethane',
      'ammonia',
      'carbon-dioxide',
      'dimethyl-ether',
      'r134a',
      'r32',
      'r125',
      'r143a',
      'r1234yf',
      'r1234ze-e',
      'r22',
      'nitrous-oxide',
      'sulfur-dioxide',
      'chlorine',
      '1-butene',
      'isobutene',
      'n-pentane',
    ];
    expect(ids).toEqual(expect.arrayContaining(required));
    for (const f of FLUIDS) {
      expect(f.molarMass).toBeGreaterThan(0.01);
      expect(f.molarMass).toBeLessThan(0.2);
      expect(f.Tc).toBeGreaterThan(250);
      expect(f.Pc).toBeGreaterThan(1e6);
    }
  });
});

describe('input validation', () => {
  it('names the argument and its range for each kind of bad input', () => {
    expectInputError(() => saturation('propain', 300), 'product');
    expectInputError(() => saturation('propane', 0), 'T');
    expectInputError(() => saturation('propane', -5), 'T');
    expectInputError(() => saturation('propane', Number.NaN), 'T');
    expectInputError(() => saturation('propane', 50), 'T'); // below the triple point (85.5 K)
    expectInputError(() => saturation('propane', 369.6), 'T'); // within 0.5 K of Tc
    expectInputError(() => liquidDensity('propane', 300, 0), 'pAbs');
    expectInputError(() => liquidDensity('propane', 300, 1e5), 'pAbs'); // below p_sat
    expectInputError(() => closedTank('propane', 300, 0), 'density');
    expectInputError(() => closedTank('propane', 300, -1), 'density');
    expectInputError(() => closedTank('propane', 300, 5000), 'density');
    expectInputError(
      () =>
        saturation(
          {
            components: [
              { id: 'propane', moleFraction: 0.5 },
              { id: 'n-butane', moleFraction: 0.4 },
            ],
          },
          300,
        ),
      'product.components[].moleFraction',
    );
    expectInputError(
      () => saturation({ components: [{ id: 'propane', moleFraction: 1.5 }] }, 300),
      'product.components[0].moleFraction',
    );
    expectInputError(
      () => saturation({ components: [{ id: 'xenon', moleFraction: 1 }] }, 300),
      'product.components[0].id',
    );
    expectInputError(() => saturation({ components: [] }, 300), 'product.components');
    expectInputError(
      () =>
        saturation({ custom: { name: 'x', molarMass: 0.05, Tc: -1, Pc: 4e6, omega: 0.1 } }, 300),
      'product.custom.Tc',
    );
    expectInputError(
      () => saturation({ custom: { name: 'x', molarMass: 0.05, Tc: 400, Pc: 4e6, omega: 9 } }, 300),
      'product.custom.omega',
    );
    expectInputError(() => saturation('propane', 300, { model: 'VDW' as never }), 'options.model');
  });

  it('accepts fractions that sum to 1 within 1e-6', () => {
    const s = saturation(
      {
        components: [
          { id: 'propane', moleFraction: 0.6 + 5e-7 },
          { id: 'n-butane', moleFraction: 0.4 },
        ],
      },
      300,
    );
    expect(Number.isFinite(s.pAbs)).toBe(true);
  });

  it('custom fluids use the textbook Peng–Robinson model under the default', () => {
    const s = saturation(
      {
        custom: {
          name: 'my propane',
          molarMass: 0.04409562,
          Tc: 369.89,
          Pc: 4.2512e6,
          omega: 0.1521,
        },
      },
      300,
    );
    expect(s.model).toBe('PR');
    expect(s.pAbs).toBeCloseTo(saturation('propane', 300, { model: 'PR' }).pAbs, 6);
  });
});

const finite = (x: number | null) => x === null || Number.isFinite(x);

describe('property: valid input never gives NaN, Infinity or an exception', () => {
  const fluidArb = fc.constantFrom(...FLUIDS);
  const modelArb = fc.constantFrom(undefined, 'PR' as const, 'SRK' as const);

  it('saturation over the whole valid range', () => {
    fc.assert(
      fc.property(fluidArb, fc.double({ min: 0, max: 1, noNaN: true }), modelArb, (f, u, model) => {
        const T = f.Ttriple + u * (f.Tc - 0.5 - f.Ttriple);
        const s = saturation(f.id, T, { model });
        return (
          [s.pAbs, s.rhoL, s.rhoV].every(Number.isFinite) &&
          s.pAbs > 0 &&
          s.rhoL > s.rhoV &&
          s.rhoV > 0
        );
      }),
      { numRuns: propRuns(400) },
    );
  });

  it('closedTank at any temperature and density', () => {
    fc.assert(
      fc.property(
        fluidArb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        modelArb,
        (f, u, w, model) => {
          const T = f.Ttriple + u * (Math.min(600, 1.6 * f.Tc) - f.Ttriple);
          const rho = w * maxDensity(f.id, T, { model });
          const c = closedTank(f.id, T, rho, { model });
          return (
            Number.isFinite(c.pAbs) &&
            c.pAbs > 0 &&
            c.liquidFraction >= 0 &&
            c.liquidFraction <= 1 &&
            finite(c.rhoL) &&
            finite(c.rhoV) &&
            Number.isFinite(c.vapourMassFraction)
          );
        },
      ),
      { numRuns: propRuns(400) },
    );
  });

  it('liquidDensity at any pressure above saturation', () => {
    fc.assert(
      fc.property(
        fluidArb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (f, u, ratio) => {
          const T = f.Ttriple + u * (f.Tc - 0.5 - f.Ttriple);
          const p = Math.min(1e9, saturation(f.id, T).pAbs * ratio);
          return Number.isFinite(liquidDensity(f.id, T, p));
        },
      ),
      { numRuns: propRuns(300) },
    );
  });

  it('blends of LP-gas components at ambient temperatures', () => {
    // Commercial LP-gas: propane and butanes with up to 5 % ethane (a richer ethane blend at 330 K
    // lies above its critical region and rightly has no bubble point: an InputError, tested above).
    const blendArb = fc
      .tuple(
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
      )
      .map(([a, b, d, c]): Product => {
        const s = (a + b + d) / (1 - c);
        const pa = a / s;
        const pb = b / s;
        return {
          components: [
            { id: 'propane', moleFraction: pa },
            { id: 'n-butane', moleFraction: pb },
            { id: 'ethane', moleFraction: c },
            { id: 'isobutane', moleFraction: Math.max(0, 1 - pa - pb - c) },
          ],
        };
      });
    fc.assert(
      fc.property(
        blendArb,
        fc.double({ min: 233.15, max: 330, noNaN: true }),
        fc.double({ min: 0.01, max: 1.05, noNaN: true }),
        (blend, T, w) => {
          const s = saturation(blend, T);
          const c = closedTank(blend, T, w * s.rhoL);
          return (
            Number.isFinite(s.pAbs) &&
            Number.isFinite(c.pAbs) &&
            c.liquidFraction >= 0 &&
            c.liquidFraction <= 1
          );
        },
      ),
      { numRuns: propRuns(150) },
    );
  });
});

describe('property: invalid input always gives the clear error', () => {
  it('temperatures outside the range', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...FLUIDS),
        fc.oneof(
          fc.double({ max: 0 }),
          fc.constant(Number.NaN),
          fc.constant(Infinity),
          fc.double({ min: 601, max: 1e9, noNaN: true }),
        ),
        (f, T) => {
          try {
            closedTank(f.id, T, 100);
            return false;
          } catch (e) {
            return e instanceof InputError && e.field === 'T';
          }
        },
      ),
    );
  });

  it('densities outside the range', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...FLUIDS),
        fc.oneof(
          fc.double({ max: 0 }),
          fc.constant(Number.NaN),
          fc.double({ min: 1e4, max: 1e12, noNaN: true }),
        ),
        (f, rho) => {
          try {
            closedTank(f.id, 0.8 * f.Tc, rho);
            return false;
          } catch (e) {
            return e instanceof InputError && e.field === 'density';
          }
        },
      ),
    );
  });

  it('products that are not products', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.integer(), fc.constant(null), fc.object()), (p) => {
        if (typeof p === 'string' && ids.includes(p)) return true;
        try {
          saturation(p as unknown as Product, 300);
          return false;
        } catch (e) {
          return e instanceof InputError && e.field.startsWith('product');
        }
      }),
    );
  });
});

describe('describeProduct', () => {
  it('gives the label, composition and the constants of a pure fluid and of a blend', () => {
    const pure = describeProduct('propane');
    expect(pure.label).toBe('Propane');
    expect(pure.Tc).toBe(369.89);
    // Source: critical density of the propane reference EOS (Lemmon et al. 2009), 220.478 kg/m³;
    // the tuned model holds it exactly by construction (identity, 1e-9).
    expect(Math.abs(pure.rhoc / 220.478 - 1)).toBeLessThan(1e-9);
    const blend = describeProduct({
      components: [
        { id: 'propane', moleFraction: 0.7 },
        { id: 'n-butane', moleFraction: 0.3 },
      ],
    });
    expect(blend.components.map((c) => c.id)).toEqual(['propane', 'n-butane']);
    expect(blend.Tc).toBeCloseTo(0.7 * 369.89 + 0.3 * 425.125, 9);
    expect(blend.Tmin).toBe(134.895);
  });
});
