/**
 * Numbers inside caution messages: US trade units first, SI in brackets, rounded toward caution
 * as `round` says (`formatQuantity`'s default, to the nearest, when it is not given).
 */
import { formatQuantity, type Rounding } from '../units.js';

export function fmtGauge(pa: number, round?: Rounding, baro?: number): string {
  return `${formatQuantity('gaugePressure', pa, 'psig', { decimals: 1, round, barometricPressureAbs: baro })} (${formatQuantity('gaugePressure', pa, 'kPag', { decimals: 0, round, barometricPressureAbs: baro })})`;
}

export function fmtAbs(pa: number, round?: Rounding): string {
  return `${formatQuantity('pressure', pa, 'psia', { decimals: 1, round })} (${formatQuantity('pressure', pa, 'kPaa', { decimals: 1, round })})`;
}

export function fmtDiff(pa: number, round?: Rounding): string {
  return `${formatQuantity('pressureDifference', pa, 'psi', { decimals: 1, round })} (${formatQuantity('pressureDifference', pa, 'kPa', { decimals: 0, round })})`;
}

export function fmtT(K: number, round?: Rounding): string {
  return `${formatQuantity('temperature', K, 'F', { decimals: 1, round })} (${formatQuantity('temperature', K, 'C', { decimals: 1, round })})`;
}

export function fmtMass(kg: number, round?: Rounding): string {
  return `${formatQuantity('mass', kg, 'lb', { decimals: 0, round })} (${formatQuantity('mass', kg, 'kg', { decimals: 1, round })})`;
}

export function fmtPct(fraction: number, round?: Rounding): string {
  return formatQuantity('fraction', fraction, 'percent', { decimals: 1, round });
}
