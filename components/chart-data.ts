/**
 * The series behind the heating chart: the same closed tank (same contents, so the same overall
 * density) taken from today's liquid temperature to past the forecast peak, with the core's
 * `closedTank`. Points the core refuses (beyond its range) are left out, never guessed.
 */
import { closedTank, type Product } from '../thermo/index.js';
import type { TankCheckResult } from '../thermo/check/types.js';
import { T_CHECK_MAX_K, T_CHECK_MIN_K } from '../thermo/limits.js';

export interface CurvePoint {
  /** K */
  T: number;
  /** Pa absolute */
  pAbs: number;
  /** Liquid volume ÷ tank volume, fraction 0…1. */
  liquidFraction: number;
}

export interface HeatingCurve {
  points: CurvePoint[];
  /** Temperature span of the chart, K. */
  Tmin: number;
  Tmax: number;
}

/** What the chart worker is asked: the product, the check's result and the liquid temperature (K). */
export interface CurveRequest {
  product: Product;
  result: Pick<TankCheckResult, 'peak' | 'liquidFullTemperature' | 'contents'>;
  Tnow: number;
}

/** Temperature span: a little below now, to past the peak and, when near, past liquid-full. K. */
export function curveSpan(
  result: CurveRequest['result'],
  Tnow: number,
): { Tmin: number; Tmax: number } {
  const Tpeak = result.peak.temperature;
  const lo = Math.min(Tnow, Tpeak) - 5;
  let hi = Math.max(Tnow, Tpeak) + 15;
  const Tfull = result.liquidFullTemperature;
  if (Tfull !== null && Tfull > hi && Tfull < hi + 20) hi = Tfull + 5;
  return { Tmin: Math.max(T_CHECK_MIN_K, lo), Tmax: Math.min(T_CHECK_MAX_K, hi) };
}

/**
 * `n` points of the closed-tank state between the span's ends (and the two marked states
 * exactly, so the markers sit on the line).
 */
export function heatingCurve(
  product: Product,
  result: CurveRequest['result'],
  Tnow: number,
  n = 36,
): HeatingCurve {
  const { Tmin, Tmax } = curveSpan(result, Tnow);
  const density = result.contents.overallDensity;
  const temps = new Set<number>();
  for (let i = 0; i < n; i++) temps.add(Tmin + ((Tmax - Tmin) * i) / (n - 1));
  temps.add(Tnow);
  temps.add(result.peak.temperature);
  if (result.liquidFullTemperature !== null && result.liquidFullTemperature < Tmax)
    temps.add(result.liquidFullTemperature);
  const points: CurvePoint[] = [];
  for (const T of [...temps].sort((a, b) => a - b)) {
    try {
      const s = closedTank(product, T, density);
      if (Number.isFinite(s.pAbs) && Number.isFinite(s.liquidFraction))
        points.push({ T, pAbs: s.pAbs, liquidFraction: s.liquidFraction });
    } catch {
      // Outside the core's range at this temperature: leave the point out.
    }
  }
  return { points, Tmin, Tmax };
}
