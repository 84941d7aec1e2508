/**
 * Shorthands for the caution tests (cautions-now, cautions-peak): find a caution, read its
 * parameters by name with their quantity and rounding, build the usual tanks. Units by
 * definition: 1 °F step = 5/9 K, 1 psi = 6.894757 kPa (NIST SP 811), 1 US gal = 3.785411784 L.
 */
import { expect } from 'vitest';
import {
  checkTank,
  type Caution,
  type MessageNumber,
  type TankCheckInput,
  type TankCheckResult,
} from '../../thermo/index.js';
import type { Quantity, Rounding } from '../../thermo/units.js';
import { toSI } from '../../thermo/units.js';

export const F = (x: number) => toSI('temperature', x, 'F');
export const psig = (x: number) => toSI('gaugePressure', x, 'psig');
export const psi = (x: number) => toSI('pressureDifference', x, 'psi');
export const gal = (x: number) => toSI('volume', x, 'usgal');
/** 8.32828 lb of water per US gal at 60 °F in air (49 CFR 173.315(a) Note 1), in kg/m³. */
export const WATER_WEIGHT_KG_M3 = (8.32828 * 0.45359237) / 3.785411784e-3;
/** A 1,000 US gal tank: Table H-27's aboveground column up to 1,200 gal (29 CFR 1910.110). */
export const V1000 = gal(1000);
/** Critical temperatures (test/reference/fluids.csv): CO2 Span & Wagner 1996, propane Lemmon 2009. */
export const TC_CO2 = 304.1282;
export const TC_PROPANE = 369.89;

export const codes = (r: TankCheckResult) => r.cautions.map((c) => c.code);

/** The one caution with this code (fails when absent or repeated). */
export function caution(r: TankCheckResult, code: string): Caution {
  const all = r.cautions.filter((c) => c.code === code);
  expect(all.length, `${code} in ${codes(r).join(', ')}`).toBe(1);
  return all[0]!;
}

/** Numeric parameter `name`, with the quantity and rounding it must carry. */
export function param(c: Caution, name: string, q: Quantity | null, round: Rounding): number {
  const x = c.params[name] as MessageNumber | undefined;
  expect(typeof x, `${c.code}.${name}`).toBe('object');
  expect([x!.quantity, x!.round ?? 'nearest'], `${c.code}.${name}`).toEqual([q, round]);
  return x!.value;
}

/** The parameter names, exactly (an app's message catalogue reads them by name). */
export function expectKeys(c: Caution, keys: string[]): void {
  expect(Object.keys(c.params).sort(), c.code).toEqual([...keys].sort());
}

/** The caution's headline number is its first numeric parameter. */
export function expectHeadline(c: Caution, name: string): void {
  const x = c.params[name] as MessageNumber;
  expect([c.value, c.quantity], c.code).toEqual([x.value, x.quantity]);
}

export const CYL = {
  waterCapacity: 0.0227,
  designPressureGauge: psig(1800),
  reliefSetPressureGauge: psig(1800),
  containerClass: 'cylinder' as const,
};

/** CO2 in a 0.0227 m³ (50 lb water) cylinder, filled to `fd` of its water weight. */
export function co2(fd: number, over: Partial<TankCheckInput> = {}): TankCheckResult {
  return checkTank({
    tank: CYL,
    product: 'carbon-dioxide',
    liquidTemperature: F(70),
    contents: { netMass: fd * CYL.waterCapacity * WATER_WEIGHT_KG_M3 },
    peakTemperature: F(70),
    ...over,
  });
}

/** Propane in a 1,000 gal tank, design and relief 250 psig unless given. */
export function propane(
  over: Partial<TankCheckInput> = {},
  tank: Partial<TankCheckInput['tank']> = {},
): TankCheckResult {
  return checkTank({
    tank: {
      waterCapacity: V1000,
      designPressureGauge: psig(250),
      reliefSetPressureGauge: psig(250),
      ...tank,
    },
    product: 'propane',
    liquidTemperature: F(60),
    contents: { gaugePercent: 50 },
    peakTemperature: F(60),
    ...over,
  });
}

/** Words that would read as leave to fill; no caution may carry them. */
export const PERMISSION =
  /\b(safe to|ok to|okay to|you may fill|may be filled|can be filled|allowed to fill|permitted to)\b/i;
