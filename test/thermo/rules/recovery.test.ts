/**
 * The refrigerant recovery cylinder's own limit (thermo/rules/recovery.ts), called directly.
 * Sources: test/reference/trade/FACTS.md section a3 ("Refrigerant recovery cylinders are commonly
 * filled to no more than 80 % of volume": common practice, the industry guideline not consulted);
 * 77 °F = 25 °C exactly (°C = (°F − 32) × 5/9, the definition of the scales) = 298.15 K.
 */
import { describe, it, expect } from 'vitest';
import { InputError } from '../../../thermo/errors.js';
import {
  RECOVERY_DEFAULT_FRACTION,
  RECOVERY_FRACTION_RANGE,
  T_77F_K,
  recoveryLimit,
} from '../../../thermo/rules/recovery.js';
import { expectWithin } from '../check-helpers.js';

/** |actual − expected| ≤ atol, a published (outside) figure. */
const near = (actual: number, expected: number, atol: number, source: string, input: unknown) =>
  expectWithin(actual, expected, atol, { input, source, kind: 'published' });

/** The InputError `f` throws (fails the test when it throws nothing or something else). */
function refusal(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return e as InputError;
  }
  throw new Error('expected an InputError, nothing was thrown');
}

describe('recovery cylinder limit: which tanks it applies to', () => {
  it('a tank with no recovery entry is not a recovery cylinder: no limit', () => {
    expect(recoveryLimit(undefined, 290)).toBeNull();
  });
  it('an empty entry takes the usual 80 % of the volume (FACTS.md a3, common practice)', () => {
    const r = recoveryLimit({}, 290)!;
    expect(r.id).toBe('recovery-cylinder');
    near(r.fraction, 0.8, 0, 'FACTS.md a3: no more than 80 % of volume', null);
    expect(RECOVERY_DEFAULT_FRACTION).toBe(0.8);
    expect(r.description).toContain('no more than 80 % of the cylinder volume');
    expect(r.citation).toContain('common practice');
    expect(r.citation).toContain('refrigerant recovery cylinders');
  });
  it('null or a non-object entry is refused, naming tank.recovery and the shape expected', () => {
    for (const bad of [null, 0.8, 'yes', true]) {
      const e = refusal(() => recoveryLimit(bad as never, 290));
      expect(e.field).toBe('tank.recovery');
      expect(e.message).toContain('an object { fillFraction? } or absent');
    }
  });
});

describe('recovery cylinder limit: the settable fraction 0.5…0.95', () => {
  it('the range ends are accepted as given', () => {
    expect(RECOVERY_FRACTION_RANGE).toEqual([0.5, 0.95]);
    for (const f of [0.5, 0.95, 0.75]) {
      const r = recoveryLimit({ fillFraction: f }, 290)!;
      near(r.fraction, f, 0, 'the settable fraction, kept as given', null);
    }
  });
  it('just outside either end, or not a finite number, is refused with the field and the range', () => {
    for (const f of [0.4999, 0.9501, 0, 1, -0.8, NaN, Infinity, '0.8']) {
      const e = refusal(() => recoveryLimit({ fillFraction: f as never }, 290));
      expect(e.field).toBe('tank.recovery.fillFraction');
      expect(e.message).toContain('a fraction from 0.5 to 0.95');
      expect(e.limits).toEqual({ min: 0.5, max: 0.95, quantity: 'fraction' });
    }
  });
  it('the description names the fraction as a percent to 0.1 (85.5 %, 92.3 %)', () => {
    // 0.855 → 85.5 %; 0.9234 → 92.3 % (rounded to 0.1, by hand)
    expect(recoveryLimit({ fillFraction: 0.855 }, 290)!.description).toContain(
      'no more than 85.5 % of the cylinder volume',
    );
    expect(recoveryLimit({ fillFraction: 0.9234 }, 290)!.description).toContain(
      'no more than 92.3 % of the cylinder volume',
    );
  });
});

describe('recovery cylinder limit: the temperature of the liquid density', () => {
  it('77 °F is 25 °C = 298.15 K (definition of the scales)', () => {
    near(T_77F_K, 298.15, 1e-9, '77 °F = 25 °C by definition', null);
  });
  it('a liquid colder than 77 °F: the density is taken at 77 °F', () => {
    for (const T of [233.15, 290, 298.15 - 1e-6]) {
      near(
        recoveryLimit({}, T)!.referenceTemperature,
        298.15,
        1e-9,
        'recovery.ts rule: 77 °F unless the liquid is warmer',
        null,
      );
    }
  });
  it('a liquid warmer than 77 °F: the density is taken at the liquid temperature', () => {
    for (const T of [298.16, 308.15, 320]) {
      near(
        recoveryLimit({}, T)!.referenceTemperature,
        T,
        1e-9,
        'recovery.ts rule: the present liquid temperature if warmer than 77 °F',
        null,
      );
    }
  });
  it('the description says both', () => {
    const d = recoveryLimit({}, 290)!.description;
    expect(d).toMatch(/^Recovery cylinder: /);
    expect(d).toContain('at 77 °F (25 °C) or the present liquid temperature if warmer');
  });
});
