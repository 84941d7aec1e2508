/**
 * What checkTank says when the core refuses inside the check (thermo/check/checkTank.ts): the
 * caller can only change the input, so a core refusal about an internal argument, or a solve
 * that did not converge, comes back as an InputError about the product and readings, with the
 * core's own words kept; a refusal that names an input field passes through unchanged. The core
 * is made to refuse here by replacing one search of the check; nothing else is replaced.
 */
import { describe, expect, it, vi } from 'vitest';
import { ConvergenceError, InputError } from '../../thermo/errors.js';

const fail = vi.hoisted(() => ({ with: null as Error | null }));

vi.mock('../../thermo/check/search.js', async (importOriginal) => {
  const mod = await importOriginal<typeof import('../../thermo/check/search.js')>();
  return {
    ...mod,
    liquidFullTemperature: (...args: Parameters<typeof mod.liquidFullTemperature>) => {
      if (fail.with) throw fail.with;
      return mod.liquidFullTemperature(...args);
    },
  };
});

const { checkTank } = await import('../../thermo/check/checkTank.js');

const input = {
  tank: { waterCapacity: 3.785, designPressureGauge: 1.7e6 },
  product: 'propane',
  liquidTemperature: 293.15,
  contents: { gaugePercent: 50 },
  peakTemperature: 303.15,
};

function refusal(err: Error): InputError {
  fail.with = err;
  try {
    checkTank(input);
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  } finally {
    fail.with = null;
  }
  throw new Error('expected an InputError');
}

describe('checkTank: a refusal inside the core', () => {
  it('the check runs when nothing refuses', () => {
    expect(checkTank(input).phase).toBe('two-phase');
  });

  it('a solve that does not converge is said about the product, keeping the core’s words', () => {
    const e = refusal(new ConvergenceError('test search', 'no bracket', 7, 1));
    expect(e.field).toBe('product');
    expect(e.validRange).toMatch(/^a product and temperatures the model can solve \(/);
    expect(e.validRange).toContain('no bracket');
  });

  it('a refusal of an internal argument (here "density") is said about the product', () => {
    const e = refusal(new InputError('density', 'at most 600 kg/m³'));
    expect(e.field).toBe('product');
    expect(e.validRange).toMatch(/^a product and readings the model can solve together \(/);
    expect(e.validRange).toContain('at most 600 kg/m³');
  });

  it('a refusal that names an input field passes through as it is', () => {
    for (const field of ['peakTemperature', 'contents.netMass', 'tank.shape.diameter', 'product']) {
      const e = refusal(new InputError(field, 'a test range'));
      expect(e.field).toBe(field);
      expect(e.validRange).toBe('a test range');
    }
  });

  it('any other error is not dressed up as an input error', () => {
    fail.with = new RangeError('not an input matter');
    try {
      expect(() => checkTank(input)).toThrow(RangeError);
    } finally {
      fail.with = null;
    }
  });
});
